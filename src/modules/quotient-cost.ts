/**
 * Cost of the quotient route before it starts, in module-cost units: every cell a task visits
 * costs its orbit representatives (one row each, about, under the criterion) times a per-row
 * price that grows with n (longer reductions), counted for each prime that reduces it. The
 * representatives of a cell are estimated as the monomials of its multidegree over the group
 * order, which the sign characters and the x-cap only lower.
 */
import { groupOrder } from './young-plan.js';
import type { CellDegree } from './cell-orbits.js';
import { cellsOfTotal, topDegree, type QuotientTask, type QuotientTaskInput } from './quotient-spec.js';
import { SECONDS_PER_UNIT } from './module-cost.js';

/**
 * Units per representative and prime, measured on x,y and x,y,θ coinvariants (n = 5, 6): about
 * 4 µs a row at n = 6, half of it building the row and half reducing it.
 */
function unitsPerColumn(n: number): number {
  return 3 * n * n;
}
/** The second prime reuses the first prime's rows: it pays the reduction only. */
const LATER_PRIME_SHARE = 0.6;

/** Estimated units of one cell for one functional (all of the task's primes). */
export function cellUnits(input: QuotientTaskInput, task: QuotientTask, cell: CellDegree, certificate: boolean): number {
  const fn = input.functionals[task.functional]!;
  const n = input.n;
  const monomials = compositions(cell.x, n, input.xCap) * compositions(cell.y, n) * binomial(n, cell.theta);
  const primes = certificate ? 1 : 1 + LATER_PRIME_SHARE * (task.primes.length - 1);
  return (monomials / groupOrder(fn.blocks)) * unitsPerColumn(n) * primes;
}

export interface QuotientWork {
  readonly units: number;
  readonly seconds: number;
}

export function estimateQuotientWork(input: QuotientTaskInput, tasks: readonly QuotientTask[]): QuotientWork {
  let units = 0;
  for (const task of tasks)
    for (let d = 0; d <= topDegree(task); d++) for (const { cell, certificate } of cellsOfTotal(input, task, d)) units += cellUnits(input, task, cell, certificate);
  return { units, seconds: units * SECONDS_PER_UNIT };
}

const compCache = new Map<string, number>();

/** Compositions of d into n parts, each below cap. */
function compositions(d: number, n: number, cap = Infinity): number {
  const key = `${d},${n},${cap}`;
  const hit = compCache.get(key);
  if (hit !== undefined) return hit;
  let ways = new Array<number>(d + 1).fill(0);
  ways[0] = 1;
  for (let i = 0; i < n; i++) {
    const next = new Array<number>(d + 1).fill(0);
    for (let s = 0; s <= d; s++) {
      if (!ways[s]) continue;
      for (let e = 0; s + e <= d && e < cap; e++) next[s + e]! += ways[s]!;
    }
    ways = next;
  }
  compCache.set(key, ways[d]!);
  return ways[d]!;
}

function binomial(n: number, k: number): number {
  if (k < 0 || k > n) return 0;
  let r = 1;
  for (let i = 0; i < k; i++) r = (r * (n - i)) / (i + 1);
  return r;
}
