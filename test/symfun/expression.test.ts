import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, LimitError } from '../../src/core/errors.js';
import { partitionList } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { evaluateExpression } from '../../src/symfun/expression.js';
import { modifiedMacdonald } from '../../src/symfun/macdonald.js';
import { nabla } from '../../src/symfun/operators.js';
import { formatText } from '../../src/symfun/sym-format.js';
import { SymFun } from '../../src/symfun/symfun.js';
import { BASES } from '../../src/symfun/transitions.js';

const ev = (s: string) => evaluateExpression(s).value;
const s = (...l: number[]) => SymFun.basisElement('s', l);

describe('expression language', () => {
  it('evaluates the stable core forms', () => {
    expect(ev('e(4)').equals(SymFun.basisElement('e', [4]))).toBe(true);
    expect(ev('h(2,1)').equals(SymFun.basisElement('h', [2, 1]))).toBe(true);
    expect(ev('m(2,1)').equals(SymFun.basisElement('m', [2, 1]))).toBe(true);
    expect(ev('p(2,1)').equals(SymFun.basisElement('p', [2, 1]))).toBe(true);
    expect(ev('H(2,1)').equals(modifiedMacdonald([2, 1]))).toBe(true);
    expect(ev('nabla(e(3))').equals(nabla(SymFun.basisElement('e', [3])))).toBe(true);
    expect(ev('deltaprime(e(2), e(3))').equals(ev('nabla(e(3))'))).toBe(true);
    expect(ev('deltaprime(e(0), e(3))').equals(ev('e(3)'))).toBe(true);
    expect(ev('delta(e(1), e(2))').equals(ev('deltaprime(e(1), e(2)) + e(2)'))).toBe(true);
    expect(ev('omega(h(3))').equals(ev('e(3)'))).toBe(true);
    expect(ev('subs(H(2,1), t=0)').equals(ev('s(3) + q*s(2,1)'))).toBe(true);
    expect(ev('subs(H(2,1), q=1)').equals(ev('s(3) + (1+t)*s(2,1) + t*s(1,1,1)'))).toBe(true);
    expect(ev('(q+t)*s(2,1)').equals(s(2, 1).scale(Poly.q.add(Poly.t)))).toBe(true);
    expect(ev('q^2*t - t*q*q').isZero()).toBe(true);
    expect(ev('s(1)*s(2)').equals(ev('s(3) + s(2,1)'))).toBe(true);
    expect(evaluateExpression('e(2) + e(1)').degree).toEqual([1, 2]);
    expect(ev('pleth(p(2), 1-q)').equals(ev('(1-q^2)*p(2)'))).toBe(true);
    expect(ev('hilbert(h(1)^3)').equals(ev('6'))).toBe(true);
    expect(ev('hall(H(2,1), s(3))').equals(ev('1'))).toBe(true);
    expect(ev('star(H(2), H(1,1))').isZero()).toBe(true); // *-orthogonality (checked in macdonald.test.ts)
  });
  it('text output reads back to the same function in every basis', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 4 }), fc.nat(), fc.integer({ min: -3, max: 3 }), fc.constantFrom(...BASES), (n, i, c, b) => {
        const ps = partitionList(n);
        const f = s(...ps[i % ps.length]!).scale(Poly.q.add(Poly.constant(c))).add(ev('p(1)/2'));
        expect(ev(formatText(f, b)).equals(f)).toBe(true);
      }),
      { numRuns: 40 },
    );
  });
  it('parse errors are InputErrors that name the column', () => {
    const cases: [string, RegExp][] = [
      ['e(2)*(q+t', /column 10: expected "\)"/],
      ['s(2,1) +', /column 9: expected a number/],
      ['s(2,1) $ 3', /column 8: unexpected character "\$"/],
      ['nabal(e(2))', /column 1: unknown function "nabal" \(nearest: nabla/],
      ['s(1,2)', /column 1: .*s index/],
      ['s(2) s(1)', /column 6: expected an operator/],
      ['e(2)/q', /column 6: division is only by a non-zero integer/],
      ['x + 1', /column 1: unknown name "x"/],
      ['subs(e(2), u=1)', /column 12: expected an assignment/],
      ['', /column 1: the expression is empty/],
    ];
    for (const [text, re] of cases) {
      expect(() => evaluateExpression(text), text).toThrow(InputError);
      expect(() => evaluateExpression(text), text).toThrow(re);
    }
  });
  it('random token strings either evaluate or raise a user error, never an internal one', () => {
    const tokens = ['s(', 'e(', 'h(', 'p(', 'm(', 'H(', 'nabla(', 'omega(', 'subs(', 'q', 't', '=', '1', '2', '0', ',', '(', ')', '+', '-', '*', '/', '^', ' '];
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...tokens), { maxLength: 10 }), (parts) => {
        const text = parts.join('');
        try {
          evaluateExpression(text, { maxDegree: 3 });
        } catch (e) {
          expect(e instanceof InputError || e instanceof LimitError, `${text}: ${String(e)}`).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  });
  it('refuses operators past the degree limit with a LimitError naming --max-degree', () => {
    expect(() => evaluateExpression('nabla(e(5))', { maxDegree: 4 })).toThrow(LimitError);
    expect(() => evaluateExpression('deltaprime(e(1), e(5))', { maxDegree: 4 })).toThrow(/--max-degree/);
    expect(() => evaluateExpression('H(11)')).toThrow(LimitError);
    expect(() => evaluateExpression('s(1000)')).toThrow(/degree 1000 is above 16/);
    expect(() => evaluateExpression('h(1)^17')).toThrow(LimitError);
    expect(() => evaluateExpression('s(8)*s(9)')).toThrow(/column 5: degree 17/);
  });
});
