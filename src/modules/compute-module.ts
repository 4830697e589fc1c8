/**
 * Engine entry for closure modules: `computeModule(spec, options)` builds the seed, picks the
 * route (Young-subgroup ranks for derivative-only operators, the iterated closure otherwise,
 * or the small exact route over Q), runs it with two primes and compares, and returns the
 * cells with checks and provenance. The command line and the terminal app both call this.
 */
import { LimitError } from '../core/errors.js';
import { CONFIRM_PRIME, DEFAULT_PRIME, PRIMES } from '../core/modp.js';
import { toBigIntExact } from '../core/rational.js';
import { makeProvenance } from '../core/provenance.js';
import { runTask } from '../pool/pool.js';
import { VERSION } from '../version.js';
import { moduleChecks } from './checks.js';
import { primeCoeffs, rationalCoeffs } from './coefficients.js';
import { cellsFromRanks, closurePlan, computedTasks, degreeBox, derivativeRanks, mirrorHolds } from './derivative-closure.js';
import { integerSeedSupport } from './integer-seed.js';
import { exactClosure } from './exact-closure.js';
import { iteratedClosure } from './iterated-closure.js';
import type { ModuleCell } from './module-cell.js';
import { ModuleCheckpoint } from './module-checkpoint.js';
import type { Axis, ModuleResult } from './module-result.js';
import { estimateModuleWork, preEstimateWork } from './module-cost.js';
import { derivativeFamilies, familyName, isDerivativeOnly, parseOperatorFamilies } from './operators.js';
import { buildSeedPolynomial } from './seed-polynomial.js';
import { seedSupport } from './seed-support.js';
import { seedTerms, type SeedSpec } from './seeds.js';
import { mergeRuns } from './merge-runs.js';
import { parallelRanks } from './parallel-ranks.js';
import type { YoungTask } from './young-plan.js';
import { polarizationReducible, polarizedSeeds } from './polarized-seeds.js';
import type { SuperPoly } from './super-algebra.js';

export interface ModuleSpec extends SeedSpec {
  /** Operator family names: x, y, theta, polar1, polar2, … */
  readonly ops: readonly string[];
}

export type ModuleMethod = 'auto' | 'young' | 'iterated' | 'exact';

export interface ModuleOptions {
  readonly frobenius?: boolean;
  readonly prime?: number;
  readonly method?: ModuleMethod;
  /** Refuse estimated work above this many units (see module-cost). */
  readonly maxWork?: number;
  readonly onEstimate?: (units: number, seconds: number) => void;
  readonly onProgress?: (done: number, total: number, label: string) => void;
  readonly signal?: AbortSignal;
  /** Ranks computed elsewhere (parallel workers) for the exact-integer seed: [prime][task][cell]. */
  readonly youngRanks?: { readonly primes: readonly number[]; readonly ranks: readonly (readonly (readonly number[])[])[] };
  /** Cells already computed for some primes (parallel workers, one prime each). */
  readonly precomputed?: ReadonlyMap<number, readonly ModuleCell[]>;
  /** computeModuleAsync: use worker threads when the estimate exceeds this many seconds. */
  readonly parallelAboveSeconds?: number;
  /** Resumable run: finished work is appended to this file and read back on the next start. */
  readonly checkpoint?: string;
  /** Internal (workers): compute the first prime only, without confirmation. */
  readonly onePrime?: boolean;
}

/** About ten minutes of processor time (module-cost units). */
export const DEFAULT_MAX_WORK = 1.5e10;

/** What a checkpoint file must match: everything that changes the result. */
function openCheckpoint(file: string, spec: ModuleSpec, options: ModuleOptions, primes: readonly number[], plan: readonly YoungTask[]): ModuleCheckpoint {
  // the subgroup plan names the tasks whose ranks the file holds
  const tasks = plan.map((t) => t.label);
  return new ModuleCheckpoint(file, { gradus: VERSION, spec, frobenius: options.frobenius ?? false, method: options.method ?? 'auto', primes, plan: tasks });
}
const EXACT_MAX_WORK = 2e8; // about 8 s in module-cost units (the exact route is far slower per unit)

function overLimit(est: { units: number; seconds: number }, limit: number, method: ModuleMethod): LimitError {
  return new LimitError(
    `estimated work ${est.units.toExponential(2)} units (about ${Math.round(est.seconds)} s) exceeds the limit ${limit.toExponential(2)}${method === 'exact' ? ' of the exact route: use a modular method' : '; raise it with --max-work'}`,
    method === 'exact' ? 'method' : 'max-work',
  );
}

/** Refuse before building the seed when even the bound from its typed terms is over the limit. */
function refuseEarly(pre: { units: number; seconds: number }, limit: number, method: ModuleMethod, options: ModuleOptions): void {
  if (pre.units <= limit) return;
  options.onEstimate?.(pre.units, pre.seconds);
  throw overLimit(pre, limit, method);
}

export function computeModule(spec: ModuleSpec, options: ModuleOptions = {}): ModuleResult {
  const t0 = performance.now();
  const ops = parseOperatorFamilies(spec.ops);
  const terms = seedTerms(spec);
  const polar = ops.some((o) => o.kind === 'polar');
  const needs = { y: polar || ops.some((o) => o.kind === 'y'), polar };
  const derivOnly = isDerivativeOnly(ops);
  const reducible = polarizationReducible(ops);
  const method = options.method === undefined || options.method === 'auto' ? (derivOnly || reducible ? 'young' : 'iterated') : options.method;
  if (method === 'young' && !derivOnly && !reducible) {
    throw new LimitError('the young method needs derivative operators, or polarizations together with x (use --method iterated)', 'method');
  }
  const frob = options.frobenius ?? false;
  const p1 = options.prime ?? DEFAULT_PRIME;
  const p2 = p1 === CONFIRM_PRIME ? DEFAULT_PRIME : CONFIRM_PRIME;
  const route = method !== 'young' ? 'iterated' : derivOnly ? 'young' : 'polarized';
  const limit = method === 'exact' ? EXACT_MAX_WORK : options.maxWork ?? DEFAULT_MAX_WORK;
  refuseEarly(preEstimateWork(terms, spec.n, ops, route), limit, method, options);

  const probe = buildSeedPolynomial(spec.n, terms, primeCoeffs(p1), needs);
  const probeSupport = seedSupport(probe.alg.space, p1, probe.f);
  const dops = derivativeFamilies(ops);
  const mirrored = mirrorHolds([probeSupport], dops); // one seed, same degree for every prime
  const est = estimateModuleWork(probeSupport, ops, route, probe.character === 'sign' && mirrored, probe.character !== 'none');
  options.onEstimate?.(est.units, est.seconds);
  if (est.units > limit) throw overLimit(est, limit, method);
  const character = probe.character;
  const frobOk = frob && character !== 'none';
  const notes: string[] = [];
  if (frob && character === 'none') notes.push('the seed is neither symmetric nor antisymmetric: S_n does not act on the closure, no Frobenius series');

  let cells: readonly ModuleCell[];
  let primes: number[] = [];
  let confirmation: string;
  let field: string;
  let methodText: string;
  if (method === 'exact') {
    const sp = buildSeedPolynomial(spec.n, terms, rationalCoeffs, needs);
    cells = exactClosure(sp.alg, sp.f, probeSupport.degree, ops, frobOk, (t) => toBigIntExact(t));
    confirmation = 'exact over Q (no modular step)';
    field = 'Q';
    methodText = 'closure over Q in reduced echelon form; characters by traces on the echelon basis';
  } else {
    const chiOf = (c: string): -1 | 0 | 1 => (c === 'sign' ? -1 : c === 'trivial' ? 1 : 0);
    const hooks = { onProgress: options.onProgress, signal: options.signal };
    const cache = new Map<number, readonly ModuleCell[]>(options.precomputed ?? []);
    const exactSeed = method === 'young' && derivOnly ? integerSeedSupport(probeSupport, terms) : undefined;
    if (exactSeed) notes.push('matrix entries are exact integers below 2^53: one enumeration serves both primes');
    const cp =
      options.checkpoint !== undefined && !options.onePrime ? openCheckpoint(options.checkpoint, spec, options, [p1, p2], closurePlan(spec.n, chiOf(probe.character), mirrored)) : undefined;
    const compute = (p: number): readonly ModuleCell[] => {
      const hit = cache.get(p);
      if (hit) return hit;
      const sp = p === p1 ? probe : buildSeedPolynomial(spec.n, terms, primeCoeffs(p), needs);
      const chi = chiOf(sp.character);
      if (method === 'young' && !derivOnly) {
        const orders = ops.flatMap((o) => (o.kind === 'polar' ? [o.order] : []));
        // both primes from one enumeration of the stacked matrices (seeds carry both residues)
        const both = !options.onePrime && (p === p1 || p === p2) ? [p1, p2] : [p];
        const fs = both.map((q) => (q === p ? sp.f : buildSeedPolynomial(spec.n, terms, primeCoeffs(q), needs).f) as SuperPoly<number>);
        const seeds = polarizedSeeds(sp.alg.space, fs, orders, both);
        const ranks = derivativeRanks(seeds, dops, chi, both, both[0]!, hooks);
        both.forEach((q, i) => cache.set(q, cellsFromRanks(spec.n, degreeBox(seeds), chi, ranks[i]!, mirrorHolds(seeds, dops))));
        return cache.get(p)!;
      }
      if (method === 'young') {
        if (exactSeed && (p === p1 || p === p2)) {
          const given = options.youngRanks;
          const ranks =
            given && given.primes[0] === p1 && given.primes[1] === p2
              ? given.ranks
              : cp
              ? cp.fillTasks(derivativeRanks([exactSeed], dops, chi, [p1, p2], 0, { ...hooks, onTask: (t, r) => cp.recordTask(t, r) }, cp.missingTasks(computedTasks(closurePlan(spec.n, chi, mirrored)))))
              : derivativeRanks([exactSeed], dops, chi, [p1, p2], 0, hooks);
          const box = degreeBox([exactSeed]);
          cache.set(p1, cellsFromRanks(spec.n, box, chi, ranks[0]!, mirrored));
          cache.set(p2, cellsFromRanks(spec.n, box, chi, ranks[1]!, mirrored));
          return cache.get(p)!;
        }
        const support = p === p1 ? probeSupport : seedSupport(sp.alg.space, p, sp.f);
        return cellsFromRanks(spec.n, degreeBox([support]), chi, derivativeRanks([support], dops, chi, [p], p, hooks)[0]!, mirrored);
      }
      return iteratedClosure(sp.alg, sp.f, probeSupport.degree, ops, { frobenius: chi !== 0, p, onProgress: options.onProgress, signal: options.signal });
    };
    // with a checkpoint, whole one-prime runs are recorded (the exact-integer route records tasks)
    const run = (p: number): readonly ModuleCell[] => {
      const saved = cp?.cells(p);
      if (saved) return saved;
      const cells = compute(p);
      if (cp && !(exactSeed && (p === p1 || p === p2))) cp.recordCells(p, cells);
      return cells;
    };
    const merged = options.onePrime
      ? { cells: run(p1), primes: [p1], confirmation: 'one prime only (a worker thread; the caller confirms with a second prime)' }
      : mergeRuns([p1, p2], run, PRIMES);
    cells = merged.cells;
    primes = merged.primes;
    confirmation = merged.confirmation;
    field = `F_p for p in {${primes.join(', ')}}`;
    methodText =
      method === 'young' && !derivOnly
        ? 'polarized closure as the sum of the derivative closures of the polarized seeds P_J f (normal ordering); Schur multiplicities from ranks of Young-subgroup invariants (h) and anti-invariants (e) solved with Kostka numbers'
        : method === 'young'
        ? 'derivative closure: graded pieces as images of the seed-coefficient maps; Schur multiplicities from ranks of Young-subgroup invariants (h) and anti-invariants (e) solved with Kostka numbers'
        : 'iterated closure degree by degree (semi-echelon form mod p); Schur multiplicities from ranks of Young-subgroup folds of each basis';
    if (cp) notes.push(cp.note());
    notes.push('ranks mod p are lower bounds of ranks over Q; multiplicities are integer combinations of ranks, so no character value is lifted from F_p');
  }
  if (method === 'exact' && options.checkpoint !== undefined) notes.push('the exact route keeps no checkpoint (its work limit keeps it small)');
  if (!frobOk) cells = cells.map((c) => ({ degree: c.degree, dim: c.dim }));
  const live = cells.filter((c) => c.dim > 0);
  const sp = probe.alg.space;
  const axes: Axis[] = ['x'];
  if (sp.hasY) axes.push('y');
  if (sp.hasTheta) axes.push('theta');
  return {
    kind: 'module',
    name: spec.seed,
    description: `closure of ${terms.description} under ${ops.map(familyName).join(', ')}`,
    n: spec.n,
    ...(spec.k !== undefined ? { k: spec.k } : {}),
    ops: ops.map(familyName),
    axes,
    cells: live,
    frobenius: frobOk,
    checks: moduleChecks(spec.n, live, axes),
    provenance: makeProvenance({ request: `${spec.seed} n=${spec.n}`, primes, method: `${methodText} (${field})`, confirmation, notes, seconds: (performance.now() - t0) / 1000 }),
  };
}

/** Seconds of estimated work above which the derivative route uses worker threads. */
export const PARALLEL_THRESHOLD_SECONDS = 3;

/**
 * computeModule on both cores: for large derivative closures with exact-integer entries the
 * Young-subgroup tasks run in worker threads; everything else runs as computeModule.
 */
export async function computeModuleAsync(spec: ModuleSpec, options: ModuleOptions = {}): Promise<ModuleResult> {
  const ops = parseOperatorFamilies(spec.ops);
  const method = options.method ?? 'auto';
  if (method === 'exact') return computeModule(spec, options);
  const derivOnly = isDerivativeOnly(ops);
  const terms = seedTerms(spec);
  const polar = ops.some((o) => o.kind === 'polar');
  const needs = { y: polar || ops.some((o) => o.kind === 'y'), polar };
  const p1 = options.prime ?? DEFAULT_PRIME;
  const p2 = p1 === CONFIRM_PRIME ? DEFAULT_PRIME : CONFIRM_PRIME;
  const young = (method === 'auto' || method === 'young') && (derivOnly || polarizationReducible(ops));
  refuseEarly(preEstimateWork(terms, spec.n, ops, !young ? 'iterated' : derivOnly ? 'young' : 'polarized'), options.maxWork ?? DEFAULT_MAX_WORK, method, options);
  const probe = buildSeedPolynomial(spec.n, terms, primeCoeffs(p1), needs);
  const support = seedSupport(probe.alg.space, p1, probe.f);
  const chi = probe.character === 'sign' ? -1 : probe.character === 'trivial' ? 1 : 0;
  const dops = derivativeFamilies(ops);
  const est = estimateModuleWork(support, ops, !young ? 'iterated' : derivOnly ? 'young' : 'polarized', chi === -1 && mirrorHolds([support], dops), chi !== 0);
  const limit = options.maxWork ?? DEFAULT_MAX_WORK;
  if (est.seconds < (options.parallelAboveSeconds ?? PARALLEL_THRESHOLD_SECONDS) || est.units > limit) return computeModule(spec, options);
  options.onEstimate?.(est.units, est.seconds);
  const quiet = { ...options, onEstimate: undefined, checkpoint: undefined };
  // the same header as the synchronous route writes for this request
  const cp = options.checkpoint !== undefined ? openCheckpoint(options.checkpoint, spec, options, [p1, p2], closurePlan(spec.n, chi, mirrorHolds([support], dops))) : undefined;
  const t0 = performance.now();
  const exact = young && derivOnly ? integerSeedSupport(support, terms) : undefined;
  let result: ModuleResult;
  if (exact) {
    // one enumeration per Young subgroup serves both primes: a task queue over both cores
    const hooks = { onProgress: options.onProgress, signal: options.signal, ...(cp ? { onTask: (t: number, r: number[][]) => cp.recordTask(t, r) } : {}) };
    const computed = await parallelRanks(exact, dops, chi, [p1, p2], hooks, undefined, cp?.missingTasks(computedTasks(closurePlan(spec.n, chi, mirrorHolds([exact], dops)))));
    const ranks = cp ? cp.fillTasks(computed) : computed;
    result = computeModule(spec, { ...quiet, youngRanks: { primes: [p1, p2], ranks } });
  } else {
    // one prime per core
    const runs = await Promise.all(
      [p1, p2].map(async (p) => {
        const saved = cp?.cells(p);
        if (saved) return saved;
        const cells = await moduleInWorker(spec, { frobenius: options.frobenius, method, maxWork: limit, prime: p }, options.signal);
        cp?.recordCells(p, cells);
        return cells;
      }),
    );
    result = computeModule(spec, { ...quiet, precomputed: new Map([[p1, runs[0]!], [p2, runs[1]!]]) });
  }
  const seconds = (performance.now() - t0) / 1000;
  return { ...result, provenance: { ...result.provenance, seconds, notes: [...result.provenance.notes, ...(cp ? [cp.note()] : []), 'computed on worker threads'] } };
}

function moduleInWorker(spec: ModuleSpec, options: Pick<ModuleOptions, 'frobenius' | 'method' | 'maxWork' | 'prime'>, signal?: AbortSignal): Promise<readonly ModuleCell[]> {
  return runTask<readonly ModuleCell[]>(new URL('./module-task.ts', import.meta.url), 'modulePrime', { spec, options }, { threads: 2, ...(signal ? { signal } : {}) });
}
