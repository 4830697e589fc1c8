/**
 * Engine entry for quotient rings: `computeQuotient(spec, options)` estimates the work, runs
 * the quotient route's tasks (quotient-route.ts: one per Young functional, both primes in
 * each) with progress against a known total, certifies that the quotient vanishes above the
 * computed cells, compares the two primes (a third on disagreement, as merge-runs does), and
 * returns the cells with checks and provenance.
 */
import { LimitError } from '../core/errors.js';
import { CONFIRM_PRIME, DEFAULT_PRIME, PRIMES } from '../core/modp.js';
import { makeProvenance } from '../core/provenance.js';
import { moduleChecks } from './checks.js';
import { DEFAULT_MAX_WORK } from './compute-module.js';
import type { IdealSpec } from './ideals.js';
import { mergeRuns } from './merge-runs.js';
import type { ModuleCell } from './module-cell.js';
import type { Axis, ModuleResult } from './module-result.js';
import { deltaFindings } from './delta-findings.js';
import { cellUnits, estimateQuotientWork } from './quotient-cost.js';
import { quotientRequest, type QuotientRequest } from './quotient-input.js';
import { certificateFailure, mergeQuotientTasks, quotientTasks } from './quotient-route.js';
import type { QuotientTask, QuotientTaskResult } from './quotient-spec.js';
import { runQuotientTask } from './quotient-task.js';
import { ModuleCheckpoint } from './module-checkpoint.js';
import { runTask } from '../pool/pool.js';
import { VERSION } from '../version.js';

const QUOTIENT_TASK = new URL('./quotient-pool-task.ts', import.meta.url);

export interface QuotientOptions {
  readonly frobenius?: boolean;
  readonly prime?: number;
  /** Refuse estimated work above this many module-cost units. */
  readonly maxWork?: number;
  readonly onEstimate?: (units: number, seconds: number) => void;
  /** done and total in module-cost units (total > 0 and known from the first call). */
  readonly onProgress?: (done: number, total: number, label: string) => void;
  readonly signal?: AbortSignal;
  /** Cells already computed for some primes (cluster shards, one prime each). */
  readonly precomputed?: ReadonlyMap<number, readonly ModuleCell[]>;
  /** Compute the first prime only, without confirmation (a shard; the merge confirms). */
  readonly onePrime?: boolean;
  /** computeQuotientAsync: finished work is appended to this file and read back on the next start. */
  readonly checkpoint?: string;
  /** Internal: results of tasks already computed (worker threads, a checkpoint), by taskKey. */
  readonly taskResults?: ReadonlyMap<string, QuotientTaskResult>;
}

/** What a task computes, as a key: its functional, primes, degree bounds and certificate. */
export function taskKey(task: QuotientTask): string {
  return `${task.functional}|${task.primes.join(',')}|${task.xyBounds.join(',')}|${task.certify ? 'c' : ''}`;
}

/** Worker threads of the asynchronous route. */
const THREADS = 2;

/**
 * The quotient with its tasks (one per Young functional, both primes in each) on worker threads,
 * each finished task appended to the checkpoint when there is one; then the in-thread route
 * assembles the result from them (and computes in-thread only what a failed certificate adds).
 */
export async function computeQuotientAsync(spec: IdealSpec, options: QuotientOptions = {}): Promise<ModuleResult> {
  if (options.precomputed || options.onePrime) return computeQuotient(spec, options);
  const frob = options.frobenius ?? false;
  const req = quotientRequest(spec, frob);
  const p1 = options.prime ?? DEFAULT_PRIME;
  const p2 = p1 === CONFIRM_PRIME ? DEFAULT_PRIME : CONFIRM_PRIME;
  // a file that is not our checkpoint for this request is refused before anything else is said
  const cp = options.checkpoint !== undefined ? new ModuleCheckpoint(options.checkpoint, { gradus: VERSION, kind: 'quotient', spec, frobenius: frob, primes: [p1, p2] }) : undefined;
  const tasks = quotientTasks(req, [p1, p2], req.expectedBounds, true);
  const est = estimateQuotientWork(req.input, tasks);
  options.onEstimate?.(est.units, est.seconds);
  const limit = options.maxWork ?? DEFAULT_MAX_WORK;
  if (est.units > limit) {
    throw new LimitError(`estimated work ${est.units.toExponential(2)} units (about ${Math.round(est.seconds)} s) exceeds the limit ${limit.toExponential(2)}; raise it with --max-work`, 'max-work');
  }
  const results = new Map<string, QuotientTaskResult>();
  const done = new Map<string, number>();
  const total = Math.max(est.units, 1);
  let reused = 0;
  for (const t of tasks) {
    const saved = cp?.piece(taskKey(t));
    if (!saved) continue;
    results.set(taskKey(t), saved);
    done.set(taskKey(t), estimateQuotientWork(req.input, [t]).units);
    reused++;
  }
  // one phase for the whole run (front ends draw one bar per phase)
  const report = () => options.onProgress?.(Math.min(total, [...done.values()].reduce((a, b) => a + b, 0)), total, `quotient: ${tasks.length} Young-subgroup tasks on ${THREADS} threads`);
  // the largest tasks first, so the two threads finish together
  const todo = tasks.filter((t) => !results.has(taskKey(t))).sort((a, b) => estimateQuotientWork(req.input, [b]).units - estimateQuotientWork(req.input, [a]).units);
  await Promise.all(
    todo.map(async (task) => {
      const key = taskKey(task);
      const r = await runTask<QuotientTaskResult>(QUOTIENT_TASK, 'quotientTaskJob', { spec, frobenius: frob, task }, {
        threads: THREADS,
        ...(options.signal ? { signal: options.signal } : {}),
        onProgress: (_label, d) => {
          done.set(key, d);
          report();
        },
      });
      results.set(key, r);
      cp?.recordPiece(key, r);
    }),
  );
  const result = computeQuotient(spec, { ...options, onEstimate: undefined, maxWork: Infinity, taskResults: results });
  if (cp && reused > 0) return { ...result, provenance: { ...result.provenance, notes: [...result.provenance.notes, cp.note()] } };
  return result;
}

export function computeQuotient(spec: IdealSpec, options: QuotientOptions = {}): ModuleResult {
  const t0 = performance.now();
  const frob = options.frobenius ?? false;
  const req = quotientRequest(spec, frob);
  const p1 = options.prime ?? DEFAULT_PRIME;
  const p2 = p1 === CONFIRM_PRIME ? DEFAULT_PRIME : CONFIRM_PRIME;
  const primes = options.onePrime ? [p1] : [p1, p2];
  const notes: string[] = [];
  let bounds = req.expectedBounds;
  const pre = options.precomputed;
  let byPrime: Map<number, readonly ModuleCell[]>;
  if (pre && primes.every((p) => pre.has(p))) {
    // cells of cluster shards (each certified where it was computed): nothing to compute here
    byPrime = new Map(primes.map((p) => [p, pre.get(p)!]));
  } else {
    let tasks = quotientTasks(req, primes, bounds, true);
    const est = estimateQuotientWork(req.input, tasks);
    options.onEstimate?.(est.units, est.seconds);
    const limit = options.maxWork ?? DEFAULT_MAX_WORK;
    if (est.units > limit) {
      throw new LimitError(`estimated work ${est.units.toExponential(2)} units (about ${Math.round(est.seconds)} s) exceeds the limit ${limit.toExponential(2)}; raise it with --max-work`, 'max-work');
    }
    const progress = { done: 0, total: Math.max(est.units, 1) };
    let results = runAll(req, tasks, progress, options);
    let failure = certificateFailure(req, results);
    if (failure && req.expectedBounds.some((b, c) => b < req.fullBounds[c]!)) {
      // the expected top degrees were too low: the stated limit instead
      notes.push(`the quotient did not vanish above the expected degrees (${failure}); recomputed up to total degree ${req.maxDegree}`);
      bounds = req.fullBounds;
      tasks = quotientTasks(req, primes, bounds, true);
      progress.total += estimateQuotientWork(req.input, tasks).units;
      results = runAll(req, tasks, progress, options);
      failure = certificateFailure(req, results);
    }
    if (failure) throw new LimitError(`the quotient does not vanish by total degree ${req.maxDegree} (${failure}): the ideal may not have finite codimension`, 'gens');
    byPrime = new Map(primes.map((p, i) => [p, mergeQuotientTasks(req, results, i)]));
  }
  const merged = options.onePrime
    ? { cells: byPrime.get(p1)!, primes: [p1], confirmation: 'one prime only (a shard; the merge confirms with a second prime)' }
    : mergeRuns(
        [p1, p2],
        (p) => byPrime.get(p) ?? mergeQuotientTasks(req, runAll(req, quotientTasks(req, [p], bounds, false), { done: 0, total: 1 }, options), 0),
        PRIMES,
      );
  const frobOk = frob && req.stable;
  const live = merged.cells.filter((c) => c.dim > 0).map((c) => (frobOk ? c : { degree: c.degree, dim: c.dim }));
  const axes: Axis[] = ['x', ...(req.input.hasY ? (['y'] as const) : []), ...(req.input.hasTheta ? (['theta'] as const) : [])];
  if (frob && !req.stable) notes.push('some generator is neither symmetric nor antisymmetric: no Frobenius series');
  notes.push('ranks mod p are lower bounds of ranks over Q, so quotient dimensions mod p are upper bounds; a cell that vanishes mod one prime vanishes over Q');
  notes.push(
    req.input.hasY
      ? 'the quotient vanishes above the computed cells: for each θ-degree the middle cell one x+y degree higher is zero (an sl_2-module with no middle weight is zero)'
      : 'the quotient vanishes above the computed cells: for each θ-degree the cell one degree higher is zero',
  );
  return {
    kind: 'quotient',
    name: spec.ideal,
    description: `quotient by the ${req.description}`,
    n: spec.n,
    ...(spec.k !== undefined ? { k: spec.k } : {}),
    ops: [],
    axes,
    cells: live,
    frobenius: frobOk,
    checks: [...moduleChecks(spec.n, live, axes), ...(frobOk ? deltaFindings({ kind: 'quotient', ideal: spec.ideal, n: spec.n, k: spec.k, y: req.input.hasY, theta: req.input.hasTheta }, live) : [])],
    provenance: makeProvenance({
      request: `${spec.ideal} n=${spec.n}`,
      primes: merged.primes,
      method: `${
        req.symmetric
          ? 'G,χ-parts of the ideal for Young subgroups (h_μ e_ν functionals) as folded products g·m over orbit representatives, sparse top-reduction with a signature-type criterion per multidegree; Schur multiplicities from the functionals by the integer pairing with Kostka numbers'
          : 'the ideal in every multidegree as products g·m, sparse top-reduction with a signature-type criterion; dimension = #monomials − rank'
      } (F_p for p in {${merged.primes.join(', ')}})`,
      confirmation: merged.confirmation,
      notes,
      seconds: (performance.now() - t0) / 1000,
    }),
  };
}

function runAll(req: QuotientRequest, tasks: readonly QuotientTask[], progress: { done: number; total: number }, options: QuotientOptions): QuotientTaskResult[] {
  return tasks.map((task) => {
    const known = options.taskResults?.get(taskKey(task));
    if (known) return known;
    const label = req.input.functionals[task.functional]!.label;
    return runQuotientTask(
      req.input,
      task,
      (_, cell, certificate) => {
        progress.done += cellUnits(req.input, task, cell, certificate);
        options.onProgress?.(Math.min(progress.done, progress.total), progress.total, `${label}: cell ${cell.x}/${cell.y}/${cell.theta}`);
      },
      options.signal,
    );
  });
}
