import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ArithmeticError } from '../../src/core/errors.js';
import { Poly } from '../../src/core/poly.js';
import { PolyQ } from '../../src/core/polyq.js';
import { arbPoly, arbSmallPoly } from '../helpers/arbitraries.js';

describe('Poly ring axioms (properties)', () => {
  it('addition is commutative and associative with identity 0 and inverses', () => {
    fc.assert(
      fc.property(arbPoly, arbPoly, arbPoly, (a, b, c) => {
        expect(a.add(b).equals(b.add(a))).toBe(true);
        expect(a.add(b).add(c).equals(a.add(b.add(c)))).toBe(true);
        expect(a.add(Poly.zero).equals(a)).toBe(true);
        expect(a.add(a.neg()).isZero()).toBe(true);
        expect(a.sub(b).equals(a.add(b.neg()))).toBe(true);
      }),
    );
  });
  it('multiplication is commutative, associative, unital and distributes over addition', () => {
    fc.assert(
      fc.property(arbPoly, arbPoly, arbSmallPoly, (a, b, c) => {
        expect(a.mul(b).equals(b.mul(a))).toBe(true);
        expect(a.mul(b).mul(c).equals(a.mul(b.mul(c)))).toBe(true);
        expect(a.mul(Poly.one).equals(a)).toBe(true);
        expect(a.mul(b.add(c)).equals(a.mul(b).add(a.mul(c)))).toBe(true);
      }),
    );
  });
  it('exact division recovers a factor, and division with remainder throws', () => {
    fc.assert(
      fc.property(arbPoly, arbSmallPoly, (a, b) => {
        fc.pre(!b.isZero());
        expect(a.mul(b).divExact(b).equals(a)).toBe(true);
      }),
    );
    expect(() => Poly.q.add(Poly.one).divExact(Poly.q)).toThrow(ArithmeticError);
    expect(() => Poly.one.divExact(Poly.zero)).toThrow(ArithmeticError);
  });
  it('evaluation is a ring homomorphism', () => {
    fc.assert(
      fc.property(arbSmallPoly, arbSmallPoly, fc.bigInt(-3n, 3n), fc.bigInt(-3n, 3n), (a, b, q, t) => {
        expect(a.mul(b).evaluate(q, t)).toBe(a.evaluate(q, t) * b.evaluate(q, t));
        expect(a.add(b).evaluate(q, t)).toBe(a.evaluate(q, t) + b.evaluate(q, t));
      }),
    );
  });
  it('substitution q -> q^k, t -> t^k is multiplicative; swap and reversal are involutive', () => {
    fc.assert(
      fc.property(arbSmallPoly, arbSmallPoly, fc.integer({ min: 1, max: 4 }), (a, b, k) => {
        expect(a.mul(b).substitutePowers(k).equals(a.substitutePowers(k).mul(b.substitutePowers(k)))).toBe(true);
        expect(a.swapQT().swapQT().equals(a)).toBe(true);
        if (a.minDegQ() === 0) expect(a.reverseQ().reverseQ().equals(a)).toBe(true);
      }),
    );
  });
  it('pow agrees with repeated multiplication', () => {
    fc.assert(
      fc.property(arbSmallPoly, fc.nat(5), (a, e) => {
        let r = Poly.one;
        for (let i = 0; i < e; i++) r = r.mul(a);
        expect(a.pow(e).equals(r)).toBe(true);
      }),
    );
  });
});

describe('Poly printing and dense forms', () => {
  const p = Poly.fromTerms([
    [2, 1, 3n],
    [1, 0, 1n],
    [0, 0, -1n],
  ]);
  it('prints text and LaTeX, highest q first', () => {
    expect(p.toString()).toBe('3*q^2*t + q - 1');
    expect(p.toLatex()).toBe('3q^{2}t + q - 1');
    expect(Poly.zero.toString()).toBe('0');
    expect(Poly.q.neg().toString()).toBe('-q');
  });
  it('gives the JSON convention: arrays in q, tables in q,t, strings past 2^53', () => {
    expect(Poly.fromQCoeffs([1, 2, 1]).toJson()).toEqual([1, 2, 1]);
    expect(p.toJson()).toEqual([
      [-1, 0],
      [1, 0],
      [0, 3],
    ]);
    expect(Poly.constant(2n ** 60n).toJson()).toEqual(['1152921504606846976']);
  });
  it('reads off degrees and coefficients', () => {
    expect(p.degQ()).toBe(2);
    expect(p.degT()).toBe(1);
    expect(p.coeff(2, 1)).toBe(3n);
    expect(p.coeff(5, 5)).toBe(0n);
    expect(p.specialize({ t: 1 }).equals(Poly.fromQCoeffs([-1, 1, 3]))).toBe(true);
  });
});

describe('PolyQ (over Q)', () => {
  it('keeps lowest terms and divides exactly', () => {
    const half = PolyQ.of(Poly.fromQCoeffs([2, 4]), 4n); // (1 + 2q)/2
    expect(half.den).toBe(2n);
    expect(half.num.equals(Poly.fromQCoeffs([1, 2]))).toBe(true);
    const prod = half.mul(PolyQ.of(Poly.fromQCoeffs([3, 0, 1]), 5n));
    expect(prod.divExact(half).equals(PolyQ.of(Poly.fromQCoeffs([3, 0, 1]), 5n))).toBe(true);
    expect(half.add(half).toPoly().equals(Poly.fromQCoeffs([1, 2]))).toBe(true);
    expect(() => half.toPoly()).toThrow(ArithmeticError);
  });
  it('division by an integer polynomial is exact over Q (property)', () => {
    fc.assert(
      fc.property(arbSmallPoly, arbSmallPoly, fc.bigInt(1n, 30n), (a, b, d) => {
        fc.pre(!b.isZero());
        const x = PolyQ.of(a, d);
        const y = PolyQ.of(b, 7n);
        expect(x.mul(y).divExact(y).equals(x)).toBe(true);
      }),
    );
  });
});
