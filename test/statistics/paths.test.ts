/** Dyck paths, parking functions and decorated labelled paths (Haglund's book; Carlsson–Mellit 2018; Haglund–Remmel–Wilson 2018). */
import { catalan, combinations } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { Poly } from '../../src/core/poly.js';
import { qOrderedStirling } from '../../src/core/qanalogs.js';
import { fundamentalToSchur } from '../../src/symfun/quasisym.js';
import { dist } from './dist-helper.js';

const symmetric = (p: Poly): boolean => p.equals(p.swapQT());

describe('Dyck path statistics', () => {
  it('(area, bounce) and (dinv, area) are jointly symmetric for n ≤ 8, and equal as q,t-series (Haglund, AMS 2008, from memory; checked here)', async () => {
    for (let n = 0; n <= 8; n++) {
      const ab = (await dist('dyck-paths', { n }, ['dyck-area', 'dyck-bounce'])).series;
      const da = (await dist('dyck-paths', { n }, ['dyck-dinv', 'dyck-area'])).series;
      expect(symmetric(ab), `area/bounce n=${n}`).toBe(true);
      expect(symmetric(da), `dinv/area n=${n}`).toBe(true);
      expect(ab.equals(da), `n=${n}`).toBe(true);
      expect(ab.sumCoefficients()).toBe(BigInt(catalan(n))); // mathjs catalan
    }
  });

  it('C_3(q,t) = q³ + q²t + qt² + t³ + qt (q,t-Catalan: Haglund, AMS 2008, ch. 3 — from memory)', async () => {
    const c3 = Poly.fromTerms([[3, 0, 1n], [2, 1, 1n], [1, 2, 1n], [0, 3, 1n], [1, 1, 1n]]);
    expect((await dist('dyck-paths', { n: 3 }, ['dyck-dinv', 'dyck-area'])).series.equals(c3)).toBe(true);
  });

  it('peaks are counted by the Narayana numbers C(n,k)C(n,k−1)/n; returns by the ballot numbers k/(2n−k)·C(2n−k, n) (Narayana numbers; Deutsch, Discrete Math. 1999; from memory, independent of the code)', async () => {
    for (let n = 1; n <= 8; n++) {
      const peaks = (await dist('dyck-paths', { n }, ['dyck-peaks'])).series;
      const returns = (await dist('dyck-paths', { n }, ['dyck-returns'])).series;
      for (let k = 1; k <= n; k++) {
        expect(peaks.coeff(k)).toBe(BigInt((combinations(n, k) * combinations(n, k - 1)) / n));
        expect(returns.coeff(k)).toBe(BigInt((k * combinations(2 * n - k, n)) / (2 * n - k)));
      }
    }
  });
});

describe('parking functions', () => {
  it('(n+1)^{n−1} of them (Konheim–Weiss), Σ q^dinv t^area symmetric in q,t (Haglund, AMS 2008, from memory), n ≤ 6', async () => {
    for (let n = 1; n <= 6; n++) {
      const d = await dist('parking-functions', { n }, ['parking-dinv', 'parking-area']);
      expect(d.series.sumCoefficients()).toBe(BigInt((n + 1) ** (n - 1)));
      expect(symmetric(d.series), `n=${n}`).toBe(true);
    }
  });

  it('Σ q^dinv t^area F_{iDes} is symmetric, ∇e_2 = s_2 + (q+t) s_11 (Haglund, AMS 2008, ch. 2 — from memory) and ⟨∇e_n, s_{1^n}⟩ = C_n(q,t) for n ≤ 5', async () => {
    for (let n = 1; n <= 5; n++) {
      const d = await dist('parking-functions', { n }, ['parking-dinv', 'parking-area'], { frobenius: 'descents' });
      const coeffs = new Map<number, Poly>(d.frobenius!.terms.map((t) => [t.set!.reduce((m, i) => m + 2 ** (i - 1), 0), t.series]));
      const schur = fundamentalToSchur(n, coeffs); // throws when not symmetric
      const column = schur.coeff(new Array<number>(n).fill(1));
      const catalanQT = (await dist('dyck-paths', { n }, ['dyck-dinv', 'dyck-area'])).series;
      expect(column.toString()).toBe(catalanQT.toString());
      if (n === 2) {
        expect(schur.coeff([2]).toString()).toBe('1');
        expect(schur.coeff([1, 1]).toString()).toBe(Poly.q.add(Poly.t).toString());
      }
    }
  });
});

describe('decorated labelled Dyck paths (rise version, Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018))', () => {
  it('Σ q^dinv t^{area without decorated rows} is symmetric in q,t and at t = 0 equals [k]_q!·Stir_q(n,k) (Haglund–Remmel–Wilson 2018 — from memory), n ≤ 5', async () => {
    for (let n = 1; n <= 5; n++) {
      for (let k = 1; k <= n; k++) {
        const d = (await dist('decorated-dyck-paths', { n, k }, ['decorated-dinv', 'decorated-area'])).series;
        expect(symmetric(d), `n=${n} k=${k}`).toBe(true);
        const atT0 = Poly.fromTerms([...d.terms()].filter(([, j]) => j === 0));
        expect(atT0.equals(qOrderedStirling(n, k)), `n=${n} k=${k}`).toBe(true);
      }
    }
  });

  it('k = n gives the parking functions (no decorations)', async () => {
    for (let n = 1; n <= 5; n++) {
      const a = (await dist('decorated-dyck-paths', { n, k: n }, ['decorated-dinv', 'decorated-area'])).series;
      const b = (await dist('parking-functions', { n }, ['parking-dinv', 'parking-area'])).series;
      expect(a.equals(b)).toBe(true);
    }
  });
});
