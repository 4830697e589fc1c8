/**
 * Our plain text syntax for superpolynomials: sums of products of integers (or a/b),
 * variables x1..xn, y1..yn, th1..thn (θ1 also accepted) and parenthesized expressions,
 * with `^` for non-negative integer powers, e.g. `x1^2*x2*th1 - 3*y2*th1*th3`.
 * Products keep their written order, so θ's anticommute as written.
 * Errors are InputErrors that name the option and the column (1-based).
 */
import { InputError } from '../core/errors.js';
import { frac } from '../core/rational.js';
import { rawAdd, rawConstant, rawMonomial, rawProduct, type RawPoly, type RawTerm } from './raw-superpoly.js';

const MAX_POWER = 64;

export function parseSuperpoly(text: string, n: number, option = 'poly'): RawPoly {
  let pos = 0;
  const fail = (msg: string, at = pos): never => {
    const near = text.slice(at, at + 8);
    throw new InputError(`--${option}: column ${at + 1}: ${msg}${near ? ` (near "${near}")` : ' (at the end)'}`, option);
  };
  const skip = (): void => {
    while (pos < text.length && /\s/.test(text[pos]!)) pos++;
  };
  // sticky patterns read at pos without copying the rest of the text (long seeds stay linear)
  const at = (re: RegExp): RegExpExecArray | null => {
    re.lastIndex = pos;
    return re.exec(text);
  };
  const INTEGER = /\d+/y;
  const VARIABLE = /(x|y|th|θ)(\d+)/y;
  const WORD = /[A-Za-z_θ]\w*/y;
  const integer = (): bigint => {
    const m = at(INTEGER);
    if (!m) return fail('expected a number');
    pos += m[0].length;
    return BigInt(m[0]);
  };
  const variable = (): RawPoly | undefined => {
    const m = at(VARIABLE);
    if (!m) return undefined;
    const start = pos;
    const index = Number(m[2]);
    if (index < 1 || index > n) fail(`variable ${m[0]} is out of range (indices 1..${n} for n = ${n})`, start);
    pos += m[0].length;
    const x = new Array<number>(n).fill(0);
    const y = new Array<number>(n).fill(0);
    if (m[1] === 'x') x[index - 1] = 1;
    else if (m[1] === 'y') y[index - 1] = 1;
    else return rawMonomial(x, y, 1 << (index - 1));
    return rawMonomial(x, y, 0);
  };
  const atom = (): RawPoly => {
    skip();
    const c = text[pos];
    if (c === undefined) return fail('expected a number, a variable or "("');
    if (c === '(') {
      pos++;
      const e = expr();
      skip();
      if (text[pos] !== ')') fail('expected ")"');
      pos++;
      return e;
    }
    if (/\d/.test(c)) {
      const a = integer();
      skip();
      if (text[pos] === '/') {
        pos++;
        skip();
        const at = pos;
        const b = integer();
        if (b === 0n) fail('division by zero', at);
        return rawConstant(n, frac(a, b));
      }
      return rawConstant(n, frac(a));
    }
    const v = variable();
    if (v) return v;
    const word = at(WORD);
    return fail(word ? `unknown variable "${word[0]}" (use x1..x${n}, y1..y${n}, th1..th${n})` : `unexpected "${c}"`);
  };
  const factor = (): RawPoly => {
    const base = atom();
    skip();
    if (text[pos] !== '^') return base;
    pos++;
    skip();
    const at = pos;
    const e = integer();
    if (e > BigInt(MAX_POWER)) fail(`exponent must be at most ${MAX_POWER}`, at);
    let r = rawConstant(n, frac(1));
    for (let i = 0n; i < e; i++) r = rawProduct(r, base);
    return r;
  };
  const term = (): RawPoly => {
    let r = factor();
    for (;;) {
      skip();
      if (text[pos] !== '*') return r;
      pos++;
      r = rawProduct(r, factor());
    }
  };
  function expr(): RawPoly {
    skip();
    let sign = 1;
    if (text[pos] === '-' || text[pos] === '+') {
      sign = text[pos] === '-' ? -1 : 1;
      pos++;
    }
    // one sum added into in place (a copy per term would make long seeds quadratic)
    const r = new Map<string, RawTerm>();
    const add = (p: RawPoly, sg: number): void => {
      for (const t of p.values()) rawAdd(r, t.x, t.y, t.mask, sg < 0 ? t.coeff.neg() : t.coeff);
    };
    add(term(), sign);
    for (;;) {
      skip();
      const c = text[pos];
      if (c !== '+' && c !== '-') return r;
      pos++;
      add(term(), c === '-' ? -1 : 1);
    }
  }
  if (text.trim() === '') throw new InputError(`--${option}: empty superpolynomial`, option);
  const result = expr();
  skip();
  if (pos < text.length) fail(text[pos] === ')' ? 'unmatched ")"' : 'expected "+", "-" or "*"');
  return result;
}
