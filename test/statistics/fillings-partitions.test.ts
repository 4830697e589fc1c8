/** Fillings (HHL formula), integer partitions and set partitions. */
import { bellNumbers, catalan, stirlingS2 } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { conjugate, partitionKey, partitions } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { fundamentalToSchur } from '../../src/symfun/quasisym.js';
import { modifiedMacdonaldSchur } from '../../src/symfun/macdonald.js';
import { partitionList } from '../../src/core/partitions.js';
import { dist } from './dist-helper.js';

describe('fillings: the Haglund–Haiman–Loehr statistics (J. Amer. Math. Soc. 18 (2005))', () => {
  it('H̃_(21) at the level of x_1x_2x_3: 1 + 2q + 2t + qt (H̃_(21) = s_3 + (q+t)s_21 + qt s_111: Haglund, AMS 2008, ch. 2 — from memory)', async () => {
    const d = await dist('fillings', { shape: [2, 1] }, ['filling-inv', 'filling-maj']);
    expect(d.series.equals(Poly.fromTerms([[0, 0, 1n], [1, 0, 2n], [0, 1, 2n], [1, 1, 1n]]))).toBe(true);
  });

  it('Hilbert sums satisfy H(μ)(q,t) = H(μ′)(t,q) and give n! at q = t = 1, for |μ| ≤ 5 (Haglund, AMS 2008, ch. 2 — from memory)', async () => {
    for (let n = 1; n <= 5; n++) {
      for (const mu of partitions(n)) {
        const a = (await dist('fillings', { shape: mu }, ['filling-inv', 'filling-maj'])).series;
        const b = (await dist('fillings', { shape: conjugate(mu) }, ['filling-inv', 'filling-maj'])).series;
        expect(a.equals(b.swapQT()), `μ=${mu.join(',')}`).toBe(true);
      }
    }
  });

  it('Σ q^inv t^maj F_{iDes(reading word)} is H̃_μ in the Schur basis, as src/symfun computes it, for |μ| ≤ 4', async () => {
    for (let n = 1; n <= 4; n++) {
      for (const mu of partitions(n)) {
        const d = await dist('fillings', { shape: mu }, ['filling-inv', 'filling-maj'], { frobenius: 'descents' });
        const coeffs = new Map<number, Poly>(d.frobenius!.terms.map((t) => [t.set!.reduce((m, i) => m + 2 ** (i - 1), 0), t.series]));
        const schur = fundamentalToSchur(n, coeffs);
        const ref = modifiedMacdonaldSchur(mu);
        partitionList(n).forEach((l, i) => expect(schur.coeff(l).toString(), `μ=${mu.join(',')} λ=${partitionKey(l)}`).toBe(ref[i]!.toString()));
      }
    }
  });
});

describe('integer partitions', () => {
  it('number of parts and largest part are equidistributed (conjugation), n ≤ 12 (Andrews ch. 1)', async () => {
    for (let n = 0; n <= 12; n++) {
      const a = (await dist('partitions', { n }, ['partition-parts', 'largest-part'])).series;
      expect(a.equals(a.swapQT()), `n=${n}`).toBe(true);
    }
  });

  it('Durfee square d has d² ≤ n, and d = 1 exactly for the n hooks (common practice); n(λ) after conjugation is Σ binomial(λ_i, 2) (Macdonald I.1)', async () => {
    for (let n = 1; n <= 10; n++) {
      const d = (await dist('partitions', { n }, ['durfee-square'])).series;
      for (const [i] of d.terms()) expect(i * i).toBeLessThanOrEqual(n);
      expect(d.coeff(1)).toBe(BigInt(n));
    }
    const viaConjugate = await dist('partitions', { n: 6 }, ['n-lambda'], { transform: 'conjugate' });
    let direct = Poly.zero;
    for (const l of partitions(6)) direct = direct.add(Poly.monomial(1n, l.reduce((a, x) => a + (x * (x - 1)) / 2, 0)));
    expect(viaConjugate.series.equals(direct)).toBe(true);
  });
});

describe('set partitions', () => {
  it('blocks: Stirling numbers of the second kind (mathjs stirlingS2), total the Bell numbers (mathjs bellNumbers), n ≤ 8', async () => {
    for (let n = 1; n <= 8; n++) {
      const d = (await dist('set-partitions', { n }, ['blocks'])).series;
      for (let k = 1; k <= n; k++) expect(d.coeff(k)).toBe(BigInt(stirlingS2(n, k)));
      expect(d.sumCoefficients()).toBe(BigInt(bellNumbers(n)));
    }
  });

  it('(crossings, nestings) is jointly symmetric, and crossing-free partitions are Catalan (Chen–Deng–Du–Stanley–Yan 2007; mathjs catalan), n ≤ 8', async () => {
    for (let n = 1; n <= 8; n++) {
      const d = (await dist('set-partitions', { n }, ['crossings', 'nestings'])).series;
      expect(d.equals(d.swapQT()), `n=${n}`).toBe(true);
      let free = 0n;
      for (const [i, , c] of d.terms()) if (i === 0) free += c;
      expect(free).toBe(BigInt(catalan(n)));
    }
  });
});
