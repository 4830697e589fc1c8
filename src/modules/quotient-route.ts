/**
 * The quotient route's task list and its merge: one task per functional of the plan (both
 * primes in one task, quotient-task.ts), run in the calling thread here; a worker pool can run
 * the same tasks. Multiplicities come from the functionals' dimensions through the plan's
 * integer system (young-plan), the dimension of a cell as Σ_λ f^λ m_λ.
 */
import { fLambda, partitionList } from '../core/partitions.js';
import type { ModuleCell } from './module-cell.js';
import type { QuotientRequest } from './quotient-input.js';
import type { QuotientTask, QuotientTaskResult } from './quotient-spec.js';
import { runQuotientTask } from './quotient-task.js';
import { solveMultiplicities, youngPlan } from './young-plan.js';

export function quotientTasks(req: QuotientRequest, primes: readonly number[], xyBounds: readonly number[], certify: boolean): QuotientTask[] {
  return req.input.functionals.map((_, functional) => ({ functional, primes, xyBounds, certify }));
}

export interface RouteHooks {
  /** Called after every cell of every task with the cell's column count. */
  readonly onCell?: (task: QuotientTask, columns: number) => void;
  readonly signal?: AbortSignal;
}

export function runTasksInThread(req: QuotientRequest, tasks: readonly QuotientTask[], hooks: RouteHooks = {}): QuotientTaskResult[] {
  return tasks.map((t) => runQuotientTask(req.input, t, (c) => hooks.onCell?.(t, c), hooks.signal));
}

/**
 * Cells (zero ones included) of one prime (its index in the tasks' primes) from the tasks'
 * results, one per functional; certificate cells only for the first prime.
 */
export function mergeQuotientTasks(req: QuotientRequest, results: readonly QuotientTaskResult[], primeIndex = 0): ModuleCell[] {
  const n = req.input.n;
  const sorted = [...results].sort((a, b) => a.functional - b.functional);
  const first = sorted[0]!;
  const plan = youngPlan(n);
  const fl = partitionList(n).map((l) => Number(fLambda(l)));
  const out: ModuleCell[] = [];
  first.degrees.forEach((d, c) => {
    if (first.dims[primeIndex]![c]! < 0) return;
    const degree: [number, number, number] = [d[0], d[1], d[2]];
    const values = sorted.map((r) => r.dims[primeIndex]![c]!);
    if (!req.symmetric) {
      out.push({ degree, dim: values[0]! });
      return;
    }
    const multiplicities = solveMultiplicities(n, plan, values);
    out.push({ degree, dim: multiplicities.reduce((s, m, i) => s + m * fl[i]!, 0), multiplicities });
  });
  return out;
}

/**
 * The first prime's certificate cells that are not zero (as "x/y/θ" degrees), or undefined when
 * every one vanishes: then the quotient vanishes above the computed cells.
 */
export function certificateFailure(req: QuotientRequest, results: readonly QuotientTaskResult[]): string | undefined {
  const first = results[0]!;
  const cells = mergeQuotientTasks(req, results, 0);
  const bad = first.degrees.filter((d, c) => first.certificate[c] && (cells.find((x) => x.degree.join() === d.join())?.dim ?? 0) > 0);
  return bad.length ? `nonzero at ${bad.map((d) => d.join('/')).join(', ')}` : undefined;
}
