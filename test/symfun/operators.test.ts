import fc from 'fast-check';
import { catalan } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { partitionList } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { PolyQ } from '../../src/core/polyq.js';
import { bigT } from '../../src/symfun/cell-data.js';
import { modifiedMacdonald } from '../../src/symfun/macdonald.js';
import {
  delta,
  deltaPrime,
  deltaPrimeOfEn,
  enNumerators,
  macdonaldNumerators,
  nabla,
  sumInMacdonaldBasis,
} from '../../src/symfun/operators.js';
import { SymFun } from '../../src/symfun/symfun.js';

const { q, t } = Poly;
const e = (...l: number[]) => SymFun.basisElement('e', l);
const s = (...l: number[]) => SymFun.basisElement('s', l);
const P = (p: Poly) => PolyQ.of(p);

describe('e_n in the modified Macdonald basis', () => {
  it('⟨e_n, H̃_μ⟩_* = M B_μ Π_μ and Σ_μ M B_μ Π_μ H̃_μ / w_μ sums back to e_n, n ≤ 5 (Garsia–Haiman, from memory: verified here)', () => {
    for (let n = 1; n <= 5; n++) {
      const en = enNumerators(n);
      const gen = macdonaldNumerators(e(n), n);
      en.forEach((v, i) => expect(v.equals(gen[i]!)).toBe(true));
      expect(sumInMacdonaldBasis(n, en, () => PolyQ.one).equals(e(n))).toBe(true);
    }
  });
});

describe('expansion of any F in the H̃ basis', () => {
  it('Σ_μ ⟨F, H̃_μ⟩_* / w_μ · H̃_μ sums back to F for random F of degree ≤ 5 (checks the *-orthogonality route)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5 }), fc.nat(), fc.nat(), fc.integer({ min: -4, max: 4 }), (n, i, j, c) => {
        const ps = partitionList(n);
        const f = s(...ps[i % ps.length]!)
          .scale(t.add(Poly.constant(c)))
          .add(SymFun.basisElement('p', ps[j % ps.length]!));
        expect(sumInMacdonaldBasis(n, macdonaldNumerators(f, n), () => PolyQ.one).equals(f)).toBe(true);
      }),
      { numRuns: 15 },
    );
  });
});

describe('nabla and Delta operators', () => {
  it('∇e_2 = s_2 + (q+t) s_11 and C_3 = q³ + q²t + qt² + t³ + qt (Haglund, AMS 2008, ch. 2–3 — from memory)', () => {
    expect(nabla(e(2)).equals(s(2).add(s(1, 1).scale(q.add(t))))).toBe(true);
    const c3 = nabla(e(3)).hallInner(e(3));
    expect(c3.equals(P(Poly.fromTerms([[3, 0, 1n], [2, 1, 1n], [1, 2, 1n], [0, 3, 1n], [1, 1, 1n]])))).toBe(true);
  });
  it('C_n(1,1) is the Catalan number (mathjs catalan) and ∇e_n(1,1) has dimension (n+1)^(n−1) (Haiman 2002), n ≤ 6', () => {
    for (let n = 1; n <= 6; n++) {
      const ne = deltaPrimeOfEn(e(n - 1), n);
      expect(ne.hallInner(e(n)).evaluate(1, 1).equals(catalan(n))).toBe(true);
      expect(ne.hilbert().evaluate(1, 1).equals(Number((n + 1) ** (n - 1)))).toBe(true);
    }
  });
  it('Δ′_{e_{n−1}} e_n = ∇e_n (generic route against the e_n route) and Δ′_{e_0} e_n = e_n, n ≤ 5 (Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018))', () => {
    for (let n = 1; n <= 5; n++) {
      const viaNabla = nabla(e(n));
      expect(deltaPrime(e(n - 1), e(n)).equals(viaNabla)).toBe(true);
      expect(deltaPrimeOfEn(e(n - 1), n).equals(viaNabla)).toBe(true);
      expect(deltaPrimeOfEn(SymFun.one, n).equals(e(n))).toBe(true);
    }
  });
  it('∇H̃_μ = T_μ H̃_μ on the generic route (n ≤ 4)', () => {
    for (let n = 1; n <= 4; n++)
      for (const mu of partitionList(n)) expect(nabla(modifiedMacdonald(mu)).equals(modifiedMacdonald(mu).scale(bigT(mu)))).toBe(true);
  });
  it('Δ_{e_1} = Δ′_{e_1} + 1 and the operators are linear, on random Schur combinations of degree ≤ 4', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 1, max: 4 }), fc.nat(), fc.integer({ min: -3, max: 3 })), { minLength: 1, maxLength: 3 }),
        (spec) => {
          let f = SymFun.zero;
          for (const [n, i, c] of spec) {
            const ps = partitionList(n);
            f = f.add(s(...ps[i % ps.length]!).scale(q.add(Poly.constant(c))));
          }
          expect(delta(e(1), f).equals(deltaPrime(e(1), f).add(f))).toBe(true);
          expect(nabla(f.add(f)).equals(nabla(f).add(nabla(f)))).toBe(true);
        },
      ),
      { numRuns: 8 },
    );
  });
});
