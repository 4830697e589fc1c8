/**
 * Alternating sign matrices: the refined ASM theorem, the Mills–Robbins–Rumsey inversion
 * identity and the 2-enumeration, by exhaustive enumeration; the monotone-triangle coding.
 */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import { asmOfTriangle } from '../../objects/support/monotone-triangles.js';
import { Poly } from '../../src/core/poly.js';
import { asmInversions, asmNegatives } from '../../statistics/asm-statistics.js';
import { dist } from './dist-helper.js';

const fact = (m: number): bigint => (m <= 1 ? 1n : BigInt(m) * fact(m - 1));
const binom = (a: number, b: number): bigint => (b < 0 || b > a ? 0n : fact(a) / (fact(b) * fact(a - b)));

describe('alternating sign matrix statistics', () => {
  it('the 1 of the first row: A(n,k) = C(n+k−2, k−1)·(2n−k−1)!/(n−k)!·Π_{j=0}^{n−2} (3j+1)!/(n+j)!, n ≤ 6 (Zeilberger, New York J. Math. 2 (1996), refined ASM theorem)', async () => {
    for (let n = 1; n <= 6; n++) {
      let num = 1n;
      let den = 1n;
      for (let j = 0; j <= n - 2; j++) {
        num *= fact(3 * j + 1);
        den *= fact(n + j);
      }
      const expected = Array.from({ length: n + 1 }, (_, k) => (k === 0 ? 0n : (binom(n + k - 2, k - 1) * fact(2 * n - k - 1) * num) / (fact(n - k) * den)));
      for (const s of ['asm-first-row-one', 'asm-last-row-one', 'asm-first-column-one']) {
        expect((await dist('alternating-sign-matrices', { n }, [s])).series.toQArray(), `${s}, n=${n}`).toEqual(expected);
      }
    }
  });

  it('Σ_A x^ν(A) (1 + 1/x)^μ(A) = (1 + x)^C(n,2), n ≤ 6 (Mills–Robbins–Rumsey, J. Combin. Theory Ser. A 34 (1983), from memory); hence the 2-enumeration 2^C(n,2)', async () => {
    for (let n = 0; n <= 6; n++) {
      const joint = (await dist('alternating-sign-matrices', { n }, ['asm-inversions', 'asm-negatives'])).series; // q^ν t^μ
      let lhs = Poly.zero;
      let twoEnum = 0n;
      for (const [nu, mu, c] of joint.sortedTerms()) {
        expect(nu >= mu).toBe(true);
        lhs = lhs.add(Poly.monomial(c, nu - mu).mul(Poly.one.add(Poly.q).pow(mu)));
        twoEnum += c * 2n ** BigInt(mu);
      }
      expect(lhs.equals(Poly.one.add(Poly.q).pow((n * (n - 1)) / 2)), `n=${n}`).toBe(true);
      expect(twoEnum).toBe(2n ** BigInt((n * (n - 1)) / 2));
    }
  });

  it('permutation matrices are the ASMs without −1s, with ν = inversions (n ≤ 5)', () => {
    const pm = transformById('permutation-matrix');
    const asms = familyById('alternating-sign-matrices');
    for (let n = 0; n <= 5; n++) {
      const noNeg = new Set([...asms.generate({ n })].filter((a) => asmNegatives.compute(a as number[][]) === 0).map((a) => asms.key(a)));
      const images = new Set<string>();
      for (const w of familyById('permutations').generate({ n })) {
        const a = pm.apply(w) as number[][];
        let inv = 0;
        const ww = w as number[];
        for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) if (ww[i]! > ww[j]!) inv++;
        expect(asmInversions.compute(a)).toBe(inv);
        images.add(asms.key(a));
      }
      expect(images).toEqual(noNeg);
    }
  });

  it('monotone triangles code ASMs bijectively (asmOfTriangle inverts the map); transpose and the quarter turn keep −1s; transpose keeps ν (n ≤ 5)', () => {
    const toT = transformById('asm-to-monotone-triangle');
    const tr = transformById('asm-transpose');
    const rot = transformById('asm-rotate');
    const asms = familyById('alternating-sign-matrices');
    const tri = familyById('monotone-triangles');
    for (let n = 0; n <= 5; n++) {
      const triangles = new Set([...tri.generate({ n })].map((t) => tri.key(t)));
      const images = new Set<string>();
      const keys = new Set([...asms.generate({ n })].map((a) => asms.key(a)));
      for (const a of asms.generate({ n })) {
        const t = toT.apply(a);
        images.add(tri.key(t));
        expect(asms.key(asmOfTriangle(t as number[][]))).toBe(asms.key(a));
        expect(asmInversions.compute(tr.apply(a) as number[][])).toBe(asmInversions.compute(a as number[][]));
        const r = rot.apply(a) as number[][];
        expect(keys.has(asms.key(r))).toBe(true);
        expect(asmNegatives.compute(r)).toBe(asmNegatives.compute(a as number[][]));
      }
      expect(images).toEqual(triangles);
    }
  });
});
