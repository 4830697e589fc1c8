import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { factorial } from '../../src/core/integers.js';
import { partitionList, zee } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { PolyQ } from '../../src/core/polyq.js';
import { evaluateAtAlphabet, plethysmTimes } from '../../src/symfun/plethysm.js';
import { SymFun } from '../../src/symfun/symfun.js';
import { BASES } from '../../src/symfun/transitions.js';

const s = (...l: number[]) => SymFun.basisElement('s', l);
const one = PolyQ.one;

describe('SymFun bases and operations', () => {
  it('every basis round-trips through the Schur basis (n ≤ 6)', () => {
    for (let n = 0; n <= 6; n++)
      for (const b of BASES)
        for (const l of partitionList(n)) {
          const f = SymFun.basisElement(b, l);
          expect(SymFun.fromBasis(b, f.toBasis(b)).equals(f)).toBe(true);
          expect(f.toBasis(b)).toEqual([[l, one]]);
        }
  });
  it('Pieri: s_21 · s_1 = s_31 + s_22 + s_211; s_1^2 = s_2 + s_11 (common practice)', () => {
    expect(s(2, 1).mul(s(1)).equals(s(3, 1).add(s(2, 2)).add(s(2, 1, 1)))).toBe(true);
    expect(s(1).mul(s(1)).equals(s(2).add(s(1, 1)))).toBe(true);
  });
  it('Littlewood–Richardson: s_21 · s_21 (Macdonald Ch. I §9 example — from memory) at q = t = 1 has f-dimension C(6,3)·2·2', () => {
    const prod = s(2, 1).mul(s(2, 1));
    expect(prod.coeff([3, 2, 1]).equals(PolyQ.of(Poly.constant(2n)))).toBe(true);
    expect(prod.hilbert().equals(PolyQ.of(Poly.constant(20n * 4n)))).toBe(true);
  });
  it('ω(h_λ) = e_λ, ω(p_ρ) = ±p_ρ, h_1^n has Hilbert series n!', () => {
    for (const l of partitionList(5)) {
      expect(SymFun.basisElement('h', l).omega().equals(SymFun.basisElement('e', l))).toBe(true);
      const sign = (5 - l.length) % 2 === 0 ? 1n : -1n;
      expect(SymFun.basisElement('p', l).omega().equals(SymFun.basisElement('p', l).scale(Poly.constant(sign)))).toBe(true);
    }
    expect(SymFun.basisElement('h', [1, 1, 1, 1, 1]).hilbert().equals(PolyQ.of(Poly.constant(factorial(5))))).toBe(true);
  });
  it('⟨p_λ, p_μ⟩ = z_λ δ and ⟨h_λ, m_μ⟩ = δ (common practice)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 6 }), fc.nat(), fc.nat(), (n, a, b) => {
        const ps = partitionList(n);
        const l = ps[a % ps.length]!;
        const m = ps[b % ps.length]!;
        const same = a % ps.length === b % ps.length;
        const pp = SymFun.basisElement('p', l).hallInner(SymFun.basisElement('p', m));
        expect(pp.equals(same ? PolyQ.of(Poly.constant(zee(l))) : PolyQ.zero)).toBe(true);
        const hm = SymFun.basisElement('h', l).hallInner(SymFun.basisElement('m', m));
        expect(hm.equals(same ? one : PolyQ.zero)).toBe(true);
      }),
      { numRuns: 60 },
    );
  });
  it('the Littlewood–Richardson product agrees with the product of power sums (p_ρ p_σ = p_{ρ∪σ}), degrees ≤ 7', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 4 }), fc.integer({ min: 0, max: 3 }), fc.nat(), fc.nat(), (n1, n2, i, j) => {
        const a = s(...partitionList(n1)[i % partitionList(n1).length]!);
        const b = s(...partitionList(n2)[j % partitionList(n2).length]!);
        const prod = new Map<string, [number[], PolyQ]>();
        for (const [r, cr] of a.toBasis('p'))
          for (const [t, ct] of b.toBasis('p')) {
            const merged = [...r, ...t].sort((x, y) => y - x);
            const k = merged.join(',');
            prod.set(k, [merged, (prod.get(k)?.[1] ?? PolyQ.zero).add(cr.mul(ct))]);
          }
        expect(a.mul(b).equals(SymFun.fromBasis('p', prod.values()))).toBe(true);
      }),
      { numRuns: 40 },
    );
  });
  it('products are associative and commutative on random small elements', () => {
    const arb = fc.tuple(fc.integer({ min: 0, max: 3 }), fc.nat(), fc.integer({ min: -3, max: 3 }));
    fc.assert(
      fc.property(arb, arb, arb, ([n1, i1, c1], [n2, i2, c2], [n3, i3, c3]) => {
        const pick = (n: number, i: number, c: number) => {
          const ps = partitionList(n);
          return SymFun.basisElement('s', ps[i % ps.length]!).scale(Poly.q.add(Poly.constant(c)));
        };
        const a = pick(n1, i1, c1);
        const b = pick(n2, i2, c2);
        const c = pick(n3, i3, c3);
        expect(a.mul(b).equals(b.mul(a))).toBe(true);
        expect(a.mul(b).mul(c).equals(a.mul(b.mul(c)))).toBe(true);
      }),
      { numRuns: 25 },
    );
  });
  it('plethysm: h_n[1 − q] = 1 − q and e_2[q + t] = qt (common practice)', () => {
    for (let n = 1; n <= 4; n++) {
      const v = evaluateAtAlphabet(SymFun.basisElement('h', [n]), Poly.one.sub(Poly.q));
      expect(v.equals(PolyQ.of(Poly.one.sub(Poly.q)))).toBe(true);
    }
    expect(evaluateAtAlphabet(SymFun.basisElement('e', [2]), Poly.q.add(Poly.t)).equals(PolyQ.of(Poly.q.mul(Poly.t)))).toBe(true);
    // p_2[X(1−q)] = p_2 (1 − q^2)
    const p2 = SymFun.basisElement('p', [2]);
    expect(plethysmTimes(p2, Poly.one.sub(Poly.q)).equals(p2.scale(Poly.one.sub(Poly.q.pow(2))))).toBe(true);
  });
});
