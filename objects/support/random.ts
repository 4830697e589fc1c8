/** Random helpers for the samplers (random() returns a float in [0, 1)). */

/** A uniform integer in 0..m−1. */
export function randomBelow(random: () => number, m: number): number {
  return Math.min(m - 1, Math.floor(random() * m));
}

/** Fisher–Yates shuffle in place; returns the array. */
export function shuffleInPlace<T>(a: T[], random: () => number): T[] {
  for (let i = a.length - 1; i > 0; i--) {
    const j = randomBelow(random, i + 1);
    const t = a[i]!;
    a[i] = a[j]!;
    a[j] = t;
  }
  return a;
}

/** Index chosen with probability proportional to the BigInt weights (not all zero). */
export function weightedIndex(random: () => number, weights: readonly bigint[]): number {
  const total = weights.reduce((a, b) => a + b, 0n);
  // 53 random bits scaled to the total: fair up to a relative error of 2^-53.
  const scale = 2n ** 53n;
  let r = (BigInt(Math.floor(random() * Number(scale))) * total) / scale;
  for (let i = 0; i < weights.length; i++) {
    if (r < weights[i]!) return i;
    r -= weights[i]!;
  }
  return weights.length - 1;
}
