/**
 * Products and quotients of q-integers: [m]_q = Π_{d | m, d > 1} Φ_d, so a product
 * Π [m]_q^{c_m} is read off the cyclotomic exponents from the top down (the [m]_q, m ≥ 2,
 * are triangular in the Φ_d), and Π [m]^{c_m} = Π [a]_q!^{f_a} with f_a = c_a − c_{a+1}.
 */
import type { Poly } from '../core/poly.js';
import { factorCyclotomic } from './cyclotomic.js';

export interface QProduct {
  readonly content: bigint;
  readonly qPower: number;
  /** a -> exponent of [a]_q! (a ≥ 2), non-zero entries only. */
  readonly factorials: ReadonlyMap<number, number>;
  /** m -> exponent of [m]_q (m ≥ 2), non-zero entries only. */
  readonly integers: ReadonlyMap<number, number>;
}

/** c · q^s · Π [a]_q!^{f_a}, or undefined when the polynomial is not of that form. */
export function asQProduct(p: Poly): QProduct | undefined {
  if (p.isZero() || !p.isUnivariate()) return undefined;
  const f = factorCyclotomic(p);
  if (!f.rest.isConstant() || (f.exponents.get(1) ?? 0) !== 0) return undefined;
  const top = Math.max(1, ...f.exponents.keys());
  const c = new Map<number, number>();
  for (let m = top; m >= 2; m--) {
    let v = f.exponents.get(m) ?? 0;
    for (let mm = 2 * m; mm <= top; mm += m) v -= c.get(mm) ?? 0;
    if (v !== 0) c.set(m, v);
  }
  const fact = new Map<number, number>();
  for (let a = 2; a <= top; a++) {
    const v = (c.get(a) ?? 0) - (c.get(a + 1) ?? 0);
    if (v !== 0) fact.set(a, v);
  }
  return { content: f.content * f.rest.constantTerm(), qPower: f.qPower, factorials: fact, integers: c };
}

function power(base: string, e: number): string {
  return e === 1 ? base : `${base}^${e}`;
}

/** Text such as "q^3 · [6]_q!/([2]_q! [4]_q!)", choosing the shorter of the two forms. */
export function qProductText(p: QProduct): string {
  const prefix: string[] = [];
  if (p.content !== 1n) prefix.push(String(p.content));
  if (p.qPower > 0) prefix.push(p.qPower === 1 ? 'q' : `q^${p.qPower}`);
  const body = p.factorials.size <= p.integers.size ? productText(p.factorials, (a) => `[${a}]_q!`) : productText(p.integers, (m) => `[${m}]_q`);
  const parts = [...prefix, ...(body === '1' && prefix.length ? [] : [body])];
  return parts.join(' · ');
}

export function productText(m: ReadonlyMap<number, number>, name: (a: number) => string): string {
  const num = [...m].filter(([, e]) => e > 0).sort((x, y) => y[0] - x[0]).map(([a, e]) => power(name(a), e));
  const den = [...m].filter(([, e]) => e < 0).sort((x, y) => y[0] - x[0]).map(([a, e]) => power(name(a), -e));
  const top = num.length ? num.join(' ') : '1';
  if (!den.length) return top;
  return `${top}/${den.length === 1 ? den[0] : `(${den.join(' ')})`}`;
}
