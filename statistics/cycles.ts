/** Number of cycles of a permutation. */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Permutation } from '../objects/types.js';

export const cycles: Statistic<Permutation> = {
  id: 'cycles',
  family: 'permutations',
  description: 'number of cycles (fixed points included)',
  source: 'standard (Stanley, EC1 §1.3, signless Stirling numbers of the first kind)',
  examples: [
    [[], 0],
    [[1, 2, 3], 3],
    [[2, 3, 1], 1],
    [[2, 1, 4, 3], 2],
    [[3, 1, 4, 2], 1],
  ],
  compute(w) {
    const n = w.length;
    const seen = new Uint8Array(n);
    let c = 0;
    for (let i = 0; i < n; i++) {
      if (seen[i]) continue;
      c++;
      for (let j = i; !seen[j]; j = w[j]! - 1) seen[j] = 1;
    }
    return c;
  },
};
