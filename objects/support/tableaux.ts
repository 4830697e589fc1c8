/** Standard Young tableaux: counting by the branching rule and uniform sampling. */
import { partitionsEqual, type Partition } from '../../src/core/partitions.js';
import { weightedIndex } from './random.js';

const memo = new Map<string, bigint>();

/** The rows r from which a cell can be removed (outer corners). */
export function corners(shape: Partition): number[] {
  const out: number[] = [];
  for (let r = 0; r < shape.length; r++) if ((shape[r + 1] ?? 0) < shape[r]!) out.push(r);
  return out;
}

function removeCell(shape: Partition, r: number): number[] {
  const s = shape.slice();
  s[r]!--;
  return s[r] === 0 ? s.slice(0, r) : s;
}

/** f^λ by the branching rule f^λ = Σ over corners c of f^{λ − c} (memoized). */
export function sytCount(shape: Partition): bigint {
  if (shape.length === 0) return 1n;
  const key = shape.join(',');
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  let s = 0n;
  for (const r of corners(shape)) s += sytCount(removeCell(shape, r));
  memo.set(key, s);
  return s;
}

/** A uniform SYT of the shape: the largest entry goes to corner c with probability f^{λ−c}/f^λ. */
export function randomSyt(shape: Partition, random: () => number): number[][] {
  const rows = shape.map((len) => new Array<number>(len).fill(0));
  let cur: Partition = shape;
  for (let m = shape.reduce((a, b) => a + b, 0); m >= 1; m--) {
    const cs = corners(cur);
    const r = cs[weightedIndex(random, cs.map((c) => sytCount(removeCell(cur, c))))]!;
    rows[r]![cur[r]! - 1] = m;
    cur = removeCell(cur, r);
  }
  return rows;
}

/** Is t a standard Young tableau of the shape (rows increase, columns increase, 1..n once)? */
export function isStandard(t: readonly (readonly number[])[], shape?: Partition): boolean {
  const lens = t.map((r) => r.length);
  if (shape && !partitionsEqual(lens, shape)) return false;
  const all = t.flat();
  const n = all.length;
  if (new Set(all).size !== n || all.some((x) => x < 1 || x > n)) return false;
  for (let i = 0; i < t.length; i++) {
    if (i > 0 && t[i]!.length > t[i - 1]!.length) return false;
    for (let j = 0; j < t[i]!.length; j++) {
      if (j > 0 && t[i]![j]! <= t[i]![j - 1]!) return false;
      if (i > 0 && t[i]![j]! <= t[i - 1]![j]!) return false;
    }
  }
  return true;
}

/**
 * The row reading word, rows from the bottom (English: last row) to the top, each left
 * to right: i+1 comes before i exactly when i+1 lies in a lower row, so its inverse
 * descent set is the descent set of the tableau (Σ_T F_{Des T} = s_λ, Stanley, Enumerative
 * Combinatorics vol. 2, §7.19).
 */
export function rowReadingWord(t: readonly (readonly number[])[]): number[] {
  return [...t].reverse().flat();
}
