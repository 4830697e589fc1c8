/**
 * The quotient route's task list and its merge: one task per functional of the plan and
 * prime (quotient-task.ts), run in the calling thread here; a worker pool can run the same
 * tasks. Multiplicities come from the functionals' dimensions through the plan's integer
 * system (young-plan), the dimension of a cell as Σ_λ f^λ m_λ.
 */
import { fLambda, partitionList } from '../core/partitions.js';
import type { ModuleCell } from './module-cell.js';
import type { QuotientRequest } from './quotient-input.js';
import { runQuotientTask, type QuotientTask, type QuotientTaskResult } from './quotient-task.js';
import { solveMultiplicities, youngPlan } from './young-plan.js';

export function quotientTasks(req: QuotientRequest, prime: number, xyBounds: readonly number[], certify: boolean): QuotientTask[] {
  return req.input.functionals.map((_, functional) => ({ functional, prime, xyBounds, certify }));
}

export interface RouteHooks {
  /** Called after every cell of every task with the cell's column count. */
  readonly onCell?: (task: QuotientTask, columns: number) => void;
  readonly signal?: AbortSignal;
}

export function runTasksInThread(req: QuotientRequest, tasks: readonly QuotientTask[], hooks: RouteHooks = {}): QuotientTaskResult[] {
  return tasks.map((t) => runQuotientTask(req.input, t, (c) => hooks.onCell?.(t, c), hooks.signal));
}

/** Cells (zero ones included) from the results of one prime's tasks, one per functional. */
export function mergeQuotientTasks(req: QuotientRequest, results: readonly QuotientTaskResult[]): ModuleCell[] {
  const n = req.input.n;
  const sorted = [...results].sort((a, b) => a.functional - b.functional);
  const first = sorted[0]!;
  const symmetric = req.input.functionals.length > 1 || n === 1 ? req.stable : false;
  const plan = youngPlan(n);
  const fl = partitionList(n).map((l) => Number(fLambda(l)));
  return first.degrees.map((degree, c) => {
    const values = sorted.map((r) => r.dims[c]!);
    if (!symmetric || req.input.functionals.length !== plan.length) return { degree: [degree[0], degree[1], degree[2]], dim: values[0]! };
    const multiplicities = solveMultiplicities(n, plan, values);
    return { degree: [degree[0], degree[1], degree[2]], dim: multiplicities.reduce((s, m, i) => s + m * fl[i]!, 0), multiplicities };
  });
}
