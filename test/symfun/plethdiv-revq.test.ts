/** The two forms added for the expression library: plethdiv (cleared plethysm by X/(1−u)) and revq. */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { Poly } from '../../src/core/poly.js';
import { qFactorial } from '../../src/core/qanalogs.js';
import { evaluateExpression } from '../../src/symfun/expression.js';
import { delta, nabla } from '../../src/symfun/operators.js';
import { SymFun } from '../../src/symfun/symfun.js';
import { majFrobenius } from '../helpers/maj-frobenius.js';

const ev = (s: string) => evaluateExpression(s).value;

describe('plethdiv', () => {
  it('(q;q)_n h_n[X/(1−q)] = Σ_T q^{maj T} s_{shape T} for n ≤ 6 (Lusztig–Stanley; Stanley, Bull. AMS 1 (1979) §4)', () => {
    for (let n = 1; n <= 6; n++) {
      const expected = SymFun.fromBasis('s', [...majFrobenius(n)].map(([k, c]) => [k === '' ? [] : k.split(',').map(Number), c] as const));
      expect(ev(`plethdiv(h(${n}), 1-q)`).equals(expected), `n=${n}`).toBe(true);
      // e_n[X/(1−q)] = ω h_n[X/(1−q)] up to q-reversal of each Schur coefficient, so at q = 1 it is ω of h's (common practice)
      expect(ev(`subs(plethdiv(e(${n}), 1-q), q=1)`).equals(ev(`omega(subs(plethdiv(h(${n}), 1-q), q=1))`))).toBe(true);
    }
  });
  it('the Hilbert series of (q;q)_n (t;t)_n h_n[X/((1−q)(1−t))] is [n]_q! [n]_t! (⟨h_n[XA], p_1^n⟩ = A^n, common practice)', () => {
    for (let n = 1; n <= 5; n++) {
      const h = ev(`hilbert(plethdiv(h(${n}), 1-q, 1-t))`).coeff([]).toPoly();
      const qf = qFactorial(n);
      expect(h.equals(qf.mul(qf.swapQT())), `n=${n}`).toBe(true);
    }
  });
  it('refuses an alphabet that is not 1 − u for a monomial u', () => {
    expect(() => ev('plethdiv(h(2), 1+q)')).toThrow(InputError);
    expect(() => ev('plethdiv(h(2), 1-2*q)')).toThrow(/1 - u for a monomial/);
    expect(() => ev('plethdiv(h(2))')).toThrow(/one or more alphabets/);
  });
});

describe('revq', () => {
  it('reverses the whole function by its largest q-degree, and twice is the identity when some coefficient has a constant term', () => {
    // ∇e_2 = s_2 + (q+t) s_11 (Haglund, "The q,t-Catalan numbers and the space of diagonal harmonics", AMS 2008, ch. 2)
    expect(ev('revq(nabla(e(2)))').equals(ev('q*s(2) + (1+q*t)*s(1,1)'))).toBe(true);
    for (const e of ['subs(deltaprime(e(1), e(4)), t=0)', 'H(3,1)', 'plethdiv(e(4), 1-q)']) expect(ev(`revq(revq(${e}))`).equals(ev(e)), e).toBe(true);
    expect(ev('revq(3)').coeff([]).toPoly().equals(Poly.constant(3))).toBe(true);
  });
});

describe('the closed e_n route of nabla and delta', () => {
  it('agrees with the generic H̃ expansion (⟨F, H̃_μ⟩_* summed back) for n ≤ 5', () => {
    for (let n = 1; n <= 5; n++) {
      const en = SymFun.basisElement('e', [n]);
      expect(ev(`nabla(3*e(${n}))`).equals(nabla(en).scale(Poly.constant(3))), `nabla n=${n}`).toBe(true);
      for (const g of ['e(2)', 'h(3)', 's(2,1)']) expect(ev(`delta(${g}, e(${n}))`).equals(delta(ev(g), en)), `delta ${g} n=${n}`).toBe(true);
    }
  });
});
