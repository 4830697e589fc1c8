/**
 * All graded pieces of a derivative closure for one Young-subgroup task in one pass
 * (design note): for each seed term γ, every S_μ-orbit representative of one side — the
 * operator monomial ∂x^α ∂y^β ∂θ_T or the target γ − g, whichever has strict representatives —
 * contributes c(γ)·Π γ!/(γ−α)!·(θ sign)·(fold sign) at (row = operator class, column = target
 * class); the other side is folded. No derivative is stored. Several seeds (all
 * (anti)symmetric alike) may feed the same matrices: their closures add up (polarized
 * closures normal-order into derivatives of polarized seeds). Values are exact integers
 * (modulus 0, the caller guarantees |entries| < 2^53) or residues mod `modulus`. Cells are
 * indexed by target degree in the box [0, box.x) × [0, box.y) × [0, box.theta).
 */
import { KeyTable } from './key-table.js';
import type { SeedSupport } from './seed-support.js';
import type { SuperSpace } from './superspace.js';
import { thetaDerivativeSign } from './superspace.js';
import { blockOf, YoungFolder, type FoldMode } from './young-fold.js';

export interface RankTask {
  readonly blocks: readonly number[];
  readonly mode: FoldMode;
}

/** Seed character under transpositions: −1 (sign), +1 (trivial), 0 (neither: no row pruning). */
export type SeedChi = -1 | 0 | 1;

export interface CellMatrix {
  rows: number;
  cols: number;
  len: number;
  r: Int32Array;
  c: Int32Array;
  v: Float64Array;
}

export interface DegreeBox {
  readonly x: number;
  readonly y: number;
  readonly theta: number;
}

export interface OpFamilies {
  readonly x: boolean;
  readonly y: boolean;
  readonly theta: boolean;
}

export function boxIndex(box: DegreeBox, dx: number, dy: number, dt: number): number {
  return (dx * box.y + dy) * box.theta + dt;
}

interface SideTables {
  readonly fold: KeyTable;
  readonly index: KeyTable;
}

export class DerivativeMatrixBuilder {
  readonly cells: CellMatrix[] = [];
  private readonly targetTables: SideTables;
  private readonly repIsOp: boolean;
  private readonly folder: YoungFolder;
  private readonly repKill: number;
  private readonly foldKill: number;
  private readonly block: Int32Array;
  private readonly fall: Float64Array;

  constructor(
    readonly space: SuperSpace,
    readonly box: DegreeBox,
    readonly task: RankTask,
    readonly chi: SeedChi,
    readonly modulus: number,
    private readonly singleSeed: boolean,
  ) {
    const count = box.x * box.y * box.theta;
    for (let i = 0; i < count; i++) this.cells.push({ rows: 0, cols: 0, len: 0, r: new Int32Array(64), c: new Int32Array(64), v: new Float64Array(64) });
    // Enumerate the side whose fold kills repeated θ-free letters (strict representatives, far
    // fewer); fold the other. The operator side folds with the seed's character folded in
    // (design note: C(σg) = χ(σ) σ C(g)).
    const targetMode: FoldMode = task.mode;
    const opMode: FoldMode = (task.mode === 'alt') !== (chi === -1) ? 'alt' : 'sym';
    this.repIsOp = opMode === 'alt' || targetMode !== 'alt';
    this.folder = new YoungFolder(space, task.blocks, this.repIsOp ? targetMode : opMode);
    this.repKill = (this.repIsOp ? opMode : targetMode) === 'sym' ? 1 : 0;
    this.foldKill = (this.repIsOp ? targetMode : opMode) === 'sym' ? 1 : 0;
    this.block = blockOf(space.n, task.blocks);
    this.targetTables = this.newTables();
    const R = space.radix;
    this.fall = new Float64Array(R * R);
    for (let e = 0; e < R; e++) {
      let v = 1;
      for (let a = 0; a <= e; a++) {
        this.fall[e * R + a] = v;
        v = modulus ? (v * (e - a)) % modulus : v * (e - a);
      }
    }
  }

  private newTables(): SideTables {
    // per-seed operator tables are many and sparse: hashed; a single seed may use flat tables
    const bound = this.singleSeed ? this.space.keyBound : Number.POSITIVE_INFINITY;
    return { fold: new KeyTable(bound), index: new KeyTable(bound) };
  }

  /** Add the entries of one seed's derivative maps, for the operator families given. */
  addSeed(seed: SeedSupport, ops: OpFamilies): void {
    const sp = this.space;
    const n = sp.n;
    const R = sp.radix;
    const { modulus, chi, box, block, fall, repIsOp, folder, repKill, foldKill } = this;
    const [Sx, Sy, St] = seed.degree;
    const range = { x: ops.x ? Sx : 0, y: ops.y ? Sy : 0, theta: ops.theta ? St : 0 };
    const opTables = this.singleSeed ? this.sharedOp() : this.newTables();
    const foldT = repIsOp ? this.targetTables.fold : opTables.fold;
    const foldIdx = repIsOp ? this.targetTables.index : opTables.index;
    const repIdx = repIsOp ? opTables.index : this.targetTables.index;
    const foldArr = foldT.array;
    const foldIdxArr = foldIdx.array;
    const repArr = repIdx.array;
    const cells = this.cells;
    const xPow = sp.powers;
    const base = sp.maskBase;
    const hasY = sp.hasY;
    const xs = seed.xs;
    const ys = seed.ys;
    let off = 0;
    let gMask = 0;
    let gKey = 0;
    let gCoeff = 0;

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

    const leaf = (aTot: number, bTot: number, cTot: number, lin: number, tMask: number, val: number): void => {
      const cell = cells[boxIndex(box, Sx - aTot, Sy - bTot, St - cTot)]!;
      const opKey = lin * base + tMask;
      const target = gKey - (lin * base + gMask) + (gMask & ~tMask);
      const foldKey = repIsOp ? target : opKey;
      const repKey = repIsOp ? opKey : target;
      let code = foldArr ? foldArr[foldKey]! : foldT.get(foldKey);
      if (code === -2) {
        const rep = folder.repOf(foldKey);
        if (rep < 0) code = -1;
        else {
          const parity = rep % 2;
          const rk = (rep - parity) / 2;
          let idx = foldIdxArr ? foldIdxArr[rk]! : foldIdx.get(rk);
          if (idx === -2) {
            idx = repIsOp ? cell.cols++ : cell.rows++;
            if (foldIdxArr) foldIdxArr[rk] = idx;
            else foldIdx.set(rk, idx);
          }
          code = 2 * idx + parity;
        }
        if (foldArr) foldArr[foldKey] = code;
        else foldT.set(foldKey, code);
      }
      if (code < 0) return;
      let v = modulus ? (val * gCoeff) % modulus : val * gCoeff;
      if (v === 0) return;
      if ((thetaDerivativeSign(tMask, gMask) < 0) !== ((code & 1) === 1)) v = -v;
      let r = repArr ? repArr[repKey]! : repIdx.get(repKey);
      if (r === -2) {
        r = repIsOp ? cell.rows++ : cell.cols++;
        if (repArr) repArr[repKey] = r;
        else repIdx.set(repKey, r);
      }
      if (repIsOp) push(cell, r, code >> 1, v);
      else push(cell, code >> 1, r, v);
    };

    // letters of the folded side already used in each block (a repetition kills the fold)
    const letterSpace = 2 * R * R;
    const used = new Uint8Array(this.task.blocks.length * letterSpace);

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
  }

  private opShared: SideTables | undefined;
  private sharedOp(): SideTables {
    this.opShared ??= this.newTables();
    return this.opShared;
  }
}
