import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ArithmeticError } from '../../src/core/errors.js';
import { Poly } from '../../src/core/poly.js';
import { cyclotomic, sumOverCommonDenominator } from '../../src/symfun/common-denominator.js';
import { divideDense, fromDense, sumOfProducts, toDense } from '../../src/symfun/dense-poly.js';
import { arbSmallPoly } from '../helpers/arbitraries.js';

const { q, t } = Poly;

describe('dense exact division and sums over a common denominator', () => {
  it('divideDense(a·b, b) = a, and null when b does not divide (random polynomials)', () => {
    fc.assert(
      fc.property(arbSmallPoly, arbSmallPoly, (a, b) => {
        fc.pre(!b.isZero());
        const qd = divideDense(toDense(a.mul(b)), b);
        expect(qd && fromDense(qd).equals(a)).toBe(true);
        const r = a.mul(b).add(Poly.one);
        const bad = divideDense(toDense(r), b);
        if (bad) expect(fromDense(bad).mul(b).equals(r)).toBe(true); // only when it truly divides
      }),
      { numRuns: 200 },
    );
  });
  it('sumOfProducts equals the sum of the products (both accumulation paths)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(arbSmallPoly, arbSmallPoly), { maxLength: 4 }), (pairs) => {
        const expected = pairs.reduce((s, [a, b]) => s.add(a.mul(b)), Poly.zero);
        expect(fromDense(sumOfProducts(pairs)).equals(expected)).toBe(true);
      }),
    );
    const big = Poly.constant(2n ** 60n);
    expect(fromDense(sumOfProducts([[big, big.add(q)]])).equals(big.mul(big.add(q)))).toBe(true);
  });
  it('cyclotomic polynomials: Φ_1..Φ_6 and Π_{d|n} Φ_d = q^n − 1 (common practice)', () => {
    expect(cyclotomic(1).equals(q.sub(Poly.one))).toBe(true);
    expect(cyclotomic(4).equals(q.pow(2).add(Poly.one))).toBe(true);
    expect(cyclotomic(6).equals(q.pow(2).sub(q).add(Poly.one))).toBe(true);
    for (let n = 1; n <= 12; n++) {
      let p = Poly.one;
      for (let d = 1; d <= n; d++) if (n % d === 0) p = p.mul(cyclotomic(d));
      expect(p.equals(q.pow(n).sub(Poly.one))).toBe(true);
    }
  });
  it('q/(q−t) − t/(q−t) = 1 and (q²−t²)/(q−t) + t(q²−t⁴)/(−(q²−t⁴)) = q exactly; 1/(q−t) is refused', () => {
    const den = { factors: [[1, 1]] as const, sign: 1n };
    const ok = sumOverCommonDenominator(
      [
        { numerator: q, vector: [Poly.one], den },
        { numerator: t.neg(), vector: [Poly.one], den },
      ],
      1,
    );
    expect(ok[0]!.equals(Poly.one)).toBe(true);
    // q² − t⁴ splits into Ψ_1(q, t²) Ψ_2(q, t²) = (q − t²)(q + t²)
    const sq = sumOverCommonDenominator(
      [
        { numerator: q.pow(2).sub(t.pow(2)), vector: [Poly.one], den },
        { numerator: q.pow(2).sub(t.pow(4)), vector: [t], den: { factors: [[2, 4]], sign: -1n } },
      ],
      1,
    );
    expect(sq[0]!.equals(q)).toBe(true);
    expect(() => sumOverCommonDenominator([{ numerator: Poly.one, vector: [Poly.one], den }], 1)).toThrow(ArithmeticError);
  });
});
