/**
 * The data of the quotient route's tasks (structured-clonable, so worker pools can carry them):
 * the ideal's generators, the Young functionals, and which cells a task visits.
 */
import type { CellDegree } from './cell-orbits.js';

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
  /** One elimination per prime over rows built once; certificate cells go to the first prime only. */
  readonly primes: readonly number[];
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
  readonly primes: readonly number[];
  /** Every cell computed. */
  readonly degrees: readonly (readonly [number, number, number])[];
  /** dims[prime index][cell]: the dimension of the cell's G,χ-part (−1: not computed for that prime). */
  readonly dims: readonly (readonly number[])[];
  /** Which cells are certificates (computed for the first prime only). */
  readonly certificate: readonly boolean[];
  /** Representatives (columns), rows reduced, rows that reduced to zero, stored-row entries applied. */
  readonly stats: { readonly columns: number; readonly rows: number; readonly zero: number; readonly applied: number };
}

/** The cells of total degree d that the task computes, in the order it visits them. */
export function cellsOfTotal(input: QuotientTaskInput, task: Pick<QuotientTask, 'xyBounds' | 'certify'>, d: number): { cell: CellDegree; certificate: boolean }[] {
  const out: { cell: CellDegree; certificate: boolean }[] = [];
  const xMax = input.xCap !== undefined ? (input.xCap - 1) * input.n : Infinity;
  for (let t = input.hasTheta ? Math.min(d, input.n) : 0; t >= 0; t--) {
    const s = d - t;
    const bound = task.xyBounds[t] ?? -1;
    if (s <= bound) {
      for (let y = input.hasY ? s : 0; y >= 0; y--) if (s - y <= xMax) out.push({ cell: { x: s - y, y, theta: t }, certificate: false });
    } else if (task.certify && s === bound + 1) {
      const y = input.hasY ? Math.floor(s / 2) : 0;
      out.push({ cell: { x: s - y, y, theta: t }, certificate: true }); // beyond the x-cap: no representatives, zero
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
