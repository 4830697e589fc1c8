/**
 * Statistics on Prüfer codes of trees on 0..n: a vertex v occurs deg(v) − 1 times in the code
 * of its tree (Stanley, EC2 §5.3, from memory), so these read degrees of the tree.
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { PruferCode } from '../objects/types.js';

export const pruferZeros: Statistic<PruferCode> = {
  id: 'prufer-zeros',
  family: 'prufer-codes',
  description: 'occurrences of the letter 0 (the degree of the root 0 minus one)',
  source: 'Stanley, EC2 §5.3 (Prüfer code and vertex degrees, from memory)',
  examples: [[[], 0], [[0], 1], [[3, 3], 0], [[0, 2, 0], 2]],
  compute: (c) => c.reduce((s, x) => (x === 0 ? s + 1 : s), 0),
};

export const pruferDistinctLetters: Statistic<PruferCode> = {
  id: 'prufer-distinct-letters',
  family: 'prufer-codes',
  description: 'number of distinct letters (the vertices that are not leaves, when n ≥ 2)',
  source: 'Stanley, EC2 §5.3 (Prüfer code and vertex degrees, from memory)',
  examples: [[[], 0], [[0], 1], [[3, 3], 1], [[0, 2, 0], 2], [[1, 3], 2]],
  compute: (c) => new Set(c).size,
};

export const pruferMaxMultiplicity: Statistic<PruferCode> = {
  id: 'prufer-max-multiplicity',
  family: 'prufer-codes',
  description: 'largest number of times one letter occurs (the maximum degree of the tree minus one, when n ≥ 2)',
  source: 'Stanley, EC2 §5.3 (Prüfer code and vertex degrees, from memory)',
  examples: [[[], 0], [[0], 1], [[3, 3], 2], [[0, 2, 0], 2], [[1, 3], 1]],
  compute(c) {
    const m = new Map<number, number>();
    let best = 0;
    for (const x of c) {
      const k = (m.get(x) ?? 0) + 1;
      m.set(x, k);
      best = Math.max(best, k);
    }
    return best;
  },
};
