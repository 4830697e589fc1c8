/** A permutation w ↦ its permutation matrix (a 1 in row i, column w(i)): the ASMs without −1s. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { AlternatingSignMatrix, Permutation } from '../types.js';

export const permutationMatrix: Transform<Permutation, AlternatingSignMatrix> = {
  id: 'permutation-matrix',
  from: 'permutations',
  to: 'alternating-sign-matrices',
  description: 'the permutation matrix with a 1 in row i, column w(i) (ASM inversions = inversions of w)',
  source: 'Mills–Robbins–Rumsey, J. Combin. Theory Ser. A 34 (1983) (ASMs generalise permutation matrices)',
  examples: [
    [[1, 2], [[1, 0], [0, 1]]],
    [[2, 3, 1], [[0, 1, 0], [0, 0, 1], [1, 0, 0]]],
    [[3, 1, 2], [[0, 0, 1], [1, 0, 0], [0, 1, 0]]],
  ],
  apply: (w) => w.map((x) => w.map((_, j) => (j + 1 === x ? 1 : 0))),
};
