/**
 * Request templates over a family of sizes: `{n}` and `{k}` stand for the parameters, and
 * integer arithmetic next to them is worked out (`e({k}-1)`, `--k {n}-{k}`, `--n {n}+1`),
 * so one command line describes a whole family of requests. `{λ}` (or `{lambda}`) stands for
 * a partition of n written as its parts, `H({λ})` at (3,1) being `H(3,1)`.
 */
import { InputError } from '../core/errors.js';

const TERM = String.raw`(?:\{[nk]\}|\d+)`;
const CHUNK = new RegExp(String.raw`${TERM}(?:\s*[-+]\s*${TERM})*`, 'g');
const LAMBDA = /\{(?:λ|lambda)\}/g;

export interface TemplateParams {
  readonly n: number;
  readonly k?: number;
  readonly lambda?: readonly number[];
}

export function templateUses(template: string): { n: boolean; k: boolean; lambda: boolean } {
  return { n: template.includes('{n}'), k: template.includes('{k}'), lambda: /\{(?:λ|lambda)\}/.test(template) };
}

/** A linear form a·n + b·k + c: what one arithmetic chunk of a template stands for. */
export interface Linear {
  readonly n: number;
  readonly k: number;
  readonly c: number;
}

function linearOf(chunk: string, sub: { n: Linear; k: Linear }): Linear {
  let out = { n: 0, k: 0, c: 0 };
  let sign = 1;
  for (const m of chunk.matchAll(/([-+])|\{([nk])\}|(\d+)/g)) {
    if (m[1]) sign = m[1] === '-' ? -1 : 1;
    else {
      const v: Linear = m[2] === 'n' ? sub.n : m[2] === 'k' ? sub.k : { n: 0, k: 0, c: Number(m[3]) };
      out = { n: out.n + sign * v.n, k: out.k + sign * v.k, c: out.c + sign * v.c };
      sign = 1;
    }
  }
  return out;
}

/** The template at (n, k, λ): every chunk holding a placeholder replaced by its integer value. */
export function instantiate(template: string, at: TemplateParams, option = 'from'): string {
  const withLambda = template.replace(LAMBDA, () => {
    if (!at.lambda) throw new InputError(`--${option}: {λ} appears but there is no partition here`, option);
    return at.lambda.join(',');
  });
  return withLambda.replace(CHUNK, (chunk) => {
    if (!/\{[nk]\}/.test(chunk)) return chunk;
    if (chunk.includes('{k}') && at.k === undefined) throw new InputError(`--${option}: {k} appears but there is no k here`, option);
    const f = linearOf(chunk, { n: { n: 1, k: 0, c: 0 }, k: { n: 0, k: 1, c: 0 } });
    const value = f.n * at.n + f.k * (at.k ?? 0) + f.c;
    if (value < 0) throw new InputError(`--${option}: "${chunk}" is ${value} at n = ${at.n}${at.k === undefined ? '' : `, k = ${at.k}`}; the template must give non-negative integers`, option);
    return String(value);
  });
}

function linearText(f: Linear): string {
  const parts: string[] = [];
  const put = (coef: number, text: string) => {
    for (let i = 0; i < Math.abs(coef); i++) parts.push(`${coef < 0 ? '-' : parts.length ? '+' : ''}${text}`);
  };
  put(f.n, '{n}');
  put(f.k, '{k}');
  if (f.c !== 0 || parts.length === 0) parts.push(`${f.c < 0 ? '-' : parts.length ? '+' : ''}${Math.abs(f.c)}`);
  return parts.join('');
}

/**
 * The template with {n} and {k} replaced by linear forms in n and k, each chunk written
 * again in its simplest form: `e({k}-1)` with k ↦ n − k + 1 is `e({n}-{k})`.
 */
export function substituteTemplate(template: string, sub: { n?: Linear; k?: Linear }): string {
  const full = { n: sub.n ?? { n: 1, k: 0, c: 0 }, k: sub.k ?? { n: 0, k: 1, c: 0 } };
  return template.replace(CHUNK, (chunk) => (/\{[nk]\}/.test(chunk) ? linearText(linearOf(chunk, full)) : chunk));
}
