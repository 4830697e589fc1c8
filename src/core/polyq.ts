/**
 * Polynomials in q, t over Q, kept as an integer polynomial over a positive common
 * denominator in lowest terms: value = num / den.
 */
import { ArithmeticError } from './errors.js';
import { gcd } from './integers.js';
import { Poly } from './poly.js';
import { Fraction, denominator, frac, numerator } from './rational.js';

export class PolyQ {
  private constructor(
    readonly num: Poly,
    readonly den: bigint,
  ) {}

  static readonly zero = new PolyQ(Poly.zero, 1n);
  static readonly one = new PolyQ(Poly.one, 1n);

  static of(num: Poly, den: bigint | number = 1n): PolyQ {
    let d = BigInt(den);
    if (d === 0n) throw new ArithmeticError('zero denominator');
    let n = num;
    if (d < 0n) {
      d = -d;
      n = n.neg();
    }
    if (n.isZero()) return PolyQ.zero;
    let g = d;
    for (const [, , c] of n.terms()) {
      g = gcd(g, c);
      if (g === 1n) break;
    }
    return g === 1n ? new PolyQ(n, d) : new PolyQ(n.divScalarExact(g), d / g);
  }

  static fromFraction(f: Fraction): PolyQ {
    return PolyQ.of(Poly.constant(numerator(f)), denominator(f));
  }

  isZero(): boolean {
    return this.num.isZero();
  }
  isIntegral(): boolean {
    return this.den === 1n;
  }
  /** The integer polynomial, or throws when a coefficient is not an integer. */
  toPoly(): Poly {
    if (this.den !== 1n) throw new ArithmeticError(`${this.toString()} has non-integer coefficients`);
    return this.num;
  }
  coeff(i: number, j = 0): Fraction {
    return frac(this.num.coeff(i, j), this.den);
  }
  equals(o: PolyQ): boolean {
    return this.den === o.den && this.num.equals(o.num);
  }
  add(o: PolyQ): PolyQ {
    if (this.den === o.den) return PolyQ.of(this.num.add(o.num), this.den);
    const g = gcd(this.den, o.den);
    const l = (this.den / g) * o.den;
    return PolyQ.of(this.num.scale(l / this.den).add(o.num.scale(l / o.den)), l);
  }
  sub(o: PolyQ): PolyQ {
    return this.add(o.neg());
  }
  neg(): PolyQ {
    return new PolyQ(this.num.neg(), this.den);
  }
  mul(o: PolyQ): PolyQ {
    return PolyQ.of(this.num.mul(o.num), this.den * o.den);
  }
  scale(f: Fraction | bigint | number): PolyQ {
    const r = f instanceof Fraction ? f : frac(BigInt(f));
    return PolyQ.of(this.num.scale(numerator(r)), this.den * denominator(r));
  }
  /** Exact division by a polynomial with rational coefficients; throws when not exact. */
  divExact(o: PolyQ): PolyQ {
    if (o.isZero()) throw new ArithmeticError('division by the zero polynomial');
    // o = (content*sign/o.den) * prim with prim primitive; by Gauss's lemma an exact
    // quotient of an integer polynomial by a primitive one has integer coefficients.
    let content = 0n;
    for (const [, , c] of o.num.terms()) content = gcd(content, c);
    const sign = o.num.sortedTerms().at(-1)![2] < 0n ? -1n : 1n;
    const prim = o.num.divScalarExact(content * sign);
    const quotient = this.num.scale(o.den).divExact(prim);
    return PolyQ.of(quotient, this.den * content * sign);
  }
  evaluate(q: Fraction | bigint | number, t: Fraction | bigint | number = 0n): Fraction {
    const qf = q instanceof Fraction ? q : frac(BigInt(q));
    const tf = t instanceof Fraction ? t : frac(BigInt(t));
    let s = frac(0n);
    for (const [i, j, c] of this.num.terms()) s = s.add(qf.pow(i).mul(tf.pow(j)).mul(c));
    return s.div(this.den);
  }
  toString(): string {
    return this.den === 1n ? this.num.toString() : `(${this.num.toString()})/${this.den}`;
  }
  toLatex(): string {
    return this.den === 1n ? this.num.toLatex() : `\\frac{${this.num.toLatex()}}{${this.den}}`;
  }
}
