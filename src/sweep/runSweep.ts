/**
 * A whole sweep: plan, compute every module not kept yet, analyse, rank, keep. The sweep's
 * record is written when it starts (state "running"), again with what was found when it is
 * interrupted, and whole when every module was tried ("done"); a rerun of the same command
 * finds its modules kept and computes only the rest.
 */
import { CONFIRM_PRIME, DEFAULT_PRIME } from '../core/modp.js';
import { makeProvenance } from '../core/provenance.js';
import { catalogueResultCache } from '../match/resultCache.js';
import type { Catalogue } from '../store/catalogue.js';
import { analyse, type SweepAnalysis } from './analyse.js';
import { computeModules, type ModuleOutcome } from './computeModules.js';
import { planSweep, type SweepPlan } from './plan.js';
import { sweepDocument, type SweepDocument } from './sweepDocument.js';
import type { SweepLimits, SweepSpec } from './sweepSpec.js';
import { saveSweep } from './sweepStore.js';

export interface SweepRunOptions {
  /** Where modules and the sweep are kept, and where statistics are looked up. */
  readonly catalogue?: Catalogue;
  readonly progress?: (label: string, done: number, total?: number) => void;
  readonly signal?: AbortSignal;
  /** Called with the plan before any module is computed. */
  readonly onPlan?: (plan: SweepPlan) => void;
  readonly onModule?: (key: string, outcome: ModuleOutcome) => void;
}

const METHOD = 'each module through the request model (gradus module --frobenius, both primes), kept in the catalogue by its canonical key; findings by exact comparison';

function record(plan: SweepPlan, outcomes: ReadonlyMap<string, ModuleOutcome>, a: SweepAnalysis, state: SweepDocument['state'], seconds: number, notes: readonly string[]): SweepDocument {
  const count = (s: ModuleOutcome['status']) => [...outcomes.values()].filter((o) => o.status === s).length;
  const counts = { ...plan.counts, kept: count('kept'), computed: count('computed'), skipped: count('skipped'), failed: count('failed') };
  const prov = makeProvenance({
    request: plan.key,
    method: METHOD,
    primes: [DEFAULT_PRIME, CONFIRM_PRIME],
    confirmation: 'every module: ranks modulo two primes compared cell by cell',
    notes: [...notes, ...(a.catalogueNote ? [a.catalogueNote] : [])],
    seconds,
  });
  return sweepDocument(plan.key, state, counts, a, prov);
}

export async function runSweep(spec: SweepSpec, limits: SweepLimits, options: SweepRunOptions = {}): Promise<SweepDocument> {
  const t0 = performance.now();
  const plan = planSweep(spec, limits);
  options.onPlan?.(plan);
  const cat = options.catalogue;
  const notes: string[] = [];
  if (!cat) notes.push('no catalogue: modules were not kept');
  else if (!cat.writable) notes.push(`the catalogue ${cat.path} is read-only: modules and the sweep were not kept`);
  const outcomes = new Map<string, ModuleOutcome>();
  const seconds = () => (performance.now() - t0) / 1000;
  if (cat) saveSweep(cat, record(plan, outcomes, { rows: [], isomorphism: [] }, 'running', 0, notes));
  try {
    await computeModules(plan.modules, {
      ...(options.progress ? { progress: options.progress } : {}),
      ...(options.signal ? { signal: options.signal } : {}),
      ...(cat ? { cache: catalogueResultCache(cat) } : {}),
      ...(limits.maxWork !== undefined ? { maxWork: limits.maxWork } : {}),
      onModule: (key, o) => {
        outcomes.set(key, o);
        options.onModule?.(key, o);
      },
    });
  } catch (e) {
    // interrupted: keep what was found so far; the modules themselves are kept already
    if (cat) saveSweep(cat, record(plan, outcomes, analyse(plan, outcomes, cat), 'running', seconds(), [...notes, 'interrupted: run the same command again to finish']));
    throw e;
  }
  const doc = record(plan, outcomes, analyse(plan, outcomes, cat), 'done', seconds(), notes);
  if (cat) saveSweep(cat, doc);
  return doc;
}
