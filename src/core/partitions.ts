/**
 * Integer partitions: weakly decreasing arrays of positive integers.
 * Generation order (documented, fixed): reverse lexicographic, so for n = 4:
 * [4], [3,1], [2,2], [2,1,1], [1,1,1,1]. Dominance-larger partitions come first
 * whenever the two are comparable.
 */
import { InputError } from './errors.js';
import { factorial } from './integers.js';

export type Partition = readonly number[];

/** Stream the partitions of n in reverse lexicographic order. */
export function* partitions(n: number, maxPart = n): Generator<Partition> {
  if (!Number.isInteger(n) || n < 0) throw new InputError(`n must be a non-negative integer (got ${n})`, 'n');
  if (n === 0) {
    yield [];
    return;
  }
  const a: number[] = [];
  function* rec(rest: number, max: number): Generator<Partition> {
    if (rest === 0) {
      yield a.slice();
      return;
    }
    for (let p = Math.min(rest, max); p >= 1; p--) {
      a.push(p);
      yield* rec(rest - p, p);
      a.pop();
    }
  }
  yield* rec(n, maxPart);
}

const partitionListCache = new Map<number, Partition[]>();

/** All partitions of n as a cached array (reverse lexicographic order). */
export function partitionList(n: number): readonly Partition[] {
  let hit = partitionListCache.get(n);
  if (!hit) {
    hit = [...partitions(n)];
    partitionListCache.set(n, hit);
  }
  return hit;
}

/** p(n), the number of partitions of n, by Euler's pentagonal recurrence. */
export function partitionCount(n: number): bigint {
  const p: bigint[] = [1n];
  for (let m = 1; m <= n; m++) {
    let s = 0n;
    for (let k = 1; ; k++) {
      const g1 = (k * (3 * k - 1)) / 2;
      if (g1 > m) break;
      const sign = k % 2 === 1 ? 1n : -1n;
      s += sign * p[m - g1]!;
      const g2 = (k * (3 * k + 1)) / 2;
      if (g2 <= m) s += sign * p[m - g2]!;
    }
    p.push(s);
  }
  return p[n]!;
}

export function size(l: Partition): number {
  let s = 0;
  for (const x of l) s += x;
  return s;
}

/** Check that an array is a partition (positive, weakly decreasing); throws InputError. */
export function checkPartition(l: readonly number[], name = 'partition'): Partition {
  for (let i = 0; i < l.length; i++) {
    const x = l[i]!;
    if (!Number.isInteger(x) || x <= 0 || (i > 0 && x > l[i - 1]!)) {
      throw new InputError(`${name} must be weakly decreasing positive integers (got ${l.join(',')})`, name);
    }
  }
  return l;
}

/** Parse "3,1,1" (or "311" for single-digit parts is NOT accepted: commas required). */
export function parsePartition(text: string, name = 'partition'): Partition {
  const trimmed = text.trim();
  if (trimmed === '' || trimmed === '0') return [];
  const parts = trimmed.split(',').map((s) => s.trim());
  if (parts.some((s) => !/^\d+$/.test(s))) {
    throw new InputError(`${name} must be comma-separated positive integers such as 3,1,1 (got "${text}")`, name);
  }
  return checkPartition(parts.map(Number), name);
}

export function partitionKey(l: Partition): string {
  return l.join(',');
}

export function conjugate(l: Partition): number[] {
  const out: number[] = [];
  const first = l[0] ?? 0;
  for (let j = 0; j < first; j++) {
    let c = 0;
    while (c < l.length && l[c]! > j) c++;
    out.push(c);
  }
  return out;
}

/** λ ≥ μ in dominance order (same size assumed; partial sums compared). */
export function dominates(l: Partition, m: Partition): boolean {
  let sl = 0;
  let sm = 0;
  const len = Math.max(l.length, m.length);
  for (let i = 0; i < len; i++) {
    sl += l[i] ?? 0;
    sm += m[i] ?? 0;
    if (sl < sm) return false;
  }
  return true;
}

/** n(λ) = Σ (i−1) λ_i. */
export function nStat(l: Partition): number {
  let s = 0;
  l.forEach((x, i) => (s += i * x));
  return s;
}

/** z_λ = Π_i i^{m_i} m_i!, the size of the centralizer of a permutation of cycle type λ. */
export function zee(l: Partition): bigint {
  const mult = new Map<number, number>();
  for (const x of l) mult.set(x, (mult.get(x) ?? 0) + 1);
  let z = 1n;
  for (const [i, m] of mult) z *= BigInt(i) ** BigInt(m) * factorial(m);
  return z;
}

/** Multiplicities m_i of the parts i = 1..max. */
export function multiplicities(l: Partition): Map<number, number> {
  const mult = new Map<number, number>();
  for (const x of l) mult.set(x, (mult.get(x) ?? 0) + 1);
  return mult;
}

/** Hook lengths, row by row: hooks[i][j] = arm + leg + 1 of cell (i, j) (English). */
export function hookLengths(l: Partition): number[][] {
  const c = conjugate(l);
  return l.map((row, i) => Array.from({ length: row }, (_, j) => row - j - 1 + (c[j]! - i - 1) + 1));
}

/** f^λ = n! / Π hooks, the number of standard Young tableaux of shape λ. */
export function fLambda(l: Partition): bigint {
  let prod = 1n;
  for (const row of hookLengths(l)) for (const h of row) prod *= BigInt(h);
  return factorial(size(l)) / prod;
}

/** Cells (row, column) of the diagram, 0-based, row by row. */
export function cells(l: Partition): [number, number][] {
  const out: [number, number][] = [];
  l.forEach((row, i) => {
    for (let j = 0; j < row; j++) out.push([i, j]);
  });
  return out;
}

export function partitionsEqual(a: Partition, b: Partition): boolean {
  return a.length === b.length && a.every((x, i) => x === b[i]);
}
