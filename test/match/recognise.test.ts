import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Poly } from '../../src/core/poly.js';
import { qBinomial, qFactorial, qInteger, qMultinomial, qOrderedStirling, qStirling2 } from '../../src/core/qanalogs.js';
import { cyclotomic, factorCyclotomic } from '../../src/match/cyclotomic.js';
import { recogniseFamily, type FamilyPoint } from '../../src/match/familyFormula.js';
import { asQProduct, qProductText } from '../../src/match/qProduct.js';
import { findRecurrences } from '../../src/match/recurrence.js';

const grid = (nMax: number, f: (n: number, k: number) => Poly): FamilyPoint[] => {
  const out: FamilyPoint[] = [];
  for (let n = 1; n <= nMax; n++) for (let k = 1; k <= n; k++) out.push({ n, k, poly: f(n, k) });
  return out;
};

describe('cyclotomic factorisation', () => {
  it('Φ_1..Φ_6 (common practice: Φ_6 = q^2 − q + 1, Φ_4 = q^2 + 1)', () => {
    expect(cyclotomic(1).toQArray()).toEqual([-1n, 1n]);
    expect(cyclotomic(4).toQArray()).toEqual([1n, 0n, 1n]);
    expect(cyclotomic(6).toQArray()).toEqual([1n, -1n, 1n]);
  });
  it('products of cyclotomics come back with their exponents (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 2, max: 12 }), { maxLength: 5 }), fc.nat(3), (ds, s) => {
        let p = Poly.monomial(3n, s);
        const want = new Map<number, number>();
        for (const d of ds) {
          p = p.mul(cyclotomic(d));
          want.set(d, (want.get(d) ?? 0) + 1);
        }
        const f = factorCyclotomic(p);
        expect(f.content).toBe(3n);
        expect(f.qPower).toBe(s);
        expect(f.rest.equals(Poly.one)).toBe(true);
        expect(new Map([...f.exponents].sort())).toEqual(new Map([...want].sort()));
      }),
    );
  });
  it('1 + 2q is left as the rest', () => {
    const f = factorCyclotomic(Poly.fromQCoeffs([1, 2]).mul(qInteger(3)));
    expect(f.rest.toQArray()).toEqual([1n, 2n]);
    expect(f.exponents.get(3)).toBe(1);
  });
});

describe('q-products', () => {
  it('q-binomials and multinomials are read as factorial quotients (src/core/qanalogs.ts values)', () => {
    expect(qProductText(asQProduct(qBinomial(6, 2))!)).toBe('[6]_q!/([4]_q! [2]_q!)');
    const m = asQProduct(qMultinomial([2, 2, 3]))!;
    expect([...m.factorials].sort()).toEqual([[2, -2], [3, -1], [7, 1]]);
    expect(qProductText(asQProduct(qInteger(5).mul(Poly.q.pow(2)))!)).toBe('q^2 · [5]_q');
  });
  it('Stir_q(4,2) = 3 + 3q + q^2 is not a product of q-integers', () => {
    expect(asQProduct(qStirling2(4, 2))).toBeUndefined();
  });
  it('family formulas: [n choose k]_q, [n]_q!, q^C(n,2)·[n]_q! (src/core/qanalogs.ts values)', () => {
    expect(recogniseFamily(grid(7, (n, k) => qBinomial(n, k)))!.text).toBe('[n choose k]_q');
    const fact: FamilyPoint[] = [1, 2, 3, 4, 5, 6].map((n) => ({ n, poly: qFactorial(n) }));
    expect(recogniseFamily(fact)!.text).toBe('[n]_q!');
    const shifted = fact.map((p) => ({ ...p, poly: p.poly.shift((p.n * (p.n - 1)) / 2) }));
    expect(recogniseFamily(shifted)!.text).toBe('q^C(n,2) · [n]_q!');
    expect(recogniseFamily(grid(6, (n, k) => qMultinomial([k, k, n - k])))!.text).toBe('[n+k; k, k, n-k]_q');
  });
  it('an integer factor affine in n: (n+1)·[n]_q!, and none for (n² + 1)·[n]_q! (computed here)', () => {
    const pts = [2, 3, 4, 5, 6].map((n) => ({ n, poly: qFactorial(n).scale(BigInt(n + 1)) }));
    expect(recogniseFamily(pts)!.text).toBe('(n+1) · [n]_q!');
    const odd = [2, 3, 4, 5].map((n) => ({ n, poly: qFactorial(n).scale(BigInt(n * n + 1)) }));
    expect(recogniseFamily(odd)).toBeUndefined();
  });

  it('no product formula for q-Stirling numbers, nor for one odd entry among q-binomials (negative cases)', () => {
    expect(recogniseFamily(grid(6, (n, k) => qStirling2(n, k)))).toBeUndefined();
    const pts = grid(6, (n, k) => qBinomial(n, k));
    pts[7] = { ...pts[7]!, poly: pts[7]!.poly.add(Poly.q) };
    expect(recogniseFamily(pts)).toBeUndefined();
  });
});

describe('recurrences', () => {
  it('finds the q-Stirling recurrence on Stir_q and on [k]_q!·Stir_q (Carlitz, Duke Math. J. 15 (1948) — from memory; Remmel–Wilson 2015)', () => {
    const s = findRecurrences(grid(6, (n, k) => qStirling2(n, k)));
    expect(s[0]!.name).toBe('q-Stirling recurrence');
    expect(s[0]!.text).toBe('f(n,k) = f(n-1,k-1) + [k]_q · f(n-1,k)');
    const o = findRecurrences(grid(6, (n, k) => qOrderedStirling(n, k)));
    expect(o[0]!.text).toBe('f = [k]_q! · g, g(n,k) = g(n-1,k-1) + [k]_q · g(n-1,k)');
    expect(o.some((r) => r.text === 'f(n,k) = [k]_q · f(n-1,k-1) + [k]_q · f(n-1,k)')).toBe(true);
  });
  it('finds f(n) = [n]_q f(n−1) on q-factorials and nothing on a perturbed family', () => {
    const fact: FamilyPoint[] = [1, 2, 3, 4, 5, 6].map((n) => ({ n, poly: qFactorial(n) }));
    expect(findRecurrences(fact)[0]!.text).toBe('f(n) = [n]_q · f(n-1)');
    const bad = fact.map((p) => (p.n === 5 ? { ...p, poly: p.poly.add(Poly.one) } : p));
    expect(findRecurrences(bad).filter((r) => r.prefactor === '')).toEqual([]);
    const pts = grid(6, (n, k) => qStirling2(n, k));
    pts[10] = { ...pts[10]!, poly: pts[10]!.poly.add(Poly.q) };
    expect(findRecurrences(pts)).toEqual([]);
  });
});
