/**
 * Signed permutations (B_n): the classical distributions of length, flag major index and
 * type B descents, by exhaustive enumeration through the distribution engine.
 */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import { Poly } from '../../src/core/poly.js';
import { qInteger } from '../../src/core/qanalogs.js';
import { signedLength } from '../../statistics/signed-length.js';
import { dist } from './dist-helper.js';

/** Π_{i=1}^n [2i]_q, the Poincaré polynomial of B_n. */
function typeBFactorial(n: number): Poly {
  let r = Poly.one;
  for (let i = 1; i <= n; i++) r = r.mul(qInteger(2 * i));
  return r;
}
/** The terms of p of t-degree at most d. */
const truncT = (p: Poly, d: number): Poly => Poly.fromTerms(p.sortedTerms().filter(([, j]) => j <= d));

describe('signed permutation statistics', () => {
  it('length, fmaj, finv and nmaj all have Σ q^stat = Π [2i]_q, n ≤ 5 (Björner–Brenti GTM 231 §7.1 and §8.1; Adin–Roichman, Europ. J. Combin. 22 (2001); Foata–Han (2007); Adin–Brenti–Roichman (2001))', async () => {
    for (let n = 0; n <= 5; n++) {
      for (const s of ['signed-length', 'flag-major-index', 'flag-inversions', 'negative-major-index']) {
        expect((await dist('signed-permutations', { n }, [s])).series.equals(typeBFactorial(n)), `${s}, n=${n}`).toBe(true);
      }
    }
  });

  it('(fdes, fmaj) is Euler–Mahonian: Σ_r [r+1]_q^n t^r = Σ_w t^fdes q^fmaj / ((1−t) Π_i (1 − t²q^{2i})), n ≤ 5 (Adin–Brenti–Roichman, Adv. in Appl. Math. 27 (2001), from memory)', async () => {
    for (let n = 1; n <= 5; n++) {
      const joint = (await dist('signed-permutations', { n }, ['flag-major-index', 'flag-descents'])).series; // q^fmaj t^fdes
      const T = 2 * n;
      let lhs = Poly.zero;
      for (let r = 0; r <= T; r++) lhs = lhs.add(qInteger(r + 1).pow(n).mul(Poly.monomial(1, 0, r)));
      let den = Poly.one.sub(Poly.t);
      for (let i = 1; i <= n; i++) den = den.mul(Poly.one.sub(Poly.monomial(1, 2 * i, 2)));
      expect(truncT(lhs.mul(den), T).equals(joint), `n=${n}`).toBe(true);
    }
  });

  it('(ndes, nmaj) has the joint law of (fdes, fmaj), n ≤ 5 (Adin–Brenti–Roichman 2001, from memory; our conventions in statistics/signed-descents.ts)', async () => {
    for (let n = 1; n <= 5; n++) {
      const a = (await dist('signed-permutations', { n }, ['negative-major-index', 'negative-descents'])).series;
      const b = (await dist('signed-permutations', { n }, ['flag-major-index', 'flag-descents'])).series;
      expect(a.equals(b), `n=${n}`).toBe(true);
    }
  });

  it('type B descents give the type B Eulerian polynomials: Σ_k (2k+1)^n t^k = B_n(t)/(1−t)^{n+1} (Brenti, Europ. J. Combin. 15 (1994), from memory); B_2 = 1 + 6t + t² and B_3 = 1 + 23t + 23t² + t³ (from memory)', async () => {
    for (let n = 1; n <= 5; n++) {
      const b = (await dist('signed-permutations', { n }, ['type-b-descents'])).series; // in q
      let lhs = Poly.zero;
      for (let k = 0; k <= n + 1; k++) lhs = lhs.add(Poly.monomial((2 * k + 1) ** n, k));
      const times = lhs.mul(Poly.one.sub(Poly.q).pow(n + 1));
      expect(Poly.fromTerms(times.sortedTerms().filter(([i]) => i <= n)).equals(b), `n=${n}`).toBe(true);
    }
    expect((await dist('signed-permutations', { n: 2 }, ['type-b-descents'])).series.toQArray()).toEqual([1n, 6n, 1n]);
    expect((await dist('signed-permutations', { n: 3 }, ['type-b-descents'])).series.toQArray()).toEqual([1n, 23n, 23n, 1n]);
  });

  it("flag excedances have the law of fdes (Foata–Han 2008, from memory) and Brenti's type B excedances that of the type B descents (Brenti 1994, from memory), n ≤ 5", async () => {
    for (let n = 1; n <= 5; n++) {
      const fdes = (await dist('signed-permutations', { n }, ['flag-descents'])).series;
      expect((await dist('signed-permutations', { n }, ['flag-excedances'])).series.equals(fdes), `n=${n}`).toBe(true);
      const desB = (await dist('signed-permutations', { n }, ['type-b-descents'])).series;
      expect((await dist('signed-permutations', { n }, ['type-b-excedances'])).series.equals(desB), `n=${n}`).toBe(true);
    }
  });

  it('maps: negation sends ℓ to n² − ℓ (w₀ = −id has length n², Björner–Brenti §8.1); inverse keeps ℓ; forgetting signs is 2^n to one (n ≤ 4)', () => {
    const neg = transformById('signed-negation');
    const inv = transformById('signed-inverse');
    const abs = transformById('signed-absolute');
    for (let n = 0; n <= 4; n++) {
      const fibres = new Map<string, number>();
      for (const w of familyById('signed-permutations').generate({ n })) {
        const l = signedLength.compute(w as number[]);
        expect(signedLength.compute(neg.apply(w) as number[])).toBe(n * n - l);
        expect(signedLength.compute(inv.apply(w) as number[])).toBe(l);
        const k = (abs.apply(w) as number[]).join(',');
        fibres.set(k, (fibres.get(k) ?? 0) + 1);
      }
      expect([...fibres.values()].every((c) => c === 2 ** n)).toBe(true);
    }
  });
});
