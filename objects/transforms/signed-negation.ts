/** Negation of every letter of a signed permutation: w ↦ w₀w with w₀ = −id, the longest element of B_n. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { SignedPermutation } from '../types.js';

export const signedNegation: Transform<SignedPermutation, SignedPermutation> = {
  id: 'signed-negation',
  from: 'signed-permutations',
  to: 'signed-permutations',
  description: 'every entry negated (multiplication by the longest element −id of B_n; takes length ℓ to n² − ℓ)',
  source: 'Björner–Brenti, Combinatorics of Coxeter Groups, GTM 231, §8.1 (the longest element of B_n)',
  examples: [
    [[1, 2], [-1, -2]],
    [[2, -3, 1], [-2, 3, -1]],
    [[-1], [1]],
  ],
  apply: (w) => w.map((x) => -x),
  involution: true,
};
