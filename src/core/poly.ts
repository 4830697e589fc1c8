/**
 * Sparse polynomials in q and t with integer (BigInt) coefficients. A polynomial in
 * one variable is a Poly with no t. Immutable; every operation returns a new Poly.
 *
 * Terms are kept in a Map keyed by the packed exponent pair q^i t^j -> i * T_BASE + j,
 * which keeps keys as small numbers (fast Map look-ups) for degrees below 2^21 in t.
 */
import { ArithmeticError, InputError } from './errors.js';
import { bigToJson } from './integers.js';

const T_BASE = 2 ** 21;

export function packExponents(i: number, j: number): number {
  return i * T_BASE + j;
}
export function unpackExponents(key: number): [number, number] {
  const j = key % T_BASE;
  return [(key - j) / T_BASE, j];
}

export type Term = readonly [qExp: number, tExp: number, coeff: bigint];

export class Poly {
  private constructor(private readonly map: ReadonlyMap<number, bigint>) {}

  static readonly zero = new Poly(new Map());
  static readonly one = Poly.constant(1n);
  static readonly q = Poly.monomial(1n, 1, 0);
  static readonly t = Poly.monomial(1n, 0, 1);

  static constant(c: bigint | number): Poly {
    const b = BigInt(c);
    return b === 0n ? Poly.zero : new Poly(new Map([[0, b]]));
  }

  /** c q^i t^j */
  static monomial(c: bigint | number, i: number, j = 0): Poly {
    checkExponent(i, 'q');
    checkExponent(j, 't');
    const b = BigInt(c);
    return b === 0n ? Poly.zero : new Poly(new Map([[packExponents(i, j), b]]));
  }

  static fromTerms(terms: Iterable<Term>): Poly {
    const m = new Map<number, bigint>();
    for (const [i, j, c] of terms) {
      checkExponent(i, 'q');
      checkExponent(j, 't');
      addInto(m, packExponents(i, j), BigInt(c));
    }
    return new Poly(m);
  }

  /** From a dense coefficient list in q (index = power of q). */
  static fromQCoeffs(coeffs: readonly (bigint | number)[]): Poly {
    const m = new Map<number, bigint>();
    coeffs.forEach((c, i) => addInto(m, packExponents(i, 0), BigInt(c)));
    return new Poly(m);
  }

  /** From a dense table `[i][j]` = coefficient of q^i t^j. */
  static fromQTTable(table: readonly (readonly (bigint | number)[])[]): Poly {
    const m = new Map<number, bigint>();
    table.forEach((row, i) => row.forEach((c, j) => addInto(m, packExponents(i, j), BigInt(c))));
    return new Poly(m);
  }

  /** Wrap a map of packed keys that the caller guarantees has no zero values. */
  static fromPackedMap(m: Map<number, bigint>): Poly {
    for (const [k, v] of m) if (v === 0n) m.delete(k);
    return new Poly(m);
  }

  // ---- inspection ----
  isZero(): boolean {
    return this.map.size === 0;
  }
  get termCount(): number {
    return this.map.size;
  }
  /** Terms in no particular order. */
  *terms(): IterableIterator<Term> {
    for (const [k, c] of this.map) {
      const [i, j] = unpackExponents(k);
      yield [i, j, c];
    }
  }
  /** Terms sorted by q-degree then t-degree, ascending. */
  sortedTerms(): Term[] {
    return [...this.terms()].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  }
  coeff(i: number, j = 0): bigint {
    return this.map.get(packExponents(i, j)) ?? 0n;
  }
  /** Degree in q (−1 for the zero polynomial). */
  degQ(): number {
    let d = -1;
    for (const k of this.map.keys()) d = Math.max(d, unpackExponents(k)[0]);
    return d;
  }
  degT(): number {
    let d = -1;
    for (const k of this.map.keys()) d = Math.max(d, unpackExponents(k)[1]);
    return d;
  }
  /** Total degree (−1 for zero). */
  degree(): number {
    let d = -1;
    for (const k of this.map.keys()) {
      const [i, j] = unpackExponents(k);
      d = Math.max(d, i + j);
    }
    return d;
  }
  minDegQ(): number {
    let d = Infinity;
    for (const k of this.map.keys()) d = Math.min(d, unpackExponents(k)[0]);
    return d === Infinity ? -1 : d;
  }
  /** True when no term involves t. */
  isUnivariate(): boolean {
    for (const k of this.map.keys()) if (unpackExponents(k)[1] !== 0) return false;
    return true;
  }
  isConstant(): boolean {
    return this.map.size === 0 || (this.map.size === 1 && this.map.has(0));
  }
  constantTerm(): bigint {
    return this.map.get(0) ?? 0n;
  }
  equals(other: Poly): boolean {
    if (this.map.size !== other.map.size) return false;
    for (const [k, c] of this.map) if (other.map.get(k) !== c) return false;
    return true;
  }
  /** Sum of all coefficients (the value at q = t = 1). */
  sumCoefficients(): bigint {
    let s = 0n;
    for (const c of this.map.values()) s += c;
    return s;
  }

  // ---- ring operations ----
  add(other: Poly): Poly {
    if (other.isZero()) return this;
    if (this.isZero()) return other;
    const m = new Map(this.map);
    for (const [k, c] of other.map) addInto(m, k, c);
    return new Poly(m);
  }
  sub(other: Poly): Poly {
    if (other.isZero()) return this;
    const m = new Map(this.map);
    for (const [k, c] of other.map) addInto(m, k, -c);
    return new Poly(m);
  }
  neg(): Poly {
    const m = new Map<number, bigint>();
    for (const [k, c] of this.map) m.set(k, -c);
    return new Poly(m);
  }
  scale(c: bigint | number): Poly {
    const b = BigInt(c);
    if (b === 0n) return Poly.zero;
    if (b === 1n) return this;
    const m = new Map<number, bigint>();
    for (const [k, v] of this.map) m.set(k, v * b);
    return new Poly(m);
  }
  /** Multiply by q^i t^j. */
  shift(i: number, j = 0): Poly {
    const m = new Map<number, bigint>();
    const d = packExponents(i, j);
    for (const [k, v] of this.map) m.set(k + d, v);
    return new Poly(m);
  }
  mul(other: Poly): Poly {
    if (this.isZero() || other.isZero()) return Poly.zero;
    if (other.map.size === 1 && other.map.has(0)) return this.scale(other.map.get(0)!);
    if (this.map.size === 1 && this.map.has(0)) return other.scale(this.map.get(0)!);
    const m = new Map<number, bigint>();
    for (const [k1, c1] of this.map) for (const [k2, c2] of other.map) addInto(m, k1 + k2, c1 * c2);
    return new Poly(m);
  }
  pow(e: number): Poly {
    if (!Number.isInteger(e) || e < 0) throw new InputError(`exponent must be a non-negative integer (got ${e})`);
    let result: Poly = Poly.one;
    let base: Poly = this;
    while (e > 0) {
      if (e & 1) result = result.mul(base);
      e >>= 1;
      if (e > 0) base = base.mul(base);
    }
    return result;
  }

  /**
   * Exact division: returns Q with Q * divisor = this, or throws ArithmeticError.
   * Division by leading terms in the order q-degree first, then t-degree.
   */
  divExact(divisor: Poly): Poly {
    if (divisor.isZero()) throw new ArithmeticError('division by the zero polynomial');
    if (this.isZero()) return Poly.zero;
    const lead = (m: Map<number, bigint>): number => {
      let best = -1;
      for (const k of m.keys()) if (k > best) best = k;
      return best;
    };
    const dMap = divisor.map as Map<number, bigint>;
    const dLead = lead(dMap);
    const dCoeff = dMap.get(dLead)!;
    const [di, dj] = unpackExponents(dLead);
    const rem = new Map(this.map);
    const quot = new Map<number, bigint>();
    while (rem.size > 0) {
      const rLead = lead(rem);
      const [ri, rj] = unpackExponents(rLead);
      const rc = rem.get(rLead)!;
      if (ri < di || rj < dj || rc % dCoeff !== 0n) {
        throw new ArithmeticError(`${this.toString()} is not divisible by ${divisor.toString()}`);
      }
      const qc = rc / dCoeff;
      const shift = packExponents(ri - di, rj - dj);
      addInto(quot, shift, qc);
      for (const [k, c] of dMap) addInto(rem, k + shift, -qc * c);
    }
    return new Poly(quot);
  }

  /** Divide every coefficient by an integer; throws when not exact. */
  divScalarExact(c: bigint | number): Poly {
    const b = BigInt(c);
    if (b === 0n) throw new ArithmeticError('division by zero');
    const m = new Map<number, bigint>();
    for (const [k, v] of this.map) {
      if (v % b !== 0n) throw new ArithmeticError(`${this.toString()} is not divisible by ${b}`);
      m.set(k, v / b);
    }
    return new Poly(m);
  }

  // ---- substitutions ----
  /** q -> q^kq, t -> t^kt (plethysm by p_k sends every variable to its k-th power). */
  substitutePowers(kq: number, kt = kq): Poly {
    const m = new Map<number, bigint>();
    for (const [key, c] of this.map) {
      const [i, j] = unpackExponents(key);
      m.set(packExponents(i * kq, j * kt), c);
    }
    return new Poly(m);
  }
  /** Set q and/or t to integer values, keeping the other variable symbolic. */
  specialize(values: { q?: bigint | number; t?: bigint | number }): Poly {
    const m = new Map<number, bigint>();
    const qv = values.q === undefined ? undefined : BigInt(values.q);
    const tv = values.t === undefined ? undefined : BigInt(values.t);
    for (const [key, c] of this.map) {
      const [i, j] = unpackExponents(key);
      let coeff = c;
      let ni = i;
      let nj = j;
      if (qv !== undefined) {
        coeff *= qv ** BigInt(i);
        ni = 0;
      }
      if (tv !== undefined) {
        coeff *= tv ** BigInt(j);
        nj = 0;
      }
      addInto(m, packExponents(ni, nj), coeff);
    }
    return new Poly(m);
  }
  /** Value at integers q and t. */
  evaluate(q: bigint | number, t: bigint | number = 0n): bigint {
    return this.specialize({ q, t }).constantTerm();
  }
  swapQT(): Poly {
    const m = new Map<number, bigint>();
    for (const [key, c] of this.map) {
      const [i, j] = unpackExponents(key);
      m.set(packExponents(j, i), c);
    }
    return new Poly(m);
  }
  /** rev_q(f) = q^{deg_q f} f(1/q), applied coefficient-wise in t. */
  reverseQ(): Poly {
    const d = this.degQ();
    const m = new Map<number, bigint>();
    for (const [key, c] of this.map) {
      const [i, j] = unpackExponents(key);
      m.set(packExponents(d - i, j), c);
    }
    return new Poly(m);
  }

  // ---- dense forms (the JSON convention) ----
  /** Coefficients in q, index = power of q; throws if t occurs. */
  toQArray(): bigint[] {
    if (!this.isUnivariate()) throw new InputError(`expected a polynomial in q alone, got ${this.toString()}`);
    const out: bigint[] = new Array(Math.max(this.degQ() + 1, 1)).fill(0n);
    for (const [i, , c] of this.terms()) out[i] = c;
    return out;
  }
  /** Table `[i][j]` = coefficient of q^i t^j (rectangular). */
  toQTTable(): bigint[][] {
    const dq = Math.max(this.degQ(), 0);
    const dt = Math.max(this.degT(), 0);
    const out: bigint[][] = Array.from({ length: dq + 1 }, () => new Array<bigint>(dt + 1).fill(0n));
    for (const [i, j, c] of this.terms()) out[i]![j] = c;
    return out;
  }
  toJson(): (number | string)[] | (number | string)[][] {
    return this.isUnivariate()
      ? this.toQArray().map(bigToJson)
      : this.toQTTable().map((row) => row.map(bigToJson));
  }

  // ---- printing ----
  /** Text such as `3*q^2*t + q - 1`, highest q-degree first. */
  toString(): string {
    return format(this, (i, j) => monomialText(i, j, '*', (v, e) => (e === 1 ? v : `${v}^${e}`)), '*');
  }
  toLatex(): string {
    return format(this, (i, j) => monomialText(i, j, '', (v, e) => (e === 1 ? v : `${v}^{${e}}`)), '');
  }
}

function checkExponent(e: number, v: string): void {
  if (!Number.isInteger(e) || e < 0 || e >= T_BASE) {
    throw new InputError(`exponent of ${v} must be an integer from 0 to ${T_BASE - 1} (got ${e})`);
  }
}

function addInto(m: Map<number, bigint>, k: number, c: bigint): void {
  if (c === 0n) return;
  const s = (m.get(k) ?? 0n) + c;
  if (s === 0n) m.delete(k);
  else m.set(k, s);
}

function monomialText(i: number, j: number, sep: string, pw: (v: string, e: number) => string): string {
  const parts: string[] = [];
  if (i > 0) parts.push(pw('q', i));
  if (j > 0) parts.push(pw('t', j));
  return parts.join(sep);
}

function format(p: Poly, mono: (i: number, j: number) => string, sep: string): string {
  if (p.isZero()) return '0';
  const terms = p.sortedTerms().reverse();
  let out = '';
  terms.forEach(([i, j, c], idx) => {
    const m = mono(i, j);
    const neg = c < 0n;
    const a = neg ? -c : c;
    const body = m === '' ? a.toString() : a === 1n ? m : `${a}${sep}${m}`;
    if (idx === 0) out += (neg ? '-' : '') + body;
    else out += (neg ? ' - ' : ' + ') + body;
  });
  return out;
}
