/**
 * All graded pieces of a derivative closure for one Young-subgroup task in a single pass
 * (design note): for each seed term γ, every S_μ-orbit representative g ≤ γ of an operator
 * monomial ∂x^α ∂y^β ∂θ_T contributes the entry c(γ)·Π γ!/(γ−α)!·(θ sign)·(fold sign) at
 * (row g, column = representative of the target γ − g). No derivative is stored. Values are
 * exact integers when the caller guarantees they stay below 2^53 (`modulus` 0), else
 * residues mod `modulus`. Rows and columns are numbered per cell (operator degree).
 */
import { KeyTable } from './key-table.js';
import type { SeedSupport } from './seed-support.js';
import { thetaDerivativeSign } from './superspace.js';
import { blockOf, YoungFolder, type FoldMode } from './young-fold.js';

export interface RankTask {
  readonly blocks: readonly number[];
  readonly mode: FoldMode;
}

/** Seed character under transpositions: −1 (sign), +1 (trivial), 0 (neither: no row pruning). */
export type SeedChi = -1 | 0 | 1;

export interface CellMatrix {
  readonly opDegree: readonly [number, number, number];
  rows: number;
  cols: number;
  len: number;
  r: Int32Array;
  c: Int32Array;
  v: Float64Array;
}

export interface OperatorRange {
  readonly x: number;
  readonly y: number;
  readonly theta: number;
}

export function cellIndex(range: OperatorRange, a: number, b: number, c: number): number {
  return (a * (range.y + 1) + b) * (range.theta + 1) + c;
}

export function derivativeMatrices(seed: SeedSupport, range: OperatorRange, task: RankTask, chi: SeedChi, modulus: number): CellMatrix[] {
  const sp = seed.space;
  const n = sp.n;
  const R = sp.radix;
  const block = blockOf(n, task.blocks);
  const cells: CellMatrix[] = [];
  for (let a = 0; a <= range.x; a++)
    for (let b = 0; b <= range.y; b++)
      for (let c = 0; c <= range.theta; c++) cells.push({ opDegree: [a, b, c], rows: 0, cols: 0, len: 0, r: new Int32Array(64), c: new Int32Array(64), v: new Float64Array(64) });
  const bound = sp.keyBound;
  const foldTable = new KeyTable(bound); // folded-side key -> 2·index + parity, or −1
  const rowTable = new KeyTable(bound); // representative-side key -> its index in the cell
  const foldArr = foldTable.array; // the flat tables when the key range allows (hot path)
  const rowArr = rowTable.array;
  const fall = new Float64Array(R * R);
  for (let e = 0; e < R; e++) {
    let v = 1;
    for (let a = 0; a <= e; a++) {
      fall[e * R + a] = v;
      v = modulus ? (v * (e - a)) % modulus : v * (e - a);
    }
  }
  const push = (cell: CellMatrix, r: number, c: number, v: number): void => {
    if (cell.len === cell.r.length) {
      const cap = cell.r.length * 2;
      const r2 = new Int32Array(cap);
      r2.set(cell.r);
      cell.r = r2;
      const c2 = new Int32Array(cap);
      c2.set(cell.c);
      cell.c = c2;
      const v2 = new Float64Array(cap);
      v2.set(cell.v);
      cell.v = v2;
    }
    cell.r[cell.len] = r;
    cell.c[cell.len] = c;
    cell.v[cell.len] = v;
    cell.len++;
  };
  const xPow = sp.powers;
  const base = sp.maskBase;
  const hasY = sp.hasY;
  const yStride = range.theta + 1;
  const xStride = (range.y + 1) * yStride;
  let off = 0;
  let gMask = 0;
  let gKey = 0;
  let gCoeff = 0;
  const xs = seed.xs;
  const ys = seed.ys;

  // Which side is enumerated as orbit representatives: the one whose fold kills repeated
  // θ-free letters (strict representatives, far fewer); the other side is folded. The
  // operator side folds with the seed's character folded in (design note: C(σg) = χ(σ) σ C(g)).
  const targetMode: FoldMode = task.mode;
  const opMode: FoldMode = (task.mode === 'alt') !== (chi === -1) ? 'alt' : 'sym';
  const repIsOp = opMode === 'alt' || targetMode !== 'alt';
  const folder = new YoungFolder(sp, task.blocks, repIsOp ? targetMode : opMode);
  const repKill = (repIsOp ? opMode : targetMode) === 'sym' ? 1 : 0; // θ-bit of letters whose repetition kills
  const foldKill = (repIsOp ? targetMode : opMode) === 'sym' ? 1 : 0;
  const foldCols = new KeyTable(bound); // representative of the folded side -> index in its cell
  const foldColArr = foldCols.array;

  const leaf = (aTot: number, bTot: number, cTot: number, lin: number, tMask: number, val: number): void => {
    const cell = cells[aTot * xStride + bTot * yStride + cTot]!;
    const opKey = lin * base + tMask;
    const target = gKey - (lin * base + gMask) + (gMask & ~tMask);
    const foldKey = repIsOp ? target : opKey;
    const repKey = repIsOp ? opKey : target;
    let code = foldArr ? foldArr[foldKey]! : foldTable.get(foldKey);
    if (code === -2) {
      const rep = folder.repOf(foldKey);
      if (rep < 0) code = -1;
      else {
        const parity = rep % 2;
        const rk = (rep - parity) / 2;
        let idx = foldColArr ? foldColArr[rk]! : foldCols.get(rk);
        if (idx === -2) {
          idx = repIsOp ? cell.cols++ : cell.rows++;
          if (foldColArr) foldColArr[rk] = idx;
          else foldCols.set(rk, idx);
        }
        code = 2 * idx + parity;
      }
      if (foldArr) foldArr[foldKey] = code;
      else foldTable.set(foldKey, code);
    }
    if (code < 0) return;
    let v = modulus ? (val * gCoeff) % modulus : val * gCoeff;
    if (v === 0) return;
    if ((thetaDerivativeSign(tMask, gMask) < 0) !== ((code & 1) === 1)) v = -v;
    let r = rowArr ? rowArr[repKey]! : rowTable.get(repKey);
    if (r === -2) {
      r = repIsOp ? cell.rows++ : cell.cols++;
      if (rowArr) rowArr[repKey] = r;
      else rowTable.set(repKey, r);
    }
    if (repIsOp) push(cell, r, code >> 1, v);
    else push(cell, code >> 1, r, v);
  };

  // letters of the folded side already used in each block (a repetition kills the fold)
  const letterSpace = 2 * R * R;
  const used = new Uint8Array(task.blocks.length * letterSpace);

  const rec = (i: number, aTot: number, bTot: number, cTot: number, lin: number, tMask: number, val: number, prev: number): void => {
    if (i === n) {
      leaf(aTot, bTot, cTot, lin, tMask, val);
      return;
    }
    const ex = xs[off + i]!;
    const ey = hasY ? ys[off + i]! : 0;
    const si = (gMask >> i) & 1;
    const sameBlock = i > 0 && block[i] === block[i - 1];
    const maxA = Math.min(ex, range.x - aTot);
    const maxB = Math.min(ey, range.y - bTot);
    const maxT = si && cTot < range.theta ? 1 : 0;
    for (let a = 0; a <= maxA; a++) {
      const va = a ? (modulus ? (val * fall[ex * R + a]!) % modulus : val * fall[ex * R + a]!) : val;
      const la = lin + a * xPow[i]!;
      for (let b = 0; b <= maxB; b++) {
        const vb = b ? (modulus ? (va * fall[ey * R + b]!) % modulus : va * fall[ey * R + b]!) : va;
        for (let t = 0; t <= maxT; t++) {
          const opLetter = (a * R + b) * 2 + t;
          const tgLetter = ((ex - a) * R + (ey - b)) * 2 + (si - t);
          const repLetter = repIsOp ? opLetter : tgLetter;
          const foldLetter = repIsOp ? tgLetter : opLetter;
          if (sameBlock && chi !== 0) {
            if (repLetter < prev) continue;
            if (repLetter === prev && repLetter % 2 === repKill) continue; // the orbit sum vanishes
          }
          const next = b ? la + b * xPow[n + i]! : la;
          const mask = t ? tMask | (1 << i) : tMask;
          if (chi !== 0 && foldLetter % 2 === foldKill) {
            const u = block[i]! * letterSpace + foldLetter;
            if (used[u]) continue;
            used[u] = 1;
            rec(i + 1, aTot + a, bTot + b, cTot + t, next, mask, vb, repLetter);
            used[u] = 0;
          } else rec(i + 1, aTot + a, bTot + b, cTot + t, next, mask, vb, repLetter);
        }
      }
    }
  };

  for (let t = 0; t < seed.count; t++) {
    off = t * n;
    gMask = seed.masks[t]!;
    gKey = seed.keys[t]!;
    gCoeff = seed.coeffs[t]!;
    rec(0, 0, 0, 0, 0, 0, 1, -1);
  }
  return cells;
}
