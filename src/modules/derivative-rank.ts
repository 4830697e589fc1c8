/**
 * One graded piece of a derivative closure, reduced by a Young subgroup (design note):
 * rows are the S_μ-orbit representatives g = ∂x^α ∂y^β ∂θ_T of the given operator degree,
 * columns the fold of g(∂)f onto representatives; the rank is dim of the S_μ-invariants
 * ('sym') or anti-invariants ('alt') of that piece. Entries come from the seed's
 * coefficients times falling factorials and the θ sign; everything mod p.
 */
import { EchelonModP } from './echelon-mod-p.js';
import type { SeedSupport } from './seed-support.js';
import { blockOf, YoungFolder, type FoldMode } from './young-fold.js';
import { thetaDerivativeSign } from './superspace.js';

export interface RankTask {
  readonly blocks: readonly number[];
  readonly mode: FoldMode;
}

/** Seed character under transpositions: −1 (sign), +1 (trivial), 0 (neither: no row pruning). */
export type SeedChi = -1 | 0 | 1;

export interface CellRank {
  readonly rank: number;
  readonly rows: number;
  readonly columns: number;
  readonly entries: number;
}

export function derivativeCellRank(seed: SeedSupport, opDegree: readonly [number, number, number], task: RankTask, chi: SeedChi): CellRank {
  const sp = seed.space;
  const n = sp.n;
  const p = seed.p;
  const R = sp.radix;
  const [A, B, C] = opDegree;
  const block = blockOf(n, task.blocks);
  const folder = new YoungFolder(sp, task.blocks, task.mode);
  const symMode = task.mode === 'sym';
  // falling factorials e!/(e−a)! mod p
  const maxE = R;
  const fall = new Float64Array(maxE * maxE);
  for (let e = 0; e < maxE; e++) {
    let v = 1;
    for (let a = 0; a <= e; a++) {
      fall[e * maxE + a] = v;
      v = (v * (e - a)) % p;
    }
  }
  const rowIndex = new Map<number, number>();
  let cap = 1 << 12;
  let rowsArr = new Int32Array(cap);
  let colsArr = new Int32Array(cap);
  let valsArr = new Float64Array(cap);
  let len = 0;
  const push = (r: number, c: number, v: number): void => {
    if (len === cap) {
      cap *= 2;
      const r2 = new Int32Array(cap);
      r2.set(rowsArr);
      rowsArr = r2;
      const c2 = new Int32Array(cap);
      c2.set(colsArr);
      colsArr = c2;
      const v2 = new Float64Array(cap);
      v2.set(valsArr);
      valsArr = v2;
    }
    rowsArr[len] = r;
    colsArr[len] = c;
    valsArr[len] = v;
    len++;
  };
  const sufX = new Int32Array(n + 1);
  const sufY = new Int32Array(n + 1);
  const sufT = new Int32Array(n + 1);
  const xPow = sp.powers;
  const yOff = n;
  const base = sp.maskBase;
  let gx: Int32Array = seed.xs;
  let gy: Int32Array = seed.ys;
  let off = 0;
  let gMask = 0;
  let gKey = 0;
  let gCoeff = 0;

  const rec = (i: number, aRem: number, bRem: number, cRem: number, lin: number, tMask: number, val: number, prev: number): void => {
    if (i === n) {
      const target = (gKey - (lin * base + gMask)) + (gMask & ~tMask);
      const code = folder.fold(target);
      if (code < 0) return;
      const ts = thetaDerivativeSign(tMask, gMask);
      let v = (val * gCoeff) % p;
      if ((ts < 0) !== ((code & 1) === 1)) v = v === 0 ? 0 : p - v;
      if (v === 0) return;
      const rowKey = lin * base + tMask;
      let r = rowIndex.get(rowKey);
      if (r === undefined) {
        r = rowIndex.size;
        rowIndex.set(rowKey, r);
      }
      push(r, code >> 1, v);
      return;
    }
    const ex = gx[off + i]!;
    const ey = sp.hasY ? gy[off + i]! : 0;
    const si = (gMask >> i) & 1;
    const sameBlock = i > 0 && block[i] === block[i - 1];
    const maxA = Math.min(ex, aRem);
    const maxB = Math.min(ey, bRem);
    const maxT = si && cRem > 0 ? 1 : 0;
    for (let a = 0; a <= maxA; a++) {
      if (aRem - a > sufX[i + 1]!) continue;
      for (let b = 0; b <= maxB; b++) {
        if (bRem - b > sufY[i + 1]!) continue;
        for (let t = 0; t <= maxT; t++) {
          if (cRem - t > sufT[i + 1]!) continue;
          const letter = (a * R + b) * 2 + t;
          if (sameBlock) {
            if (letter < prev) continue;
            if (letter === prev && chi !== 0) {
              const s = t ? -1 : 1;
              if ((s * chi < 0) === symMode) continue; // the row's orbit sum vanishes
            }
          }
          let v = (val * fall[ex * maxE + a]!) % p;
          if (b) v = (v * fall[ey * maxE + b]!) % p;
          rec(i + 1, aRem - a, bRem - b, cRem - t, lin + a * xPow[i]! + (b ? b * xPow[yOff + i]! : 0), t ? tMask | (1 << i) : tMask, v, letter);
        }
      }
    }
  };

  for (let t = 0; t < seed.count; t++) {
    off = t * n;
    gx = seed.xs;
    gy = seed.ys;
    gMask = seed.masks[t]!;
    gKey = seed.keys[t]!;
    gCoeff = seed.coeffs[t]!;
    for (let i = n - 1; i >= 0; i--) {
      sufX[i] = sufX[i + 1]! + gx[off + i]!;
      sufY[i] = sufY[i + 1]! + (sp.hasY ? gy[off + i]! : 0);
      sufT[i] = sufT[i + 1]! + ((gMask >> i) & 1);
    }
    if (sufX[0]! < A || sufY[0]! < B || sufT[0]! < C) continue;
    rec(0, A, B, C, 0, 0, 1, -1);
  }
  return { ...eliminateRows(rowIndex.size, rowsArr, colsArr, valsArr, len, folder.columns, p), entries: len };
}

/** Rank of the COO matrix, row by row, stopping once the rank reaches the column count. */
export function eliminateRows(
  nRows: number,
  rowsArr: Int32Array,
  colsArr: Int32Array,
  valsArr: Float64Array,
  len: number,
  nCols: number,
  p: number,
): { rank: number; rows: number; columns: number } {
  if (nRows === 0 || nCols === 0) return { rank: 0, rows: nRows, columns: nCols };
  const start = new Int32Array(nRows + 1);
  for (let e = 0; e < len; e++) start[rowsArr[e]! + 1]!++;
  for (let r = 0; r < nRows; r++) start[r + 1]! += start[r]!;
  const fill = start.slice(0, nRows);
  const cols = new Int32Array(len);
  const vals = new Float64Array(len);
  for (let e = 0; e < len; e++) {
    const r = rowsArr[e]!;
    const at = fill[r]!++;
    cols[at] = colsArr[e]!;
    vals[at] = valsArr[e]!;
  }
  // sparse rows first: they are cheap and often carry the pivots
  const order = Array.from({ length: nRows }, (_, r) => r).sort((a, b) => start[a + 1]! - start[a]! - (start[b + 1]! - start[b]!));
  const ech = new EchelonModP(p, nCols);
  for (const r of order) {
    ech.insert(cols.subarray(start[r]!), vals.subarray(start[r]!), start[r + 1]! - start[r]!);
    if (ech.rank === nCols) break;
  }
  return { rank: ech.rank, rows: nRows, columns: nCols };
}
