/**
 * Monotone triangles with bottom row 1..n (row k has k+1 strictly increasing entries, each
 * between the two entries below it) and the alternating sign matrices they code: row k of the
 * triangle lists the columns whose partial sums over the first k+1 rows of the matrix are 1
 * (Mills–Robbins–Rumsey, J. Combin. Theory Ser. A 34 (1983); Bressoud, Proofs and
 * Confirmations (1999) §1.2).
 */
import type { Shard } from '../../src/enumerate/plugin.js';
import type { AlternatingSignMatrix, MonotoneTriangle } from '../types.js';
import { weightedIndex } from './random.js';
import { shardParts } from './shards.js';

/**
 * Calls f with every monotone triangle of order n, rows top (length 1) to bottom (1..n), in one
 * reused array; rows are chosen bottom-up, each in lexicographic order. Shards: the choices of the
 * two rows above the bottom one are dealt round-robin.
 */
export function visitMonotoneTriangles(n: number, f: (rows: number[][]) => void, shard?: Shard): void {
  const [index, count] = shardParts(shard);
  const rows = Array.from({ length: n }, (_, k) => new Array<number>(k + 1).fill(0));
  if (n > 0) for (let j = 0; j < n; j++) rows[n - 1]![j] = j + 1;
  if (n <= 1) {
    if (index === 0) f(rows);
    return;
  }
  const level = Math.max(0, n - 3);
  let rank = 0;
  const rec = (k: number, j: number): void => {
    if (k < 0) return f(rows);
    const row = rows[k]!;
    if (j > k) {
      if (k === level && count > 1 && rank++ % count !== index) return;
      return rec(k - 1, 0);
    }
    const below = rows[k + 1]!;
    const lo = j > 0 ? Math.max(below[j]!, row[j - 1]! + 1) : below[j]!;
    for (let v = lo; v <= below[j + 1]!; v++) {
      row[j] = v;
      rec(k, j + 1);
    }
  };
  rec(n - 2, 0);
}

/** The first triangle of order n in the walk's order: row k is 1..k+1. */
export function firstMonotoneTriangle(n: number): number[][] {
  return Array.from({ length: n }, (_, k) => Array.from({ length: k + 1 }, (_, j) => j + 1));
}

/**
 * Steps a triangle in place to the next one in the order of visitMonotoneTriangles; false after
 * the last. The entry changed is the last one (in the walk's order) below its bound; everything
 * chosen after it is reset to its least value (the rest of its row, then prefixes of the row below).
 */
export function nextMonotoneTriangle(rows: number[][]): boolean {
  const n = rows.length;
  for (let k = 0; k <= n - 2; k++) {
    const row = rows[k]!;
    const below = rows[k + 1]!;
    for (let j = k; j >= 0; j--) {
      if (row[j]! >= below[j + 1]!) continue;
      row[j]!++;
      for (let i = j + 1; i <= k; i++) row[i] = Math.max(below[i]!, row[i - 1]! + 1);
      for (let r = k - 1; r >= 0; r--) for (let i = 0; i <= r; i++) rows[r]![i] = rows[r + 1]![i]!;
      return true;
    }
  }
  return false;
}

/** The rows that can stand directly above `below` (one entry fewer, interlacing, strictly increasing). */
export function rowsAbove(below: readonly number[]): number[][] {
  const out: number[][] = [];
  const row: number[] = [];
  const rec = (j: number): void => {
    if (j === below.length - 1) return void out.push(row.slice());
    const lo = j > 0 ? Math.max(below[j]!, row[j - 1]! + 1) : below[j]!;
    for (let v = lo; v <= below[j + 1]!; v++) {
      row[j] = v;
      rec(j + 1);
    }
  };
  rec(0);
  return out;
}

/** Number of ways to complete a triangle above a row (memoized by the row; independent of n). */
const aboveMemo = new Map<string, bigint>();
export function completionsAbove(row: readonly number[]): bigint {
  if (row.length <= 1) return 1n;
  const key = row.join(',');
  let c = aboveMemo.get(key);
  if (c === undefined) {
    c = 0n;
    for (const u of rowsAbove(row)) c += completionsAbove(u);
    aboveMemo.set(key, c);
  }
  return c;
}

/** A uniformly random monotone triangle of order n: each row drawn with weight its number of completions. */
export function randomMonotoneTriangle(n: number, random: () => number): number[][] {
  if (n === 0) return [];
  const rows: number[][] = [Array.from({ length: n }, (_, j) => j + 1)];
  while (rows[0]!.length > 1) {
    const options = rowsAbove(rows[0]!);
    rows.unshift(options[weightedIndex(random, options.map(completionsAbove))]!);
  }
  return rows;
}

/** The alternating sign matrix of a monotone triangle: row k = indicator(row k) − indicator(row k−1). */
export function asmOfTriangle(rows: MonotoneTriangle): number[][] {
  const n = rows.length;
  return rows.map((r, k) => {
    const out = new Array<number>(n).fill(0);
    for (const c of r) out[c - 1]! += 1;
    if (k > 0) for (const c of rows[k - 1]!) out[c - 1]! -= 1;
    return out;
  });
}

/** The monotone triangle of an alternating sign matrix: the columns with partial column sum 1 after each row. */
export function triangleOfAsm(a: AlternatingSignMatrix): number[][] {
  const n = a.length;
  const sums = new Array<number>(n).fill(0);
  return a.map((r) => {
    r.forEach((x, c) => (sums[c]! += x));
    const row: number[] = [];
    sums.forEach((s, c) => {
      if (s === 1) row.push(c + 1);
    });
    return row;
  });
}

/** Π_{j=0}^{n−1} (3j+1)!/(n+j)!, the number of n × n alternating sign matrices (Zeilberger 1996; Kuperberg 1996). */
export function asmCount(n: number): bigint {
  let num = 1n;
  let den = 1n;
  const fact = (m: number): bigint => {
    let r = 1n;
    for (let i = 2; i <= m; i++) r *= BigInt(i);
    return r;
  };
  for (let j = 0; j < n; j++) {
    num *= fact(3 * j + 1);
    den *= fact(n + j);
  }
  return num / den;
}
