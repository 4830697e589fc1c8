/**
 * q-analogs (common practice; Stanley, Enumerative Combinatorics vol. 1, 2nd ed., ch. 1):
 * q-integers, q-factorials, q-binomials, q-multinomials and q-Stirling numbers of the second
 * kind. All results are exact polynomials in q.
 */
import { InputError } from './errors.js';
import { Poly } from './poly.js';

function checkNat(name: string, v: number): void {
  if (!Number.isInteger(v) || v < 0) throw new InputError(`${name} must be a non-negative integer (got ${v})`, name);
}

/** [n]_q = 1 + q + … + q^{n−1} ([0]_q = 0). */
export function qInteger(n: number): Poly {
  checkNat('n', n);
  return Poly.fromQCoeffs(new Array<bigint>(n).fill(1n));
}

/** [n]_q! = [1]_q [2]_q … [n]_q. */
export function qFactorial(n: number): Poly {
  checkNat('n', n);
  let r = Poly.one;
  for (let i = 2; i <= n; i++) r = r.mul(qInteger(i));
  return r;
}

/** Gaussian binomial [n choose k]_q, by the q-Pascal recurrence (0 outside 0 ≤ k ≤ n). */
export function qBinomial(n: number, k: number): Poly {
  checkNat('n', n);
  if (!Number.isInteger(k)) throw new InputError(`k must be an integer (got ${k})`, 'k');
  if (k < 0 || k > n) return Poly.zero;
  // row of dense coefficient arrays, built with [n,k] = [n-1,k-1] + q^k [n-1,k]
  let row: bigint[][] = [[1n]];
  for (let m = 1; m <= n; m++) {
    const next: bigint[][] = [];
    for (let j = 0; j <= m; j++) {
      const a = j >= 1 ? row[j - 1]! : [];
      const b = j <= m - 1 ? row[j]! : [];
      const out = new Array<bigint>(Math.max(a.length, b.length + j)).fill(0n);
      a.forEach((c, i) => (out[i] = out[i]! + c));
      b.forEach((c, i) => (out[i + j] = out[i + j]! + c));
      next.push(out);
    }
    row = next;
  }
  return Poly.fromQCoeffs(row[k]!);
}

/** q-multinomial [n; a_1, …, a_r]_q with n = Σ a_i, as a product of q-binomials. */
export function qMultinomial(parts: readonly number[]): Poly {
  parts.forEach((p) => checkNat('part', p));
  let total = 0;
  let r = Poly.one;
  for (const p of parts) {
    total += p;
    r = r.mul(qBinomial(total, p));
  }
  return r;
}

const stirlingCache = new Map<string, Poly>();

/** q-Stirling Stir_q(n,k): Stir_q(n,k) = Stir_q(n−1,k−1) + [k]_q Stir_q(n−1,k) (Carlitz, q-Bernoulli numbers and polynomials, Duke Math. J. 15 (1948) — from memory). */
export function qStirling2(n: number, k: number): Poly {
  checkNat('n', n);
  if (!Number.isInteger(k)) throw new InputError(`k must be an integer (got ${k})`, 'k');
  if (k < 0 || k > n) return Poly.zero;
  if (n === 0) return Poly.one; // k = 0 here
  if (k === 0) return Poly.zero;
  const key = `${n},${k}`;
  const hit = stirlingCache.get(key);
  if (hit) return hit;
  const v = qStirling2(n - 1, k - 1).add(qInteger(k).mul(qStirling2(n - 1, k)));
  stirlingCache.set(key, v);
  return v;
}

/** [k]_q! · Stir_q(n,k): the q-count of ordered set partitions of [n] into k blocks (Remmel–Wilson, J. Combin. Theory Ser. A (2015); Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018)). */
export function qOrderedStirling(n: number, k: number): Poly {
  return qFactorial(Math.max(k, 0)).mul(qStirling2(n, k));
}
