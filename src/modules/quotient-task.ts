/**
 * One task of the quotient route: the dimensions of (R/I)^{G,χ} in every multidegree cell, for
 * one Young subgroup G with a character χ (young-plan) and one prime. The G,χ-part of I is
 * spanned by the folded products g·m (generator g, m an orbit representative of the
 * complementary degree); the cell's dimension is #representatives − rank.
 *
 * Most of those products are redundant, and an incremental criterion in the manner of
 * signature-based Gröbner algorithms (Faugère's F5) skips them before they are built: with
 * generators taken in a fixed order and cells by increasing total degree, the product g_k·m
 * lies in the span of products of earlier generators and of g_k·m' with m' below m whenever
 * m is the lead of some element of (g_1, …, g_{k−1}) in its own cell (multiply that element
 * by g_k: the syzygy gives the dependency). Every stored row remembers the generator that
 * made it, so each cell records, for every representative, which generator first led there.
 *
 * The task is a pure function of structured-clonable data (worker pools can run it).
 */
import { InputError } from '../core/errors.js';
import { CellOrbits, type CellDegree } from './cell-orbits.js';
import { SparseEchelonModP } from './sparse-echelon.js';
import { KeyTable } from './key-table.js';
import { RowBuilder, type GeneratorTerm } from './quotient-rows.js';

export interface QuotientGenerator {
  /** (x-, y-, θ-degree). */
  readonly degree: readonly [number, number, number];
  /** Character of S_n on the generator: 'sym' invariant, 'alt' the sign. */
  readonly character: 'sym' | 'alt';
  /** Σ_i x_i^a y_i^b θ_i^c, when the generator is such a power sum (the fast path). */
  readonly power?: readonly [number, number, number];
  /** Otherwise its terms (coefficients as integer numerator / positive denominator, decimal). */
  readonly terms?: readonly { readonly x: readonly number[]; readonly y: readonly number[]; readonly mask: number; readonly num: string; readonly den: string }[];
}

export interface QuotientFunctional {
  /** Block sizes of the Young subgroup. */
  readonly blocks: readonly number[];
  /** Per block: true for the sign character. */
  readonly alt: readonly boolean[];
  readonly label: string;
}

export interface QuotientTaskInput {
  readonly n: number;
  readonly hasY: boolean;
  readonly hasTheta: boolean;
  /** Generators in processing order (by total degree). */
  readonly generators: readonly QuotientGenerator[];
  /** Letters with x-exponent ≥ xCap lie in the ideal (⟨x_i^xCap⟩ among the generators). */
  readonly xCap?: number;
  readonly functionals: readonly QuotientFunctional[];
}

export interface QuotientTask {
  readonly functional: number;
  readonly prime: number;
  /** For each θ-degree c: the cells with x-degree + y-degree ≤ xyBounds[c] (−1: none). */
  readonly xyBounds: readonly number[];
  /**
   * Also the certificate cell of each θ-degree, one x+y degree higher: the quotient vanishes
   * there, and so beyond, when this cell does (with y only its middle cell: the ideal is
   * stable under Σ x_i∂/∂y_i and Σ y_i∂/∂x_i, so every piece of fixed θ-degree and x+y degree
   * is an sl_2-module, and a nonzero one has a weight in the middle).
   */
  readonly certify: boolean;
}

export interface QuotientTaskResult {
  readonly functional: number;
  readonly prime: number;
  /** Every cell computed, with the dimension of its G,χ-part. */
  readonly degrees: readonly (readonly [number, number, number])[];
  readonly dims: readonly number[];
  /** Representatives (columns), rows reduced, rows that reduced to zero, stored-row entries applied. */
  readonly stats: { readonly columns: number; readonly rows: number; readonly zero: number; readonly applied: number };
}

/** The cells of total degree d that the task computes, in the order it visits them. */
export function cellsOfTotal(input: QuotientTaskInput, task: Pick<QuotientTask, 'xyBounds' | 'certify'>, d: number): CellDegree[] {
  const out: CellDegree[] = [];
  const xMax = input.xCap !== undefined ? (input.xCap - 1) * input.n : Infinity;
  for (let t = input.hasTheta ? Math.min(d, input.n) : 0; t >= 0; t--) {
    const s = d - t;
    const bound = task.xyBounds[t] ?? -1;
    if (s <= bound) {
      for (let y = input.hasY ? s : 0; y >= 0; y--) if (s - y <= xMax) out.push({ x: s - y, y, theta: t });
    } else if (task.certify && s === bound + 1) {
      const y = input.hasY ? Math.floor(s / 2) : 0;
      out.push({ x: s - y, y, theta: t }); // no representatives beyond the x-cap: zero, as it must
    }
  }
  return out;
}

/** Largest total degree the task visits. */
export function topDegree(task: Pick<QuotientTask, 'xyBounds' | 'certify'>): number {
  return Math.max(0, ...task.xyBounds.map((b, t) => b + t + (task.certify ? 1 : 0)));
}

/** The radix of y-exponents in universal letters. */
export function yRadixOf(input: QuotientTaskInput, maxDegree: number): number {
  return input.hasY ? maxDegree + 1 : 1;
}

interface CellData {
  /** Representative codes, increasing (the column order). */
  readonly codes: Float64Array;
  /** Index of the generator whose row leads at each representative, or −1. */
  readonly creator: Int16Array;
  readonly orbits: CellOrbits;
}

export function runQuotientTask(input: QuotientTaskInput, task: QuotientTask, onCell?: (columns: number) => void, signal?: AbortSignal): QuotientTaskResult {
  const { n, generators } = input;
  const fn = input.functionals[task.functional];
  if (!fn) throw new InputError(`no functional ${task.functional}`, 'functional');
  const p = task.prime;
  const maxDegree = topDegree(task);
  const yR = yRadixOf(input, maxDegree);
  const terms = generators.map((g) => g.terms?.map((t): GeneratorTerm => ({ x: t.x, y: t.y, mask: t.mask, coeff: residue(t.num, t.den, p) })));
  const maxGenTotal = Math.max(0, ...generators.map((g) => g.degree[0] + g.degree[1] + g.degree[2]));
  const flipped = fn.alt.map((a) => !a);
  const cells = new Map<string, CellData>();
  const degrees: [number, number, number][] = [];
  const dims: number[] = [];
  const stats = { columns: 0, rows: 0, zero: 0, applied: 0 };
  const letters = new Int32Array(n);
  const rows = new RowBuilder(n, p, yR);

  for (let total = 0; total <= maxDegree; total++) {
    for (const cell of cellsOfTotal(input, task, total)) {
      signal?.throwIfAborted();
      const orbits = new CellOrbits(n, fn.blocks, fn.alt, yR, cell, input.xCap);
      const codeList: number[] = [];
      orbits.enumerate((_, code) => codeList.push(code));
      // columns by increasing code: rows come with small leads first, and reduce through short chains
      const codes = Float64Array.from(codeList).sort();
      // a flat table when the code range is small against the columns, hashed otherwise
      const column = new KeyTable(orbits.range <= Math.max(1 << 16, 8 * codes.length) ? orbits.range : Infinity);
      codes.forEach((c, i) => column.set(c, i));
      const ech = new SparseEchelonModP(p, codes.length);
      const addRow = (g: QuotientGenerator, k: number, m: Int32Array): void => {
        const len = rows.build(g, terms[k], m, orbits, column);
        if (len === 0) return;
        stats.rows++;
        if (!ech.insert(rows.cols, rows.vals, len, k)) stats.zero++;
      };
      for (let k = 0; k < generators.length && ech.rank < codes.length; k++) {
        const g = generators[k]!;
        const from = { x: cell.x - g.degree[0], y: cell.y - g.degree[1], theta: cell.theta - g.degree[2] };
        if (from.x < 0 || from.y < 0 || from.theta < 0) continue;
        if (g.character === 'alt') {
          // g·π_{χ·sgn}(m): the multipliers are representatives for the twisted character
          new CellOrbits(n, fn.blocks, flipped, yR, from, input.xCap).enumerate((m) => addRow(g, k, m));
          continue;
        }
        const src = cells.get(key(from));
        if (!src) {
          // a certificate cell's multiplier cell may lie outside the task: all its representatives
          new CellOrbits(n, fn.blocks, fn.alt, yR, from, input.xCap).enumerate((m) => addRow(g, k, m));
          continue;
        }
        // an odd generator squares to zero, so g_k·(g_k·a + earlier) lies among earlier rows too
        const limit = g.degree[2] % 2 === 1 ? k + 1 : k;
        for (let r = 0; r < src.codes.length && ech.rank < codes.length; r++) {
          const c = src.creator[r]!;
          if (c >= 0 && c < limit) continue; // the criterion: m leads an element of (g_1, …, g_{k−1})
          src.orbits.decode(src.codes[r]!, letters);
          addRow(g, k, letters);
        }
      }
      const creator = new Int16Array(codes.length);
      for (let r = 0; r < codes.length; r++) creator[r] = ech.tagAt(r);
      cells.set(key(cell), { codes, creator, orbits });
      degrees.push([cell.x, cell.y, cell.theta]);
      dims.push(codes.length - ech.rank);
      stats.columns += codes.length;
      stats.applied += ech.applied;
      onCell?.(codes.length);
    }
    // a cell serves as multiplier cell up to one generator degree above it
    for (const [k, c] of cells) if (c.orbits.degree.x + c.orbits.degree.y + c.orbits.degree.theta < total - maxGenTotal) cells.delete(k);
  }
  return { functional: task.functional, prime: p, degrees, dims, stats };
}

function key(d: CellDegree): string {
  return `${d.x},${d.y},${d.theta}`;
}

function residue(num: string, den: string, p: number): number {
  const P = BigInt(p);
  const a = ((BigInt(num) % P) + P) % P;
  const b = ((BigInt(den) % P) + P) % P;
  if (b === 0n) throw new InputError(`a coefficient's denominator ${den} vanishes mod ${p}`, 'prime');
  let inv = 1n;
  let base = b;
  let e = P - 2n;
  while (e > 0n) {
    if (e & 1n) inv = (inv * base) % P;
    base = (base * base) % P;
    e >>= 1n;
  }
  return Number((a * inv) % P);
}
