/** Reversal of the window of a signed permutation (right multiplication by the longest element of S_n). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { SignedPermutation } from '../types.js';

export const signedReverse: Transform<SignedPermutation, SignedPermutation> = {
  id: 'signed-reverse',
  from: 'signed-permutations',
  to: 'signed-permutations',
  description: 'the window read backwards, signs kept: w(n) … w(1)',
  source: 'common practice (Björner–Brenti, GTM 231, §8.1)',
  examples: [
    [[1, 2], [2, 1]],
    [[2, -3, 1], [1, -3, 2]],
    [[-1], [-1]],
  ],
  apply: (w) => [...w].reverse(),
  involution: true,
};
