/**
 * Plethystic substitution by alphabets that are polynomials in q, t with integer
 * coefficients: p_k[A] = A(q^k, t^k), so p_k[X·A] = p_k[X]·A(q^k, t^k) and
 * p_k[B_μ − 1] = B_μ(q^k, t^k) − 1.
 */
import { partitionKey, type Partition } from '../core/partitions.js';
import { Poly } from '../core/poly.js';
import { PolyQ } from '../core/polyq.js';
import { SymFun } from './symfun.js';

function powerSumAt(rho: Partition, a: Poly, cache: Map<number, Poly>): Poly {
  let r = Poly.one;
  for (const k of rho) {
    let v = cache.get(k);
    if (!v) {
      v = a.substitutePowers(k);
      cache.set(k, v);
    }
    r = r.mul(v);
  }
  return r;
}

/** F[X·A]. */
export function plethysmTimes(f: SymFun, a: Poly): SymFun {
  const cache = new Map<number, Poly>();
  const out = new Map<string, [Partition, PolyQ]>();
  for (const [rho, c] of f.toBasis('p')) out.set(partitionKey(rho), [rho, c.mul(PolyQ.of(powerSumAt(rho, a, cache)))]);
  return SymFun.fromBasis('p', out.values());
}

/** The scalar f[A] (every p_k replaced by A(q^k, t^k)). */
export function evaluateAtAlphabet(f: SymFun, a: Poly): PolyQ {
  const cache = new Map<number, Poly>();
  let s = PolyQ.zero;
  for (const [rho, c] of f.toBasis('p')) s = s.add(c.mul(PolyQ.of(powerSumAt(rho, a, cache))));
  return s;
}

/** (u;u)_n / Π_i (1 − u^{ρ_i}) for a partition ρ of n: a polynomial (a q-multinomial times factorials' ratio). */
function clearedFactor(rho: Partition, u: readonly [number, number]): Poly {
  const n = rho.reduce((a, b) => a + b, 0);
  let num = Poly.one;
  for (let i = 1; i <= n; i++) num = num.mul(Poly.one.sub(Poly.monomial(1n, u[0] * i, u[1] * i)));
  let den = Poly.one;
  for (const r of rho) den = den.mul(Poly.one.sub(Poly.monomial(1n, u[0] * r, u[1] * r)));
  return num.divExact(den);
}

/**
 * (u;u)_n (v;v)_n … · F[X/((1−u)(1−v)…)] for monomials u, v, … (degree by degree): the
 * plethysm by X/(1−u) has denominators Π_i (1 − u^{ρ_i}) on p_ρ, which divide (u;u)_n, so the
 * product is a polynomial. (q;q)_n h_n[X/(1−q)] is the graded Frobenius series of the
 * coinvariant algebra (Stanley, "Invariants of finite groups and their applications to
 * combinatorics", Bull. AMS 1 (1979)).
 */
export function plethysmDividedCleared(f: SymFun, monomials: readonly (readonly [number, number])[]): SymFun {
  const out = new Map<string, [Partition, PolyQ]>();
  for (const [rho, c] of f.toBasis('p')) {
    let w = Poly.one;
    for (const u of monomials) w = w.mul(clearedFactor(rho, u));
    out.set(partitionKey(rho), [rho, c.mul(PolyQ.of(w))]);
  }
  return SymFun.fromBasis('p', out.values());
}
