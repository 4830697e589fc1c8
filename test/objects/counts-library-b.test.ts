/**
 * Counts of the families of part B of the statistics library: the stream, count() and an
 * outside reference (a named formula evaluated here, or mathjs) agree; and the visit fast path,
 * where present, visits as many objects as count() at a size the contract tests do not reach.
 */
import { catalan, factorial, pow } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import type { Params } from '../../src/enumerate/plugin.js';

function streamed(id: string, p: Params): number {
  let c = 0;
  for (const _ of familyById(id).generate(p)) c++;
  return c;
}
function both(id: string, p: Params): [number, number] {
  return [streamed(id, p), Number(familyById(id).count(p))];
}
/** (2n)!/(2^n n!) = (2n−1)!! with mathjs factorial and pow. */
const oddDoubleFactorial = (n: number): number => factorial(2 * n) / (pow(2, n) as number) / factorial(n);

describe('part B family counts against outside references', () => {
  it('signed permutations: |B_n| = 2^n·n! (Björner–Brenti, GTM 231, §8.1; mathjs factorial, pow)', () => {
    for (let n = 0; n <= 5; n++) {
      const ref = (pow(2, n) as number) * factorial(n);
      expect(both('signed-permutations', { n })).toEqual([ref, ref]);
    }
    expect(familyById('signed-permutations').count({ n: 8 })).toBe(10321920n);
  });

  it('alternating sign matrices and monotone triangles: Π_{j<n} (3j+1)!/(n+j)! (Zeilberger 1996; Kuperberg 1996), evaluated here with mathjs factorial', () => {
    const asm = (n: number): number => {
      let r = 1;
      for (let j = 0; j < n; j++) r *= factorial(3 * j + 1) / factorial(n + j);
      return Math.round(r);
    };
    for (let n = 0; n <= 6; n++) {
      expect(both('alternating-sign-matrices', { n })).toEqual([asm(n), asm(n)]);
      expect(both('monotone-triangles', { n })).toEqual([asm(n), asm(n)]);
    }
    // 1, 1, 2, 7, 42, 429, 7436, 218348 (Robbins, "The story of 1, 2, 7, 42, 429, 7436, …", Math. Intelligencer 13 (1991), from memory)
    expect([0, 1, 2, 3, 4, 5, 6, 7].map((n) => Number(familyById('alternating-sign-matrices').count({ n })))).toEqual([1, 1, 2, 7, 42, 429, 7436, 218348]);
  });

  it('binary trees, plane trees, 321-avoiding permutations: Catalan numbers (mathjs catalan)', () => {
    for (let n = 0; n <= 8; n++) {
      for (const id of ['binary-trees', 'plane-trees', '321-avoiding-permutations']) expect(both(id, { n }), `${id} n=${n}`).toEqual([catalan(n), catalan(n)]);
    }
  });

  it('labelled trees on 0..n and Prüfer codes: (n+1)^(n−1) (Cayley 1889; mathjs pow)', () => {
    for (let n = 1; n <= 6; n++) {
      const ref = pow(n + 1, n - 1) as number;
      expect(both('labelled-trees', { n })).toEqual([ref, ref]);
      expect(both('prufer-codes', { n })).toEqual([ref, ref]);
    }
    expect(both('labelled-trees', { n: 0 })).toEqual([1, 1]);
  });

  it('increasing trees and inversion sequences: n! (Stanley, EC1 §1.3 and §1.5; mathjs factorial)', () => {
    for (let n = 0; n <= 7; n++) {
      expect(both('increasing-trees', { n })).toEqual([factorial(n), factorial(n)]);
      expect(both('inversion-sequences', { n })).toEqual([factorial(n), factorial(n)]);
    }
  });

  it('Stirling permutations, increasing plane trees, perfect matchings: (2n−1)!! (Gessel–Stanley 1978; mathjs factorial)', () => {
    for (let n = 0; n <= 6; n++) {
      const ref = oddDoubleFactorial(n);
      for (const id of ['stirling-permutations', 'increasing-plane-trees', 'perfect-matchings']) expect(both(id, { n }), `${id} n=${n}`).toEqual([ref, ref]);
    }
  });

  it('visit fast paths visit count() objects, whole and in 3 shards, beyond the contract sizes', () => {
    const cases: [string, number][] = [
      ['signed-permutations', 5], ['alternating-sign-matrices', 6], ['monotone-triangles', 6], ['labelled-trees', 6], ['prufer-codes', 6],
      ['increasing-trees', 7], ['inversion-sequences', 7], ['stirling-permutations', 6], ['increasing-plane-trees', 6], ['perfect-matchings', 6],
    ];
    for (const [id, n] of cases) {
      const f = familyById(id);
      let whole = 0;
      f.visit!({ n }, () => whole++);
      let parts = 0;
      for (let index = 0; index < 3; index++) f.visit!({ n }, () => parts++, { index, count: 3 });
      expect([whole, parts], id).toEqual([Number(f.count({ n })), Number(f.count({ n }))]);
    }
  });
});
