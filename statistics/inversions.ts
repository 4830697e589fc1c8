/** Inversions of a permutation. */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Permutation } from '../objects/types.js';

export const inversions: Statistic<Permutation> = {
  id: 'inversions',
  family: 'permutations',
  description: 'pairs i < j with w(i) > w(j)',
  source: 'standard (Stanley, EC1 §1.3)',
  examples: [
    [[], 0],
    [[1, 2, 3], 0],
    [[2, 1, 3], 1],
    [[3, 1, 4, 2], 3],
    [[4, 3, 2, 1], 6],
  ],
  step: (_at, _v, _prev, rank) => rank, // values below v placed later
  compute(w) {
    const n = w.length;
    let s = 0;
    for (let i = 0; i < n - 1; i++) {
      const x = w[i]!;
      for (let j = i + 1; j < n; j++) if (w[j]! < x) s++;
    }
    return s;
  },
};
