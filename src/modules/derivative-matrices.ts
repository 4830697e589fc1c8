/**
 * All graded pieces of a derivative closure for one Young-subgroup task in one pass:
 * for each seed term γ, every S_μ-orbit representative of one side — the
 * operator monomial ∂x^α ∂y^β ∂θ_T or the target γ − g, whichever has strict representatives —
 * contributes c(γ)·Π γ!/(γ−α)!·(θ sign)·(fold sign) at (row = operator class, column = target
 * class); the other side is folded (sorted block by block as the enumeration completes each
 * block), and both are numbered through compact orbit codes (block-code.ts). Each block of
 * the task may carry its own character (young-plan). No derivative is stored. Several seeds (all
 * (anti)symmetric alike) may feed the same matrices: their closures add up (polarized
 * closures normal-order into derivatives of polarized seeds). Values are exact integers
 * (modulus 0, the caller guarantees |entries| < 2^53) or residues mod `modulus`. Cells are
 * indexed by target degree in the box [0, box.x) × [0, box.y) × [0, box.theta).
 */
import { KeyTable } from './key-table.js';
import type { SeedSupport } from './seed-support.js';
import type { SuperSpace } from './superspace.js';
import { thetaDerivativeSign } from './superspace.js';
import { BlockCoder } from './block-code.js';
import { blockOf, type FoldMode } from './young-fold.js';

export interface RankTask {
  readonly blocks: readonly number[];
  /** Character of each block on the targets. */
  readonly modes: readonly FoldMode[];
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
  /** The same entries mod the second prime (builders with modulus2, seeds with coeffs2). */
  v2?: Float64Array;
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

export class DerivativeMatrixBuilder {
  readonly cells: CellMatrix[] = [];
  private readonly targetIndex: KeyTable;
  /** Per position (constant on blocks): 1 when the operator side is enumerated as representatives. */
  private readonly repIsOp: Uint8Array;
  /** Per position: 1 when the folded side's block carries the sign character. */
  private readonly foldAlt: Uint8Array;
  /** Per position: the θ bit (1) or θ-free (0) kind of letter whose repetition kills the orbit sum, on each side. */
  private readonly repKill: Uint8Array;
  private readonly foldKill: Uint8Array;
  private readonly block: Int32Array;
  private readonly blockStart: Int32Array;
  private readonly blockEnd: Uint8Array;
  private readonly coder: BlockCoder;
  private readonly fall: Float64Array;
  private readonly fall2: Float64Array;

  constructor(
    readonly space: SuperSpace,
    readonly box: DegreeBox,
    readonly task: RankTask,
    readonly chi: SeedChi,
    readonly modulus: number,
    private readonly singleSeed: boolean,
    /** A second prime whose entries are made in the same enumeration (0: none). */
    readonly modulus2 = 0,
  ) {
    const count = box.x * box.y * box.theta;
    for (let i = 0; i < count; i++) this.cells.push({ rows: 0, cols: 0, len: 0, r: new Int32Array(64), c: new Int32Array(64), v: new Float64Array(64), ...(modulus2 ? { v2: new Float64Array(64) } : {}) });
    const n = space.n;
    this.block = blockOf(n, task.blocks);
    // In each block, enumerate the side whose fold kills repeated θ-free letters (strict
    // representatives, far fewer); fold the other. The operator side folds with the seed's
    // character folded in (the closure map intertwines: C(σg) = χ(σ) σ C(g)).
    this.repIsOp = new Uint8Array(n);
    this.foldAlt = new Uint8Array(n);
    this.repKill = new Uint8Array(n);
    this.foldKill = new Uint8Array(n);
    for (let i = 0; i < n; i++) {
      const targetMode = task.modes[this.block[i]!]!;
      const opMode: FoldMode = (targetMode === 'alt') !== (chi === -1) ? 'alt' : 'sym';
      const repIsOp = opMode === 'alt' || targetMode !== 'alt';
      const foldMode = repIsOp ? targetMode : opMode;
      this.repIsOp[i] = repIsOp ? 1 : 0;
      this.foldAlt[i] = foldMode === 'alt' ? 1 : 0;
      this.repKill[i] = (repIsOp ? opMode : targetMode) === 'sym' ? 1 : 0;
      this.foldKill[i] = foldMode === 'sym' ? 1 : 0;
    }
    this.blockStart = new Int32Array(n);
    this.blockEnd = new Uint8Array(n);
    for (let i = 0; i < n; i++) {
      this.blockStart[i] = i > 0 && this.block[i] === this.block[i - 1] ? this.blockStart[i - 1]! : i;
      this.blockEnd[i] = i === n - 1 || this.block[i + 1] !== this.block[i] ? 1 : 0;
    }
    this.coder = new BlockCoder(space, this.block);
    this.targetIndex = this.newIndex();
    this.fall = fallingTable(space.radix, modulus);
    this.fall2 = fallingTable(space.radix, modulus2);
  }

  /** Orbit code → row or column number in its cell. */
  private newIndex(): KeyTable {
    return new KeyTable(this.coder.range);
  }

  /** Add the entries of one seed's derivative maps, for the operator families given. */
  addSeed(seed: SeedSupport, ops: OpFamilies): void {
    const sp = this.space;
    const n = sp.n;
    const R = sp.radix;
    const { modulus, chi, box, block, blockStart, blockEnd, fall, repIsOp, foldAlt, repKill, foldKill } = this;
    const [Sx, Sy, St] = seed.degree;
    const range = { x: ops.x ? Sx : 0, y: ops.y ? Sy : 0, theta: ops.theta ? St : 0 };
    // one operator table for every seed, emptied between seeds: each seed's operators are rows of their own
    const opIndex = this.sharedOp();
    if (!this.singleSeed) opIndex.clear();
    const tgIndex = this.targetIndex;
    const opArr = opIndex.array;
    const tgArr = tgIndex.array;
    const { dense, term, letters: L } = this.coder;
    const cells = this.cells;
    const hasY = sp.hasY;
    const xs = seed.xs;
    const ys = seed.ys;
    let off = 0;
    let gMask = 0;
    let gCoeff = 0;
    let gCoeff2 = 0;
    const { modulus2, fall2 } = this;
    const coeffs2 = modulus2 ? seed.coeffs2 : undefined;
    if (modulus2 && !coeffs2) throw new RangeError('a builder with a second prime needs seeds with coeffs2');

    const push = (cell: CellMatrix, r: number, c: number, v: number, w: number): void => {
      if (cell.len === cell.r.length) {
        const cap = cell.r.length * 2;
        cell.r = grow(cell.r, new Int32Array(cap));
        cell.c = grow(cell.c, new Int32Array(cap));
        cell.v = grow(cell.v, new Float64Array(cap));
        if (cell.v2) cell.v2 = grow(cell.v2, new Float64Array(cap));
      }
      cell.r[cell.len] = r;
      cell.c[cell.len] = c;
      cell.v[cell.len] = v;
      if (cell.v2) cell.v2[cell.len] = w;
      cell.len++;
    };

    const leaf = (aTot: number, bTot: number, cTot: number, tMask: number, val: number, val2: number, opCode: number, tgCode: number, parity: number): void => {
      let v = modulus ? (val * gCoeff) % modulus : val * gCoeff;
      let w = modulus2 ? (val2 * gCoeff2) % modulus2 : 0;
      if (v === 0 && w === 0) return;
      if ((thetaDerivativeSign(tMask, gMask) < 0) !== (parity === 1)) {
        v = -v;
        w = -w;
      }
      const cell = cells[boxIndex(box, Sx - aTot, Sy - bTot, St - cTot)]!;
      let r = opArr ? opArr[opCode]! : opIndex.get(opCode);
      if (r === -2) {
        r = cell.rows++;
        opIndex.set(opCode, r); // once per row: through set, so clear() can undo it
      }
      let c = tgArr ? tgArr[tgCode]! : tgIndex.get(tgCode);
      if (c === -2) {
        c = cell.cols++;
        tgIndex.set(tgCode, c);
      }
      push(cell, r, c, v, w);
    };

    // letters of the folded side already used in each block (a repetition kills the fold)
    const letterSpace = 2 * R * R;
    const used = new Uint8Array(this.task.blocks.length * letterSpace);
    // the folded side's letters by position, and the current block sorted (its representative)
    const foldLetters = new Int32Array(n);
    const sorted = new Int32Array(n);

    // opCode and tgCode: the orbit codes of both sides so far (each block's representative
    // side adds its letters as they come, the folded side when its block is complete)
    const rec = (i: number, aTot: number, bTot: number, cTot: number, tMask: number, val: number, val2: number, prev: number, opCode: number, tgCode: number, parity: number): void => {
      if (i === n) {
        leaf(aTot, bTot, cTot, tMask, val, val2, opCode, tgCode, parity);
        return;
      }
      const ex = xs[off + i]!;
      const ey = hasY ? ys[off + i]! : 0;
      const si = (gMask >> i) & 1;
      const sameBlock = i > 0 && block[i] === block[i - 1];
      const maxA = Math.min(ex, range.x - aTot);
      const maxB = Math.min(ey, range.y - bTot);
      const maxT = si && cTot < range.theta ? 1 : 0;
      const last = blockEnd[i] === 1;
      const first = blockStart[i]!;
      const opRep = repIsOp[i] === 1;
      const alt = foldAlt[i] === 1;
      const rKill = repKill[i]!;
      const fKill = foldKill[i]!;
      for (let a = 0; a <= maxA; a++) {
        const va = a ? (modulus ? (val * fall[ex * R + a]!) % modulus : val * fall[ex * R + a]!) : val;
        const va2 = a && modulus2 ? (val2 * fall2[ex * R + a]!) % modulus2 : val2;
        for (let b = 0; b <= maxB; b++) {
          const vb = b ? (modulus ? (va * fall[ey * R + b]!) % modulus : va * fall[ey * R + b]!) : va;
          const vb2 = b && modulus2 ? (va2 * fall2[ey * R + b]!) % modulus2 : va2;
          for (let t = 0; t <= maxT; t++) {
            const opLetter = (a * R + b) * 2 + t;
            const tgLetter = ((ex - a) * R + (ey - b)) * 2 + (si - t);
            const repLetter = opRep ? opLetter : tgLetter;
            const foldLetter = opRep ? tgLetter : opLetter;
            if (sameBlock && chi !== 0) {
              if (repLetter < prev) continue;
              if (repLetter === prev && repLetter % 2 === rKill) continue; // the orbit sum vanishes
            }
            const mask = t ? tMask | (1 << i) : tMask;
            const repTerm = term[i * L + dense[repLetter]!]!;
            let oc = opRep ? opCode + repTerm : opCode;
            let tc = opRep ? tgCode : tgCode + repTerm;
            let par = parity;
            foldLetters[i] = foldLetter;
            if (last) {
              // the block is complete: sort its folded letters (insertion sort counts the
              // inversions: the sign for 'alt', and the θ re-sorting sign) and code them
              for (let u = first; u <= i; u++) {
                const l = foldLetters[u]!;
                let j = u - 1;
                while (j >= first && sorted[j]! > l) {
                  if (alt) par ^= 1;
                  if (sorted[j]! & l & 1) par ^= 1;
                  sorted[j + 1] = sorted[j]!;
                  j--;
                }
                sorted[j + 1] = l;
              }
              let fc = 0;
              for (let u = first; u <= i; u++) fc += term[u * L + dense[sorted[u]!]!]!;
              if (opRep) tc += fc;
              else oc += fc;
            }
            if (chi !== 0 && foldLetter % 2 === fKill) {
              const u = block[i]! * letterSpace + foldLetter;
              if (used[u]) continue;
              used[u] = 1;
              rec(i + 1, aTot + a, bTot + b, cTot + t, mask, vb, vb2, repLetter, oc, tc, par);
              used[u] = 0;
            } else rec(i + 1, aTot + a, bTot + b, cTot + t, mask, vb, vb2, repLetter, oc, tc, par);
          }
        }
      }
    };

    for (let t = 0; t < seed.count; t++) {
      off = t * n;
      gMask = seed.masks[t]!;
      gCoeff = seed.coeffs[t]!;
      gCoeff2 = coeffs2 ? coeffs2[t]! : 0;
      rec(0, 0, 0, 0, 0, 1, 1, -1, 0, 0, 0);
    }
  }

  private opShared: KeyTable | undefined;
  private sharedOp(): KeyTable {
    this.opShared ??= this.newIndex();
    return this.opShared;
  }
}

/** Π_{0≤a'<a} (e − a') at [e · radix + a], reduced mod the modulus when it is not 0. */
function fallingTable(radix: number, modulus: number): Float64Array {
  const fall = new Float64Array(radix * radix);
  for (let e = 0; e < radix; e++) {
    let v = 1;
    for (let a = 0; a <= e; a++) {
      fall[e * radix + a] = v;
      v = modulus ? (v * (e - a)) % modulus : v * (e - a);
    }
  }
  return fall;
}

function grow<T extends Int32Array | Float64Array>(old: T, into: T): T {
  into.set(old);
  return into;
}
