/**
 * The demo session: one loop through gradus, computed live by the engines — a module of
 * our own seed for several n, one of its series as a search target, the search, and an
 * export of what it found. The Tour screen runs it step by step; without a terminal the
 * same steps print as text.
 */
import { existsSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Poly } from '../../core/poly.js';
import { qSeries, qtSeries } from '../../series/series.js';
import { makeTarget, type Target } from '../../series/target.js';
import { Catalogue } from '../../store/catalogue.js';
import { cataloguePath } from '../../store/cataloguePath.js';
import { exportItem, EXPORT_ENGINE_AVAILABLE, type ExportDone } from '../engines/exporter.js';
import { startModule } from '../engines/modules.js';
import { existingCatalogue } from '../engines/existingCatalogue.js';
import { tableOf, type ModuleOutcome } from '../engines/moduleTypes.js';
import { APP_CATALOGUE_N_MAX, startCatalogueBuild, startSearches } from '../engines/search.js';
import type { SearchOutcome } from '../engines/searchTypes.js';
import type { Job, JobProgress } from '../engines/workerJob.js';
import { DEMO_NS, demoRequest, demoSeedText, DEMO_SHOWN_N } from './demoSeed.js';

export interface DemoState {
  readonly modules?: readonly ModuleOutcome[];
  readonly target?: Target;
  /** Every series tried, the Hilbert series first. */
  readonly targets?: readonly Target[];
  readonly searches?: readonly SearchOutcome[];
  readonly catalogue?: { readonly path: string; readonly note: string };
  readonly search?: SearchOutcome;
  readonly exported?: ExportDone;
  readonly exportNote?: string;
}

export interface DemoEnv {
  readonly env: Readonly<Record<string, string | undefined>>;
  readonly cwd: string;
  /** Folder for the exported file (gradus-demo in the temp folder when not given). */
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
  return demoTargets(modules)[0]!;
}

/**
 * The series of the demo's modules that the search tries, over n: the Hilbert series by
 * x-degree, each θ-degree row alone, and the whole (x, θ) table as a q,t series.
 */
export function demoTargets(modules: readonly ModuleOutcome[]): Target[] {
  const seed = `${demoSeedText(DEMO_SHOWN_N)} and its family`;
  const tables = modules.map((m) => ({ n: m.n, table: tableOf(m) }));
  const rows = Math.max(...tables.map((t) => t.table.length));
  const byX = tables.map(({ n, table }) => {
    const cols = Math.max(...table.map((r) => r.length));
    return { n, series: qSeries(Poly.fromQCoeffs(Array.from({ length: cols }, (_, j) => table.reduce((s, row) => s + (row[j] ?? 0n), 0n)))) };
  });
  const out = [makeTarget(`Hilbert series by x-degree of ${seed}, under ∂x and ∂θ`, byX)];
  for (let i = 0; i < rows; i++) {
    out.push(makeTarget(`θ-degree ${i} row of ${seed}`, tables.map(({ n, table }) => ({ n, series: qSeries(Poly.fromQCoeffs(table[i] ?? [])) }))));
  }
  // Table rows are θ-degrees and columns x-degrees: q marks x, t marks θ.
  const qt = tables.map(({ n, table }) => ({ n, series: qtSeries(Poly.fromQTTable((table[0] ?? []).map((_, j) => table.map((r) => r[j] ?? 0n)))) }));
  out.push(makeTarget(`(x, θ) Hilbert table of ${seed} (q marks x, t marks θ)`, qt));
  return out;
}

/** The user's catalogue when there is one; otherwise a demo catalogue in the temp folder (built once). */
function chooseCatalogue(env: DemoEnv): { path: string; note: string; ready: boolean } {
  const mine = cataloguePath(undefined, env.env, env.cwd);
  if (existsSync(mine)) {
    try {
      const cat = Catalogue.open(mine, { existing: true });
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
    title: `The module of ${demoSeedText(DEMO_SHOWN_N)} under ∂x, ∂θ (and its family, n = ${DEMO_NS.join(', ')})`,
    async run(state, env, runJob, onProgress) {
      const modules: ModuleOutcome[] = [];
      for (const n of DEMO_NS) modules.push(await runJob(startModule(demoRequest(n), onProgress, existingCatalogue(env.env, env.cwd))));
      return { ...state, modules };
    },
  },
  {
    title: 'Its series as targets: by x-degree, each θ row, the (x, θ) table',
    async run(state) {
      if (!state.modules) throw new Error('the module step has not run');
      const targets = demoTargets(state.modules);
      return { ...state, target: targets[0], targets };
    },
  },
  {
    title: 'Search the catalogue for statistics with those distributions',
    async run(state, env, runJob, onProgress) {
      if (!state.targets) throw new Error('the series step has not run');
      const choice = chooseCatalogue(env);
      // Building resumes where it stopped, so an existing demo catalogue costs nothing.
      if (!choice.ready) await runJob(startCatalogueBuild(choice.path, APP_CATALOGUE_N_MAX, onProgress));
      const searches = await runJob(startSearches(state.targets, choice.path, onProgress));
      // The result to export: the first series with a match, else the Hilbert series' report.
      const search = searches.find((x) => x.candidates.length > 0) ?? searches[0]!;
      return { ...state, catalogue: { path: choice.path, note: choice.note }, searches, search };
    },
  },
  {
    title: 'Export the search result as Markdown',
    async run(state, env) {
      if (!state.search) throw new Error('the search step has not run');
      if (!EXPORT_ENGINE_AVAILABLE) return { ...state, exportNote: 'the export engine is not available in this build: nothing was written' };
      // One folder for every run: the demo's file is replaced, never piled up.
      const dir = env.exportDir ?? join(tmpdir(), 'gradus-demo');
      mkdirSync(dir, { recursive: true });
      const exported = exportItem({ id: 0, title: 'demo search', origin: 'search', payload: state.search }, 'markdown', join(dir, 'gradus-demo-search.md'), true);
      return { ...state, exported };
    },
  },
];
