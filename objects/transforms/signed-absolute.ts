/** Forgetting the signs: B_n → S_n, w ↦ |w(1)| … |w(n)| (the quotient by the normal subgroup of sign changes). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Permutation, SignedPermutation } from '../types.js';

export const signedAbsolute: Transform<SignedPermutation, Permutation> = {
  id: 'signed-absolute',
  from: 'signed-permutations',
  to: 'permutations',
  description: 'the permutation of absolute values |w(1)| … |w(n)| (each permutation has 2^n preimages)',
  source: 'Björner–Brenti, GTM 231, §8.1 (B_n as a semidirect product of sign changes and S_n)',
  examples: [
    [[1, 2], [1, 2]],
    [[2, -3, 1], [2, 3, 1]],
    [[-2, -1], [2, 1]],
  ],
  apply: (w) => w.map(Math.abs),
};
