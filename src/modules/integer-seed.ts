/**
 * Exact integer entries for the derivative route: the seed's coefficients lifted from F_p
 * when a bound proves them (|c| ≤ Σ|raw coefficients| · n! for integer raw coefficients), and
 * the check that every matrix entry c·Π γ_i!/(γ_i−α_i)! stays below 2^53.
 */
import type { SeedTerms } from './seeds.js';
import type { SeedSupport } from './seed-support.js';

export function integerSeedSupport(seed: SeedSupport, terms: SeedTerms): SeedSupport | undefined {
  let rawSum = 0n;
  for (const t of terms.raw.values()) {
    if (t.coeff.d !== 1n) return undefined;
    rawSum += t.coeff.n;
  }
  const n = seed.space.n;
  let fact = 1n;
  for (let i = 2; i <= n; i++) fact *= BigInt(i);
  const bound = terms.symmetrizer === 'none' ? rawSum : rawSum * fact;
  if (2n * bound >= BigInt(seed.p)) return undefined;
  const coeffs = new Float64Array(seed.count);
  let maxEntry = 0;
  for (let t = 0; t < seed.count; t++) {
    const c = seed.coeffs[t]!;
    coeffs[t] = c > seed.p / 2 ? c - seed.p : c;
    let prod = Math.abs(coeffs[t]!);
    for (let i = 0; i < n; i++) prod *= factorial(seed.xs[t * n + i]!) * factorial(seed.ys[t * n + i]!);
    maxEntry = Math.max(maxEntry, prod);
  }
  if (maxEntry >= 2 ** 53) return undefined;
  return { ...seed, coeffs, p: 0 };
}

function factorial(e: number): number {
  let r = 1;
  for (let i = 2; i <= e; i++) r *= i;
  return r;
}
