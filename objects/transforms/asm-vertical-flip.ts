/** Rows of an alternating sign matrix in reverse order (reflection in a horizontal line). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { AlternatingSignMatrix } from '../types.js';

export const asmVerticalFlip: Transform<AlternatingSignMatrix, AlternatingSignMatrix> = {
  id: 'asm-vertical-flip',
  from: 'alternating-sign-matrices',
  to: 'alternating-sign-matrices',
  description: 'the rows in reverse order (reflection in a horizontal line; the first row becomes the last)',
  source: 'common practice (the dihedral symmetries of ASMs; Robbins, "Symmetry classes of alternating sign matrices", 2000)',
  examples: [
    [[[1]], [[1]]],
    [[[1, 0, 0], [0, 1, 0], [0, 0, 1]], [[0, 0, 1], [0, 1, 0], [1, 0, 0]]],
    [[[0, 1, 0], [1, -1, 1], [0, 1, 0]], [[0, 1, 0], [1, -1, 1], [0, 1, 0]]],
  ],
  apply: (a) => [...a].reverse().map((r) => [...r]),
  involution: true,
};
