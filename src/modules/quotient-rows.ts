/**
 * The rows of the quotient route: the folded product g·m of a generator and an orbit
 * representative, as (column, value) pairs of the target cell; values are residues mod p, or
 * exact integers when the builder's modulus is 0 (integer generators: one build serves every
 * prime). Power sums
 * Σ_i x_i^a y_i^b θ_i^c (every built-in generator but the elementary ones) add one letter
 * vector at each position in turn; other generators multiply term by term. The θ sign of
 * g·m puts the generator's θ's first (θ_T θ_S re-sorted), then the fold adds the sorting sign.
 */
import { CellOrbits } from './cell-orbits.js';
import type { KeyTable } from './key-table.js';
import type { QuotientGenerator } from './quotient-spec.js';
import { thetaProductSign } from './superspace.js';

export interface GeneratorTerm {
  readonly x: readonly number[];
  readonly y: readonly number[];
  readonly mask: number;
  /** Residue mod p, or the integer itself with modulus 0. */
  readonly coeff: number;
}

export class RowBuilder {
  cols = new Int32Array(64);
  vals = new Float64Array(64);
  len = 0;
  private codes = new Float64Array(64);
  private readonly product: Int32Array;
  private readonly work: Int32Array;

  constructor(
    readonly n: number,
    readonly p: number,
    readonly yRadix: number,
  ) {
    this.product = new Int32Array(n);
    this.work = new Int32Array(n);
  }

  /** The row's values as residues mod q (after an exact build). */
  residues(q: number, out: Float64Array): Float64Array {
    const o = out.length < this.len ? new Float64Array(this.vals.length) : out;
    for (let i = 0; i < this.len; i++) {
      const v = this.vals[i]! % q;
      o[i] = v < 0 ? v + q : v;
    }
    return o;
  }

  /**
   * Build the row of g·m in the cell of `orbits` (columns through `column`: code → index);
   * returns its length (entries in `cols`, `vals`, distinct columns, nonzero residues).
   */
  build(g: QuotientGenerator, terms: readonly GeneratorTerm[] | undefined, m: Int32Array, orbits: CellOrbits, column: KeyTable): number {
    const { n, p, product, work } = this;
    this.len = 0;
    if (g.power) {
      const [a, b, c] = g.power;
      const shift = (a * this.yRadix + b) * 2 + c;
      const mCode = orbits.codeOf(m);
      let thetaBefore = 0;
      for (let i = 0; i < n; i++) {
        const u = m[i]!;
        if (!(c && u & 1)) {
          const code = orbits.foldRaised(m, mCode, i, u + shift);
          if (code >= 0) this.push(code, (orbits.parity ^ (c ? thetaBefore & 1 : 0)) === 1 ? (p ? p - 1 : -1) : 1);
        }
        thetaBefore += u & 1;
      }
    } else {
      let mMask = 0;
      for (let i = 0; i < n; i++) if (m[i]! & 1) mMask |= 1 << i;
      for (const t of terms!) {
        if (t.mask & mMask) continue;
        for (let i = 0; i < n; i++) product[i] = m[i]! + ((t.x[i]! * this.yRadix + (t.y[i] ?? 0)) * 2 + ((t.mask >> i) & 1));
        const code = orbits.fold(product, work);
        if (code < 0) continue;
        const neg = (orbits.parity === 1) !== (thetaProductSign(t.mask, mMask) < 0);
        this.push(code, neg ? (p ? (p - t.coeff) % p : -t.coeff) : t.coeff);
      }
    }
    return this.finish(column);
  }

  private push(code: number, v: number): void {
    if (this.len === this.codes.length) {
      this.codes = grow64(this.codes);
      this.vals = grow64(this.vals);
      this.cols = new Int32Array(this.codes.length);
    }
    this.codes[this.len] = code;
    this.vals[this.len++] = v;
  }

  /** Add up entries of equal code, drop zeros, and number the columns. */
  private finish(column: KeyTable): number {
    const { codes, vals, cols, p } = this;
    let o = 0;
    for (let i = 0; i < this.len; i++) {
      let j = 0;
      while (j < o && codes[j] !== codes[i]) j++;
      if (j < o) vals[j] = p ? (vals[j]! + vals[i]!) % p : vals[j]! + vals[i]!;
      else {
        codes[o] = codes[i]!;
        vals[o++] = vals[i]!;
      }
    }
    let w = 0;
    for (let i = 0; i < o; i++) {
      if (vals[i] === 0) continue;
      cols[w] = column.get(codes[i]!);
      vals[w++] = vals[i]!;
    }
    this.len = w;
    return w;
  }
}

function grow64(a: Float64Array): Float64Array<ArrayBuffer> {
  const g = new Float64Array(a.length * 2);
  g.set(a);
  return g;
}
