/**
 * Request templates over a family of sizes: `{n}` and `{k}` stand for the parameters, and
 * integer arithmetic next to them is worked out (`e({k}-1)`, `--k {n}-{k}`, `--n {n}+1`),
 * so one command line describes a whole family of requests.
 */
import { InputError } from '../core/errors.js';

const TERM = String.raw`(?:\{[nk]\}|\d+)`;
const CHUNK = new RegExp(String.raw`${TERM}(?:\s*[-+]\s*${TERM})*`, 'g');

export interface TemplateParams {
  readonly n: number;
  readonly k?: number;
}

export function templateUses(template: string): { n: boolean; k: boolean } {
  return { n: template.includes('{n}'), k: template.includes('{k}') };
}

/** The template at (n, k): every chunk holding a placeholder replaced by its integer value. */
export function instantiate(template: string, at: TemplateParams, option = 'from'): string {
  return template.replace(CHUNK, (chunk) => {
    if (!/\{[nk]\}/.test(chunk)) return chunk;
    if (chunk.includes('{k}') && at.k === undefined) throw new InputError(`--${option}: {k} appears but there is no k here`, option);
    let value = 0;
    let sign = 1;
    for (const m of chunk.matchAll(/([-+])|\{([nk])\}|(\d+)/g)) {
      if (m[1]) sign = m[1] === '-' ? -1 : 1;
      else {
        value += sign * (m[2] === 'n' ? at.n : m[2] === 'k' ? at.k! : Number(m[3]));
        sign = 1;
      }
    }
    if (value < 0) throw new InputError(`--${option}: "${chunk}" is ${value} at n = ${at.n}${at.k === undefined ? '' : `, k = ${at.k}`}; the template must give non-negative integers`, option);
    return String(value);
  });
}
