/** Quarter turn (clockwise) of an alternating sign matrix: B_ij = A_{n+1−j, i}. Order 4, not an involution. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { AlternatingSignMatrix } from '../types.js';

export const asmRotate: Transform<AlternatingSignMatrix, AlternatingSignMatrix> = {
  id: 'asm-rotate',
  from: 'alternating-sign-matrices',
  to: 'alternating-sign-matrices',
  description: 'the matrix turned a quarter clockwise (its first column, read bottom up, becomes the first row)',
  source: 'common practice (the dihedral symmetries of ASMs; Robbins, "Symmetry classes of alternating sign matrices", 2000)',
  examples: [
    [[[1]], [[1]]],
    [[[1, 0, 0], [0, 1, 0], [0, 0, 1]], [[0, 0, 1], [0, 1, 0], [1, 0, 0]]],
    [[[0, 1, 0], [0, 0, 1], [1, 0, 0]], [[1, 0, 0], [0, 0, 1], [0, 1, 0]]],
  ],
  apply: (a) => a.map((_, i) => a.map((_r, j) => a[a.length - 1 - j]![i]!)),
};
