/**
 * Kostka numbers K_{λμ} = #semistandard tableaux of shape λ and content μ, by peeling
 * off the largest entry as a horizontal strip (memoised). Cached matrices per n.
 */
import { InputError } from '../core/errors.js';
import { checkPartition, partitionKey, partitionList, size, type Partition } from '../core/partitions.js';

const memo = new Map<string, bigint>();

/** All ν ⊆ λ with λ/ν a horizontal strip of size k (ν_i ∈ [λ_{i+1}, λ_i]). */
export function horizontalStripsRemoved(lambda: Partition, k: number): number[][] {
  const out: number[][] = [];
  const nu: number[] = [];
  const rec = (i: number, left: number): void => {
    if (i === lambda.length) {
      if (left === 0) out.push(trim(nu));
      return;
    }
    const li = lambda[i]!;
    const lower = lambda[i + 1] ?? 0;
    for (let take = Math.min(left, li - lower); take >= 0; take--) {
      nu.push(li - take);
      rec(i + 1, left - take);
      nu.pop();
    }
  };
  rec(0, k);
  return out;
}

function trim(a: readonly number[]): number[] {
  let e = a.length;
  while (e > 0 && a[e - 1] === 0) e--;
  return a.slice(0, e);
}

function kostkaRec(lambda: Partition, mu: readonly number[], len: number): bigint {
  if (len === 0) return lambda.length === 0 ? 1n : 0n;
  if (lambda.length > len) return 0n; // a column holds distinct entries
  const key = `${partitionKey(lambda)}|${mu.slice(0, len).join(',')}`;
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  let s = 0n;
  for (const nu of horizontalStripsRemoved(lambda, mu[len - 1]!)) s += kostkaRec(nu, mu, len - 1);
  memo.set(key, s);
  return s;
}

/** K_{λμ}; μ may be any composition of |λ| (the number is invariant under reordering). */
export function kostkaNumber(lambda: Partition, mu: readonly number[]): bigint {
  checkPartition(lambda, 'lambda');
  if (mu.some((x) => !Number.isInteger(x) || x < 0)) throw new InputError(`mu must be non-negative integers (got ${mu.join(',')})`, 'mu');
  if (size(lambda) !== mu.reduce((a, b) => a + b, 0)) return 0n;
  const m = mu.filter((x) => x > 0);
  return kostkaRec(lambda, m, m.length);
}

const matrixCache = new Map<number, readonly (readonly bigint[])[]>();

/** [i][j] = K_{λ_i μ_j} with λ, μ in partitionList(n) order (upper unitriangular). */
export function kostkaMatrix(n: number): readonly (readonly bigint[])[] {
  let hit = matrixCache.get(n);
  if (!hit) {
    const ps = partitionList(n);
    hit = ps.map((l) => ps.map((m) => kostkaNumber(l, m)));
    matrixCache.set(n, hit);
  }
  return hit;
}

const inverseCache = new Map<number, readonly (readonly bigint[])[]>();

/** The inverse of kostkaMatrix(n) (integer, upper unitriangular), by back substitution. */
export function inverseKostkaMatrix(n: number): readonly (readonly bigint[])[] {
  let hit = inverseCache.get(n);
  if (!hit) {
    const k = kostkaMatrix(n);
    const N = k.length;
    const inv: bigint[][] = Array.from({ length: N }, () => new Array<bigint>(N).fill(0n));
    // Solve K X = I column by column; K[i][i] = 1 and K[i][j] = 0 for j < i.
    for (let c = 0; c < N; c++) {
      for (let i = N - 1; i >= 0; i--) {
        let s = i === c ? 1n : 0n;
        const row = k[i]!;
        for (let j = i + 1; j < N; j++) s -= row[j]! * inv[j]![c]!;
        inv[i]![c] = s;
      }
    }
    hit = inv;
    inverseCache.set(n, hit);
  }
  return hit;
}
