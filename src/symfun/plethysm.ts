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
