/** A perfect matching of [2n] read as the fixed-point-free involution of [2n] exchanging the ends of each arc. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { PerfectMatching, Permutation } from '../types.js';

export const matchingToInvolution: Transform<PerfectMatching, Permutation> = {
  id: 'matching-to-involution',
  from: 'perfect-matchings',
  to: 'permutations',
  description: 'the fixed-point-free involution of [2n] swapping the two ends of every arc (a permutation of size 2n)',
  source: 'common practice (Stanley, EC1 §1.3)',
  examples: [
    [[2, 1], [2, 1]],
    [[3, 4, 1, 2], [3, 4, 1, 2]],
    [[4, 3, 2, 1, 6, 5], [4, 3, 2, 1, 6, 5]],
  ],
  apply: (m) => [...m],
};
