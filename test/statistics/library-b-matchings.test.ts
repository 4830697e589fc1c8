/**
 * Perfect matchings: the symmetric joint law of crossings and nestings, the Touchard–Riordan
 * formula, and Catalan counts of the noncrossing and nonnesting matchings.
 */
import { catalan } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import { Poly } from '../../src/core/poly.js';
import { matchingAlignments, matchingCrossings, matchingNestings } from '../../statistics/matching-statistics.js';
import { dist } from './dist-helper.js';

const fact = (m: number): bigint => (m <= 1 ? 1n : BigInt(m) * fact(m - 1));
const binom = (a: number, b: number): bigint => (b < 0 || b > a ? 0n : fact(a) / (fact(b) * fact(a - b)));

describe('perfect matching statistics', () => {
  it('(crossings, nestings) has a symmetric joint distribution, n ≤ 6 (Chen–Deng–Du–Stanley–Yan, Trans. Amer. Math. Soc. 359 (2007))', async () => {
    for (let n = 1; n <= 6; n++) {
      const j = (await dist('perfect-matchings', { n }, ['matching-crossings', 'matching-nestings'])).series;
      expect(j.equals(j.swapQT()), `n=${n}`).toBe(true);
    }
  });

  it('Touchard–Riordan: (1−q)^n Σ_M q^cr(M) = Σ_k (−1)^k q^{k(k+1)/2} (C(2n, n−k) − C(2n, n−k−1)), n ≤ 6 (Riordan, Math. Comp. 29 (1975))', async () => {
    for (let n = 1; n <= 6; n++) {
      const cr = (await dist('perfect-matchings', { n }, ['matching-crossings'])).series;
      let rhs = Poly.zero;
      for (let k = 0; k <= n; k++) rhs = rhs.add(Poly.monomial((k % 2 === 0 ? 1n : -1n) * (binom(2 * n, n - k) - binom(2 * n, n - k - 1)), (k * (k + 1)) / 2));
      expect(cr.mul(Poly.one.sub(Poly.q).pow(n)).equals(rhs), `n=${n}`).toBe(true);
    }
  });

  it('noncrossing and nonnesting matchings are Catalan many (mathjs catalan); cr + ne + al = C(n,2); reflection keeps cr and ne (n ≤ 6)', () => {
    const rev = transformById('matching-reverse');
    for (let n = 0; n <= 6; n++) {
      let noCross = 0;
      let noNest = 0;
      for (const m of familyById('perfect-matchings').generate({ n })) {
        const a = m as number[];
        const cr = matchingCrossings.compute(a);
        const ne = matchingNestings.compute(a);
        expect(cr + ne + matchingAlignments.compute(a)).toBe((n * (n - 1)) >> 1);
        const r = rev.apply(a) as number[];
        expect([matchingCrossings.compute(r), matchingNestings.compute(r)]).toEqual([cr, ne]);
        if (cr === 0) noCross++;
        if (ne === 0) noNest++;
      }
      expect([noCross, noNest]).toEqual([catalan(n), catalan(n)]);
    }
  });
});
