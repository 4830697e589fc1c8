/** Fixed points of a permutation. */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Permutation } from '../objects/types.js';

export const fixedPoints: Statistic<Permutation> = {
  id: 'fixed-points',
  family: 'permutations',
  description: 'number of i with w(i) = i',
  source: 'standard (Stanley, EC1 §2.2, derangements)',
  examples: [
    [[], 0],
    [[1, 2, 3], 3],
    [[2, 3, 1], 0],
    [[1, 3, 2, 4], 2],
  ],
  step: (at, v) => (v === at + 1 ? 1 : 0),
  compute(w) {
    let s = 0;
    for (let i = 0; i < w.length; i++) if (w[i] === i + 1) s++;
    return s;
  },
};
