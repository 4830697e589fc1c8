/**
 * The Kreweras complement of a noncrossing partition π of [n]: put 1′, …, n′ after 1, …, n
 * around a circle; K(π) is the coarsest partition of the primed points crossing no block of π.
 * Computed as the cycles of σ_π^{-1} ∘ c, with σ_π sending each element to the next one of its
 * block (cyclically) and c = (1 2 … n) (Kreweras, Discrete Math. 1 (1972); Biane's
 * permutation form, from memory). Blocks go to n + 1 − blocks, and K² is a rotation (tests).
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { SetPartition } from '../types.js';

export function krewerasComplement(p: SetPartition): number[][] {
  const n = p.reduce((s, b) => s + b.length, 0);
  const prev = new Array<number>(n + 1).fill(0); // σ_π^{-1}
  for (const b of p) b.forEach((x, t) => (prev[x] = b[(t - 1 + b.length) % b.length]!));
  const seen = new Array<boolean>(n + 1).fill(false);
  const out: number[][] = [];
  for (let i = 1; i <= n; i++) {
    if (seen[i]) continue;
    const block: number[] = [];
    for (let j = i; !seen[j]; j = prev[(j % n) + 1]!) {
      seen[j] = true;
      block.push(j);
    }
    out.push(block.sort((a, b) => a - b));
  }
  return out;
}

export const krewerasComplementMap: Transform<SetPartition, SetPartition> = {
  id: 'kreweras-complement',
  from: 'noncrossing-partitions',
  to: 'noncrossing-partitions',
  description: 'the Kreweras complement: the coarsest partition of the interleaved points crossing no block',
  source: 'Kreweras, "Sur les partitions non croisées d\'un cycle", Discrete Math. 1 (1972)',
  examples: [
    [[[1], [2], [3]], [[1, 2, 3]]],
    [[[1, 2, 3]], [[1], [2], [3]]],
    [[[1, 3], [2]], [[1, 2], [3]]],
    [[[1, 2], [3]], [[1], [2, 3]]],
  ],
  apply: krewerasComplement,
};
