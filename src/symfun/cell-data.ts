/**
 * Polynomials attached to a partition μ in French notation (Haglund, The q,t-Catalan numbers
 * and the space of diagonal harmonics, AMS 2008, ch. 2 — from memory): for a cell c in
 * row r (from the bottom) and column j, a'(c) = j, l'(c) = r, a(c) = μ_r − 1 − j,
 * l(c) = μ'_j − 1 − r.
 *   B_μ = Σ_c q^{a'} t^{l'},  T_μ = Π_c q^{a'} t^{l'},  Π_μ = Π_{c ≠ (0,0)} (1 − q^{a'} t^{l'}),
 *   w_μ = Π_c (q^{a} − t^{l+1})(t^{l} − q^{a+1}),  M = (1 − q)(1 − t).
 */
import { conjugate, type Partition } from '../core/partitions.js';
import { Poly } from '../core/poly.js';

export interface CellStats {
  readonly coarm: number;
  readonly coleg: number;
  readonly arm: number;
  readonly leg: number;
}

export function cellStats(mu: Partition): CellStats[] {
  const c = conjugate(mu);
  const out: CellStats[] = [];
  mu.forEach((len, r) => {
    for (let j = 0; j < len; j++) out.push({ coarm: j, coleg: r, arm: len - 1 - j, leg: c[j]! - 1 - r });
  });
  return out;
}

export function bigB(mu: Partition): Poly {
  return Poly.fromTerms(cellStats(mu).map((c) => [c.coarm, c.coleg, 1n] as const));
}

export function bigT(mu: Partition): Poly {
  let i = 0;
  let j = 0;
  for (const c of cellStats(mu)) {
    i += c.coarm;
    j += c.coleg;
  }
  return Poly.monomial(1n, i, j);
}

export function bigPi(mu: Partition): Poly {
  let r = Poly.one;
  for (const c of cellStats(mu)) if (c.coarm > 0 || c.coleg > 0) r = r.mul(Poly.one.sub(Poly.monomial(1n, c.coarm, c.coleg)));
  return r;
}

/** The binomial factors of w_μ as pairs [a, b] meaning q^a − t^b (with a sign). */
export function wFactors(mu: Partition): { readonly factors: readonly (readonly [number, number])[]; readonly sign: bigint } {
  const factors: [number, number][] = [];
  let sign = 1n;
  for (const c of cellStats(mu)) {
    factors.push([c.arm, c.leg + 1]); // q^a − t^{l+1}
    factors.push([c.arm + 1, c.leg]); // t^l − q^{a+1} = −(q^{a+1} − t^l)
    sign = -sign;
  }
  return { factors, sign };
}

export function bigW(mu: Partition): Poly {
  const { factors, sign } = wFactors(mu);
  let r = Poly.constant(sign);
  for (const [a, b] of factors) r = r.mul(Poly.monomial(1n, a).sub(Poly.monomial(1n, 0, b)));
  return r;
}

export const bigM: Poly = Poly.one.sub(Poly.q).mul(Poly.one.sub(Poly.t));
