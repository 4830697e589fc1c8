/** Transpose of an alternating sign matrix (the inverse permutation for permutation matrices). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { AlternatingSignMatrix } from '../types.js';

export const asmTranspose: Transform<AlternatingSignMatrix, AlternatingSignMatrix> = {
  id: 'asm-transpose',
  from: 'alternating-sign-matrices',
  to: 'alternating-sign-matrices',
  description: 'the transposed matrix (keeps the inversion number and the −1s; swaps first row and first column)',
  source: 'common practice (the dihedral symmetries of ASMs; Robbins, "Symmetry classes of alternating sign matrices", 2000)',
  examples: [
    [[[1]], [[1]]],
    [[[0, 1, 0], [0, 0, 1], [1, 0, 0]], [[0, 0, 1], [1, 0, 0], [0, 1, 0]]],
    [[[0, 1, 0], [1, -1, 1], [0, 1, 0]], [[0, 1, 0], [1, -1, 1], [0, 1, 0]]],
  ],
  apply: (a) => a.map((_, i) => a.map((r) => r[i]!)),
  involution: true,
};
