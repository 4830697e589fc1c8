import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compositionCount, compositions, compositionToSet, setToComposition } from '../../src/core/compositions.js';
import { factorial } from '../../src/core/integers.js';
import { CONFIRM_PRIME, DEFAULT_PRIME, isPrime, PRIMES, PrimeField } from '../../src/core/modp.js';
import { compose, cycleType, inverse, permutationOfType, permutations, sign } from '../../src/core/permutations.js';
import { composition } from 'mathjs';

const arbPerm = (n: number) => fc.shuffledSubarray(Array.from({ length: n }, (_, i) => i + 1), { minLength: n, maxLength: n });

describe('permutations', () => {
  it('generates n! permutations in lexicographic order', () => {
    for (let n = 0; n <= 7; n++) expect(BigInt([...permutations(n)].length)).toBe(factorial(n));
    expect([...permutations(3)]).toEqual([[1, 2, 3], [1, 3, 2], [2, 1, 3], [2, 3, 1], [3, 1, 2], [3, 2, 1]]);
  });
  it('inverse, sign and cycle type behave (properties)', () => {
    fc.assert(
      fc.property(arbPerm(7), arbPerm(7), (u, v) => {
        expect(compose(u, inverse(u))).toEqual([1, 2, 3, 4, 5, 6, 7]);
        expect(sign(compose(u, v))).toBe(sign(u) * sign(v));
        expect(cycleType(inverse(u))).toEqual(cycleType(u));
        expect(cycleType(permutationOfType(cycleType(u)))).toEqual(cycleType(u));
      }),
    );
  });
});

describe('compositions', () => {
  it('counts 2^(n-1) and C(n-1,k-1) (checked against mathjs composition)', () => {
    for (let n = 1; n <= 10; n++) {
      expect(BigInt([...compositions(n)].length)).toBe(compositionCount(n));
      for (let k = 1; k <= n; k++) {
        expect([...compositions(n, k)].length).toBe(Number(composition(n, k)));
      }
    }
  });
  it('sets and compositions correspond', () => {
    for (const c of compositions(6)) expect(setToComposition(6, compositionToSet(c))).toEqual(c);
  });
});

describe('prime field', () => {
  it('the prime table holds primes below 2^26 (trial division)', () => {
    for (const p of PRIMES) {
      expect(isPrime(p)).toBe(true);
      expect(p).toBeLessThan(2 ** 26);
    }
    expect(DEFAULT_PRIME).not.toBe(CONFIRM_PRIME);
  });
  it('field axioms: inverses, distributivity, agreement with BigInt (properties)', () => {
    const F = new PrimeField(DEFAULT_PRIME);
    fc.assert(
      fc.property(fc.nat(DEFAULT_PRIME - 1), fc.nat(DEFAULT_PRIME - 1), fc.nat(DEFAULT_PRIME - 1), (a, b, c) => {
        expect(F.mul(a, b)).toBe(Number((BigInt(a) * BigInt(b)) % BigInt(DEFAULT_PRIME)));
        expect(F.mul(a, F.add(b, c))).toBe(F.add(F.mul(a, b), F.mul(a, c)));
        if (a !== 0) expect(F.mul(a, F.inv(a))).toBe(1);
        expect(F.add(a, F.neg(a))).toBe(0);
        expect(F.reduce(-a)).toBe(F.neg(a));
      }),
    );
  });
});
