import fc from 'fast-check';
import { stirlingS2 } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { factorial } from '../../src/core/integers.js';
import { Poly } from '../../src/core/poly.js';
import { qBinomial, qFactorial, qInteger, qMultinomial, qOrderedStirling, qStirling2 } from '../../src/core/qanalogs.js';

describe('q-analogs', () => {
  it('[n]_q and [n]_q! at q = 1 are n and n! (common practice)', () => {
    for (let n = 0; n <= 12; n++) {
      expect(qInteger(n).sumCoefficients()).toBe(BigInt(n));
      expect(qFactorial(n).sumCoefficients()).toBe(factorial(n));
      expect(qFactorial(n).degQ()).toBe(n === 0 ? 0 : (n * (n - 1)) / 2);
    }
  });
  it('[4]_q! = 1 + 3q + 5q^2 + 6q^3 + 5q^4 + 3q^5 + q^6 (Mahonian numbers; Stanley EC1 §1.3 — from memory)', () => {
    expect(qFactorial(4).toQArray()).toEqual([1n, 3n, 5n, 6n, 5n, 3n, 1n]);
  });
  it('q-binomials are symmetric in k and satisfy both q-Pascal recurrences (common practice)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 14 }), fc.integer({ min: 0, max: 14 }), (n, k) => {
        fc.pre(k <= n);
        const b = qBinomial(n, k);
        expect(b.equals(qBinomial(n, n - k))).toBe(true);
        // [n,k] = [n-1,k-1] + q^k [n-1,k]  and  [n,k] = q^(n-k) [n-1,k-1] + [n-1,k]
        expect(b.equals(qBinomial(n - 1, k - 1).add(qBinomial(n - 1, k).shift(k)))).toBe(true);
        expect(b.equals(qBinomial(n - 1, k - 1).shift(n - k).add(qBinomial(n - 1, k)))).toBe(true);
        // palindromic of degree k(n-k)
        expect(b.equals(b.reverseQ())).toBe(true);
        expect(b.degQ()).toBe(k * (n - k));
      }),
    );
  });
  it('q-binomial equals [n]_q! / ([k]_q! [n-k]_q!) (exact division)', () => {
    for (let n = 0; n <= 10; n++)
      for (let k = 0; k <= n; k++)
        expect(qFactorial(n).divExact(qFactorial(k).mul(qFactorial(n - k))).equals(qBinomial(n, k))).toBe(true);
  });
  it('q-multinomial is a product of q-binomials, and equals the q-factorial quotient', () => {
    const m = qMultinomial([2, 1, 2]);
    expect(m.equals(qFactorial(5).divExact(qFactorial(2).mul(qFactorial(1)).mul(qFactorial(2))))).toBe(true);
    expect(m.sumCoefficients()).toBe(30n);
  });
  it('Stir_q(n,k) at q = 1 is S(n,k) (checked against mathjs stirlingS2)', () => {
    for (let n = 0; n <= 14; n++)
      for (let k = 0; k <= n; k++) expect(Number(qStirling2(n, k).sumCoefficients())).toBe(Number(stirlingS2(n, k)));
  });
  it('Stir_q(4,2) = 3 + 3q + q^2 … from the recurrence of Carlitz (Duke Math. J. 15 (1948) — from memory) by hand: Stir_q(3,1) + [2]_q Stir_q(3,2)', () => {
    // Stir_q(3,2) = Stir_q(2,1) + [2]_q Stir_q(2,2) = 1 + (1+q) = 2 + q
    expect(qStirling2(3, 2).toQArray()).toEqual([2n, 1n]);
    // Stir_q(4,2) = 1 + (1+q)(2+q) = 3 + 3q + q^2
    expect(qStirling2(4, 2).toQArray()).toEqual([3n, 3n, 1n]);
  });
  it('[k]_q! Stir_q(n,k) at q = 1 counts ordered set partitions k! S(n,k) (mathjs stirlingS2)', () => {
    for (let n = 1; n <= 9; n++)
      for (let k = 1; k <= n; k++)
        expect(Number(qOrderedStirling(n, k).sumCoefficients())).toBe(Number(factorial(k)) * Number(stirlingS2(n, k)));
  });
  it('edge cases are zero or one, never NaN', () => {
    expect(qStirling2(0, 0).equals(Poly.one)).toBe(true);
    expect(qStirling2(3, 0).isZero()).toBe(true);
    expect(qStirling2(3, 5).isZero()).toBe(true);
    expect(qBinomial(3, -1).isZero()).toBe(true);
    expect(qInteger(0).isZero()).toBe(true);
  });
});
