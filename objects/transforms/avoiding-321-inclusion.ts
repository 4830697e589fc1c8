/** A 321-avoiding permutation seen as a permutation (so every permutation statistic reads it). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Permutation } from '../types.js';

export const avoiding321Inclusion: Transform<Permutation, Permutation> = {
  id: '321-avoiding-inclusion',
  from: '321-avoiding-permutations',
  to: 'permutations',
  description: 'the same permutation in the family of all permutations of [n]',
  source: 'common practice',
  examples: [
    [[1, 2, 3], [1, 2, 3]],
    [[2, 3, 1], [2, 3, 1]],
    [[3, 1, 2], [3, 1, 2]],
  ],
  apply: (w) => [...w],
};
