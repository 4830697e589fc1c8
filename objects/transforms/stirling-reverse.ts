/** Reversal of a Stirling permutation (the defining condition is symmetric); swaps descents and ascents. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { StirlingPermutation } from '../types.js';

export const stirlingReverse: Transform<StirlingPermutation, StirlingPermutation> = {
  id: 'stirling-reverse',
  from: 'stirling-permutations',
  to: 'stirling-permutations',
  description: 'the word read backwards (again a Stirling permutation; descents with w_{2n+1} = 0 become ascents with w_0 = 0)',
  source: 'common practice',
  examples: [
    [[1, 1], [1, 1]],
    [[1, 1, 2, 2], [2, 2, 1, 1]],
    [[1, 2, 2, 1, 3, 3], [3, 3, 1, 2, 2, 1]],
  ],
  apply: (w) => [...w].reverse(),
  involution: true,
};
