/** Our superpolynomial syntax: values and errors that point at the column. */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { parseSuperpoly } from '../../src/modules/parse-superpoly.js';

const terms = (text: string, n = 3) =>
  [...parseSuperpoly(text, n).values()].map((t) => `${t.coeff.toFraction()}:${t.x.join('')}|${t.y.join('')}|${t.mask}`).sort();

describe('parseSuperpoly', () => {
  it('reads the example of the brief', () => {
    expect(terms('x1^2*x2*th1 - 3*y2*th1*th3')).toEqual(['-3:000|010|5', '1:210|000|1'].sort());
  });
  it('anticommutes θ as written and kills squares (worked by hand)', () => {
    expect(terms('th2*th1')).toEqual(['-1:000|000|3']);
    expect(terms('th1*th2 + th2*th1')).toEqual([]);
    expect(terms('th1^2 + x1')).toEqual(['1:100|000|0']);
  });
  it('expands parentheses and rational constants', () => {
    expect(terms('(x1 + x2)^2 - 2*x1*x2')).toEqual(['1:020|000|0', '1:200|000|0']);
    expect(terms('1/2*x3 + x3/1'.replace('x3/1', '1/2*x3'))).toEqual(['1:001|000|0']);
  });
  it('errors name --poly and the column', () => {
    const bad: [string, RegExp][] = [
      ['x1 + z2', /column 6.*unknown variable "z2"/],
      ['x1 + x4', /column 6.*out of range/],
      ['x1 * (x2 + 1', /column 13.*expected "\)"/],
      ['x1 x2', /column 4/],
      ['x1^', /column 4.*expected a number/],
      ['3/0', /column 3.*division by zero/],
    ];
    for (const [text, re] of bad) {
      try {
        parseSuperpoly(text, 3);
        expect.unreachable(text);
      } catch (e) {
        expect(e).toBeInstanceOf(InputError);
        expect((e as InputError).message).toMatch(re);
        expect((e as InputError).argument).toBe('poly');
      }
    }
  });
});
