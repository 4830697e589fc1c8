/**
 * Typed polynomials with integer parameters: `x1^{a}*x2^{b}*th1` with `--param a=0..3
 * --param b=0..2`. Arithmetic goes inside the braces (`x1^{a+1}`, `x2^{n-k}`), so that
 * `x1^{a}+1` keeps reading as x1^a + 1; `{n}` and `{k}` are the sweep's own sizes.
 */
import { InputError } from '../core/errors.js';
import { shown } from '../core/shown.js';
import { numberListText, parseNumberList } from './numberList.js';

export interface PolyParam {
  readonly name: string;
  readonly values: readonly number[];
}

const BRACE = /\{([^{}]*)\}/g;
const EXPR = /^\s*(?:[a-z][a-z0-9_]*|\d+)(?:\s*[-+]\s*(?:[a-z][a-z0-9_]*|\d+))*\s*$/;
const WORD = /[a-z][a-z0-9_]*/g;
const MAX_PARAM = 30;
/** Assignments of the parameters a sweep may go through. */
export const MAX_ASSIGNMENTS = 100_000;

/** The parameter names in the braces of a template; InputError on a brace that is not a sum of names and integers. */
export function templateNames(poly: string): string[] {
  const names = new Set<string>();
  for (const m of poly.matchAll(BRACE)) {
    if (!EXPR.test(m[1]!)) throw new InputError(`--poly: {${shown(m[1]!, 20)}} must hold names and integers joined by + and -, e.g. {a+1}`, 'poly');
    for (const w of m[1]!.matchAll(WORD)) names.add(w[0]);
  }
  return [...names];
}

export function parsePolyParams(poly: string, raw: readonly string[]): PolyParam[] {
  const used = templateNames(poly).filter((x) => x !== 'n' && x !== 'k');
  const params = new Map<string, number[]>();
  for (const text of raw) {
    const m = /^\s*([a-z][a-z0-9_]*)\s*=\s*(.+)$/.exec(text);
    if (!m) throw new InputError(`--param must be name=a..b, e.g. a=0..3 (got "${shown(text, 40)}")`, 'param');
    const name = m[1]!;
    if (name === 'n' || name === 'k') throw new InputError(`--param ${name}: {n} and {k} are the sweep's sizes (--n, --k)`, 'param');
    if (params.has(name)) throw new InputError(`--param ${name} is given twice`, 'param');
    if (!used.includes(name)) throw new InputError(`--param ${name}: {${name}} does not appear in --poly`, 'param');
    params.set(name, parseNumberList(m[2]!, 'param', 0, MAX_PARAM));
  }
  const missing = used.filter((x) => !params.has(x));
  if (missing.length) throw new InputError(`--poly uses {${missing[0]}}: give its range with --param ${missing[0]}=a..b`, 'param');
  const out = [...params].map(([name, values]) => ({ name, values })).sort((a, b) => a.name.localeCompare(b.name));
  const count = out.reduce((c, p) => c * p.values.length, 1);
  if (count > MAX_ASSIGNMENTS) throw new InputError(`the parameters give ${count} polynomials; a sweep takes at most ${MAX_ASSIGNMENTS}`, 'param');
  return out;
}

export function polyParamsText(params: readonly PolyParam[]): string[] {
  return params.map((p) => `${p.name}=${numberListText(p.values)}`);
}

/** Every assignment of the parameters, the first parameter varying slowest. */
export function assignments(params: readonly PolyParam[]): Record<string, number>[] {
  let out: Record<string, number>[] = [{}];
  for (const p of params) out = out.flatMap((a) => p.values.map((v) => ({ ...a, [p.name]: v })));
  return out;
}

/** The polynomial at one assignment; undefined when a chunk is negative there (that seed is left out). */
export function substitute(poly: string, values: Readonly<Record<string, number>>): string | undefined {
  let negative = false;
  const text = poly.replace(BRACE, (_all, inner: string) => {
    let value = 0;
    let sign = 1;
    for (const m of inner.matchAll(/([-+])|([a-z][a-z0-9_]*)|(\d+)/g)) {
      if (m[1]) sign = m[1] === '-' ? -1 : 1;
      else {
        const v = m[2] !== undefined ? values[m[2]] : Number(m[3]);
        if (v === undefined) throw new InputError(`--poly: ${m[2]} has no value here`, 'poly');
        value += sign * v;
        sign = 1;
      }
    }
    if (value < 0) negative = true;
    return String(value);
  });
  return negative ? undefined : text;
}

/** "a=2, b=0" for labels. */
export function assignmentText(a: Readonly<Record<string, number>>): string {
  return Object.entries(a).map(([k, v]) => `${k}=${v}`).join(', ');
}
