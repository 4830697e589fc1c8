/**
 * The demo session: one loop through gradus, computed live by the engines — a module of
 * our own seed for several n, one of its series as a search target, the search, and an
 * export of what it found. The Tour screen runs it step by step; without a terminal the
 * same steps print as text.
 */
import { existsSync } from 'node:fs';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Poly } from '../../core/poly.js';
import { qSeries } from '../../series/series.js';
import { makeTarget, type Target } from '../../series/target.js';
import { Catalogue } from '../../store/catalogue.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import { exportItem, EXPORT_ENGINE_AVAILABLE, type ExportDone } from '../engines/exporter.js';
import { startModule } from '../engines/modules.js';
import { tableOf, type ModuleOutcome } from '../engines/moduleTypes.js';
import { APP_CATALOGUE_N_MAX, startCatalogueBuild, startSearch } from '../engines/search.js';
import type { SearchOutcome } from '../engines/searchTypes.js';
import type { Job, JobProgress } from '../engines/workerJob.js';
import { DEMO_NS, demoRequest, demoSeedText, DEMO_SHOWN_N } from './demoSeed.js';

export interface DemoState {
  readonly modules?: readonly ModuleOutcome[];
  readonly target?: Target;
  readonly catalogue?: { readonly path: string; readonly note: string };
  readonly search?: SearchOutcome;
  readonly exported?: ExportDone;
  readonly exportNote?: string;
}

export interface DemoEnv {
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly cwd: string;
  /** Folder for the exported file (a fresh temporary folder when not given). */
  readonly exportDir?: string;
}

/** Runs one job and records it, so the caller can cancel whatever is running. */
export type JobRunner = <T>(job: Job<T>) => Promise<T>;

export interface DemoStep {
  readonly title: string;
  run(state: DemoState, env: DemoEnv, runJob: JobRunner, onProgress: (p: JobProgress) => void): Promise<DemoState>;
}

/** The Hilbert series by x-degree (summed over θ) of each module, as a target over n. */
export function demoTarget(modules: readonly ModuleOutcome[]): Target {
  const entries = modules.map((m) => {
    const table = tableOf(m);
    const cols = table[0]?.length ?? 0;
    const sums = Array.from({ length: cols }, (_, j) => table.reduce((s, row) => s + (row[j] ?? 0n), 0n));
    return { n: m.n, series: qSeries(Poly.fromQCoeffs(sums)) };
  });
  return makeTarget(`Hilbert series by x-degree of ${demoSeedText(DEMO_SHOWN_N)} and its family, under ∂x and ∂θ`, entries);
}

/** The user's catalogue when there is one; otherwise a demo catalogue in the temp folder (built once). */
function chooseCatalogue(env: DemoEnv): { path: string; note: string; ready: boolean } {
  const mine = cataloguePath(undefined, env.env, env.cwd);
  if (existsSync(mine)) {
    try {
      const cat = Catalogue.open(mine, { readonly: true });
      const maxN = cat.maxN();
      cat.close();
      if (maxN >= 1) return { path: mine, note: `your catalogue ${mine} (n ≤ ${maxN})`, ready: true };
    } catch {
      // A damaged or foreign file: leave it alone and use the demo catalogue.
    }
  }
  const demo = join(tmpdir(), 'gradus-demo-catalogue.sqlite');
  return { path: demo, note: `a demo catalogue ${demo} (n ≤ ${APP_CATALOGUE_N_MAX}; yours is empty or missing)`, ready: false };
}

export const DEMO_STEPS: readonly DemoStep[] = [
  {
    title: `Compute the closure of ${demoSeedText(DEMO_SHOWN_N)} (and its family for n = ${DEMO_NS.join(', ')}) under ∂x and ∂θ`,
    async run(state, _env, runJob, onProgress) {
      const modules: ModuleOutcome[] = [];
      for (const n of DEMO_NS) modules.push(await runJob(startModule(demoRequest(n), onProgress)));
      return { ...state, modules };
    },
  },
  {
    title: 'Take its Hilbert series by x-degree as a search target',
    async run(state) {
      if (!state.modules) throw new Error('the module step has not run');
      return { ...state, target: demoTarget(state.modules) };
    },
  },
  {
    title: 'Search the catalogue for statistics with that distribution',
    async run(state, env, runJob, onProgress) {
      if (!state.target) throw new Error('the series step has not run');
      const choice = chooseCatalogue(env);
      // Building resumes where it stopped, so an existing demo catalogue costs nothing.
      if (!choice.ready) await runJob(startCatalogueBuild(choice.path, APP_CATALOGUE_N_MAX, onProgress));
      const search = await runJob(startSearch(state.target, choice.path, onProgress));
      return { ...state, catalogue: { path: choice.path, note: choice.note }, search };
    },
  },
  {
    title: 'Export the search result as Markdown',
    async run(state, env) {
      if (!state.search) throw new Error('the search step has not run');
      if (!EXPORT_ENGINE_AVAILABLE) return { ...state, exportNote: 'the export engine is not available in this build: nothing was written' };
      const dir = env.exportDir ?? mkdtempSync(join(tmpdir(), 'gradus-demo-'));
      const exported = exportItem({ id: 0, title: 'demo search', origin: 'search', payload: state.search }, 'markdown', join(dir, 'gradus-demo-search.md'), true);
      return { ...state, exported };
    },
  },
];
