/** Exact counting numbers (BigInt) used by the families' count functions. */
import { binomial, factorial } from '../../src/core/integers.js';

const stirlingRows: bigint[][] = [[1n]];

/** S(n, k), Stirling numbers of the second kind, by S(n,k) = S(n−1,k−1) + k S(n−1,k). */
export function stirling2(n: number, k: number): bigint {
  if (k < 0 || k > n) return 0n;
  for (let m = stirlingRows.length; m <= n; m++) {
    const prev = stirlingRows[m - 1]!;
    const row: bigint[] = [];
    for (let j = 0; j <= m; j++) row.push((prev[j - 1] ?? 0n) + BigInt(j) * (prev[j] ?? 0n));
    stirlingRows.push(row);
  }
  return stirlingRows[n]![k]!;
}

/** The Bell number B(n) = Σ_k S(n, k). */
export function bell(n: number): bigint {
  let s = 0n;
  for (let k = 0; k <= n; k++) s += stirling2(n, k);
  return s;
}

/** The Catalan number C(2n, n)/(n+1). */
export function catalan(n: number): bigint {
  return binomial(2 * n, n) / BigInt(n + 1);
}

/** The multinomial coefficient (Σ a)! / Π a_i!. */
export function multinomial(parts: readonly number[]): bigint {
  let d = 1n;
  let n = 0;
  for (const a of parts) {
    d *= factorial(a);
    n += a;
  }
  return factorial(n) / d;
}
