/**
 * Cyclotomic polynomials Φ_d(q) and the factorisation of an integer polynomial in q as
 * c · q^s · Π Φ_d^{e_d} · rest, exact over Z (BigInt), by repeated exact division.
 */
import { ArithmeticError, InputError } from '../core/errors.js';
import { gcd } from '../core/integers.js';
import { Poly } from '../core/poly.js';

const cache: Poly[] = [];

/** Φ_d = (q^d − 1) / Π_{e | d, e < d} Φ_e. */
export function cyclotomic(d: number): Poly {
  if (!Number.isInteger(d) || d < 1 || d > 10000) throw new InputError(`d must be an integer from 1 to 10000 (got ${d})`, 'd');
  const hit = cache[d];
  if (hit) return hit;
  let p = Poly.monomial(1n, d).sub(Poly.one);
  for (let e = 1; e < d; e++) if (d % e === 0) p = p.divExact(cyclotomic(e));
  cache[d] = p;
  return p;
}

/** Euler's φ(d), the degree of Φ_d. */
export function eulerPhi(d: number): number {
  let r = d;
  let m = d;
  for (let p = 2; p * p <= m; p++) {
    if (m % p === 0) {
      while (m % p === 0) m /= p;
      r -= r / p;
    }
  }
  if (m > 1) r -= r / m;
  return r;
}

export interface CyclotomicFactorization {
  /** Integer content, with the sign of the leading coefficient. */
  readonly content: bigint;
  /** Power of q dividing the polynomial. */
  readonly qPower: number;
  /** d -> exponent of Φ_d. */
  readonly exponents: ReadonlyMap<number, number>;
  /** What is left (1 when the polynomial is a product of cyclotomic polynomials). */
  readonly rest: Poly;
}

function tryDiv(p: Poly, d: Poly): Poly | undefined {
  try {
    return p.divExact(d);
  } catch (e) {
    if (e instanceof ArithmeticError) return undefined;
    throw e;
  }
}

/**
 * Factor out every Φ_d with φ(d) ≤ deg and d ≤ 4·deg + 4 (every Φ_d dividing a product of
 * q-integers of that degree is within the bound).
 */
export function factorCyclotomic(p: Poly): CyclotomicFactorization {
  if (!p.isUnivariate()) throw new InputError('cyclotomic factorisation needs a polynomial in q alone');
  if (p.isZero()) throw new InputError('cannot factor the zero polynomial');
  let content = 0n;
  for (const [, , c] of p.terms()) content = gcd(content, c);
  if (p.coeff(p.degQ()) < 0n) content = -content;
  const s = p.minDegQ();
  let r = Poly.fromTerms(p.sortedTerms().map(([i, j, c]) => [i - s, j, c / content] as const));
  const exponents = new Map<number, number>();
  const deg0 = r.degQ();
  for (let d = 1; d <= 4 * deg0 + 4 && r.degQ() > 0; d++) {
    if (eulerPhi(d) > r.degQ()) continue;
    const phi = cyclotomic(d);
    for (;;) {
      const qt = tryDiv(r, phi);
      if (!qt) break;
      r = qt;
      exponents.set(d, (exponents.get(d) ?? 0) + 1);
    }
  }
  return { content, qPower: s, exponents, rest: r };
}
