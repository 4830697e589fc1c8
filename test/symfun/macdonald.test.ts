import { describe, expect, it } from 'vitest';
import { conjugate, dominates, partitionKey, partitionList } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { PolyQ } from '../../src/core/polyq.js';
import { bigT, bigW } from '../../src/symfun/cell-data.js';
import { frac } from '../../src/core/rational.js';
import { modifiedMacdonald } from '../../src/symfun/macdonald.js';
import { macdonaldByTriangularity } from '../../src/symfun/macdonald-triangular.js';
import { starScalar } from '../../src/symfun/operators.js';
import { plethysmTimes } from '../../src/symfun/plethysm.js';
import { SymFun, keyToPartition } from '../../src/symfun/symfun.js';

const { q, t } = Poly;
const s = (...l: number[]) => SymFun.basisElement('s', l);

describe('modified Macdonald polynomials by the filling formula', () => {
  it('check values H̃_(2), H̃_(11), H̃_(21) (Haglund, The q,t-Catalan numbers and the space of diagonal harmonics, AMS 2008, ch. 2 — from memory)', () => {
    expect(modifiedMacdonald([2]).equals(s(2).add(s(1, 1).scale(q)))).toBe(true);
    expect(modifiedMacdonald([1, 1]).equals(s(2).add(s(1, 1).scale(t)))).toBe(true);
    expect(modifiedMacdonald([2, 1]).equals(s(3).add(s(2, 1).scale(q.add(t))).add(s(1, 1, 1).scale(q.mul(t))))).toBe(true);
  });
  it('H̃_μ(X;q,t) = H̃_μ′(X;t,q), ⟨H̃_μ, s_(n)⟩ = 1 and H̃_μ(X;1,1) = h_1^n for n ≤ 6 (Haglund, AMS 2008, ch. 2 — from memory; Haiman)', () => {
    for (let n = 1; n <= 6; n++) {
      const h1n = SymFun.basisElement('h', new Array(n).fill(1));
      for (const mu of partitionList(n)) {
        const h = modifiedMacdonald(mu);
        expect(h.swapQT().equals(modifiedMacdonald(conjugate(mu)))).toBe(true);
        expect(h.coeff([n]).equals(PolyQ.one)).toBe(true);
        expect(h.specialize({ q: 1, t: 1 }).equals(h1n)).toBe(true);
      }
    }
  });
  it('ω H̃_μ(X;q,t) = T_μ H̃_μ(X;1/q,1/t) for n ≤ 6 (Garsia–Haiman — from memory; an identity the filling formula does not show)', () => {
    for (let n = 1; n <= 6; n++)
      for (const mu of partitionList(n)) {
        const a = bigT(mu).degQ();
        const b = bigT(mu).degT();
        const flipped = modifiedMacdonald(mu).mapCoefficients((c) =>
          PolyQ.of(Poly.fromTerms([...c.num.terms()].map(([i, j, v]) => [a - i, b - j, v] as const)), c.den),
        );
        expect(flipped.equals(modifiedMacdonald(mu).omega()), partitionKey(mu)).toBe(true);
      }
  });
  it('independent route: the triangularity characterisation holds for n ≤ 5 (Haiman, J. Amer. Math. Soc. 14 (2001) — from memory)', () => {
    // H̃_μ[X(1−q)] ∈ span{s_λ : λ ≥ μ}, H̃_μ[X(1−t)] ∈ span{s_λ : λ ≥ μ′}, ⟨H̃_μ, s_(n)⟩ = 1
    // determine H̃_μ uniquely; here the filling sum is checked against them.
    const oneMinusQ = Poly.one.sub(q);
    const oneMinusT = Poly.one.sub(t);
    for (let n = 1; n <= 5; n++)
      for (const mu of partitionList(n)) {
        const h = modifiedMacdonald(mu);
        for (const [k] of plethysmTimes(h, oneMinusQ).schurTerms()) expect(dominates(keyToPartition(k), mu)).toBe(true);
        for (const [k] of plethysmTimes(h, oneMinusT).schurTerms()) expect(dominates(keyToPartition(k), conjugate(mu))).toBe(true);
      }
  });
  it('a wrong filling rule fails the n = 4 checks: the triangularity test is sharp (sanity of the test itself)', () => {
    // swapping two Schur coefficients of H̃_(3,1) must break the characterisation
    const h = modifiedMacdonald([3, 1]);
    const broken = h.sub(s(3, 1).scale(h.coeff([3, 1]).num)).add(s(3, 1).scale(h.coeff([2, 2]).num));
    const bad = [...plethysmTimes(broken, Poly.one.sub(q)).schurTerms()].some(([k]) => !dominates(keyToPartition(k), [3, 1]));
    const bad2 = [...plethysmTimes(broken, Poly.one.sub(t)).schurTerms()].some(([k]) => !dominates(keyToPartition(k), [2, 1, 1]));
    expect(bad || bad2).toBe(true);
  });
  it('*-orthogonality ⟨H̃_λ, H̃_μ⟩_* = δ w_μ for n ≤ 4 (Garsia–Haiman — from memory; checked here)', () => {
    for (let n = 1; n <= 4; n++) {
      const ps = partitionList(n);
      for (const a of ps)
        for (const b of ps) {
          const v = starScalar(modifiedMacdonald(a), modifiedMacdonald(b));
          expect(v.equals(partitionKey(a) === partitionKey(b) ? PolyQ.of(bigW(b)) : PolyQ.zero)).toBe(true);
        }
    }
  });
});

describe('the triangularity route (solving, not checking; Haiman\'s characterisation, J. Amer. Math. Soc. 14 (2001) — from memory)', () => {
  it('the system has a unique solution equal to the filling formula at sample points, n ≤ 5', () => {
    const points = [
      [frac(2n), frac(-3n)],
      [frac(1n, 3n), frac(5n, 2n)],
    ] as const;
    for (let n = 1; n <= 5; n++)
      for (const mu of partitionList(n))
        for (const [q0, t0] of points) {
          const solved = macdonaldByTriangularity(mu, q0, t0);
          expect(solved, partitionKey(mu)).not.toBeNull();
          const h = modifiedMacdonald(mu);
          partitionList(n).forEach((l, i) => expect(h.coeff(l).evaluate(q0, t0).equals(solved![i]!), `${partitionKey(mu)} at ${partitionKey(l)}`).toBe(true));
        }
  });
});
