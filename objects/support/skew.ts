/**
 * Skew standard tableaux of shape λ/μ (English): counting by removing outer corners,
 * uniform sampling, and the tableau as a grid with absolute columns (0 marks μ's cells).
 */
import type { SkewTableau } from '../types.js';
import { weightedIndex } from './random.js';

const memo = new Map<string, bigint>();

/** Rows r where a cell of λ can be removed leaving a partition that still contains μ. */
export function skewCorners(outer: readonly number[], inner: readonly number[]): number[] {
  const out: number[] = [];
  for (let r = 0; r < outer.length; r++) if ((outer[r + 1] ?? 0) < outer[r]! && outer[r]! > (inner[r] ?? 0)) out.push(r);
  return out;
}

function removeCell(shape: readonly number[], r: number): number[] {
  const s = shape.slice();
  s[r]!--;
  while (s.length > 0 && s[s.length - 1] === 0) s.pop();
  return s;
}

/** f^{λ/μ}: the largest entry sits in a removable corner (memoized). */
export function skewCount(outer: readonly number[], inner: readonly number[]): bigint {
  const key = `${outer.join(',')}|${inner.join(',')}`;
  const hit = memo.get(key);
  if (hit !== undefined) return hit;
  const cs = skewCorners(outer, inner);
  let s = cs.length === 0 ? 1n : 0n; // no corner left: λ = μ
  for (const r of cs) s += skewCount(removeCell(outer, r), inner);
  memo.set(key, s);
  return s;
}

/** A uniform skew tableau: n goes to corner c with probability f^{(λ−c)/μ}/f^{λ/μ}, and so on down. */
export function randomSkewTableau(outer: readonly number[], inner: readonly number[], random: () => number): SkewTableau {
  const grid = outer.map((len) => new Array<number>(len).fill(0));
  let cur = outer.slice();
  const n = outer.reduce((a, b) => a + b, 0) - inner.reduce((a, b) => a + b, 0);
  for (let m = n; m >= 1; m--) {
    const cs = skewCorners(cur, inner);
    const r = cs[weightedIndex(random, cs.map((c) => skewCount(removeCell(cur, c), inner)))]!;
    grid[r]![cur[r]! - 1] = m;
    cur = removeCell(cur, r);
  }
  return fromGrid(outer, inner, grid);
}

/** The grid with absolute columns: grid[r][c] for c < λ_r, 0 on the cells of μ. */
export function toGrid(t: SkewTableau): number[][] {
  return t.outer.map((len, r) => {
    const row = new Array<number>(len).fill(0);
    const mu = t.inner[r] ?? 0;
    t.rows[r]!.forEach((x, j) => (row[mu + j] = x));
    return row;
  });
}

export function fromGrid(outer: readonly number[], inner: readonly number[], grid: readonly (readonly number[])[]): SkewTableau {
  return { outer: outer.slice(), inner: inner.slice(), rows: grid.map((row, r) => row.slice(inner[r] ?? 0)) };
}

/** The size |λ/μ|. */
export function skewSize(t: SkewTableau): number {
  return t.rows.reduce((s, r) => s + r.length, 0);
}

/** For each entry v = 1..n, its row (index v − 1). */
export function rowsOfEntries(t: SkewTableau): number[] {
  const out = new Array<number>(skewSize(t)).fill(0);
  t.rows.forEach((row, r) => row.forEach((v) => (out[v - 1] = r)));
  return out;
}
