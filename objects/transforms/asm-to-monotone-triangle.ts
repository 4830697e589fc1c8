/** An alternating sign matrix ↦ its monotone triangle: after each row, the columns whose partial sums are 1. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { triangleOfAsm } from '../support/monotone-triangles.js';
import type { AlternatingSignMatrix, MonotoneTriangle } from '../types.js';

export const asmToMonotoneTriangle: Transform<AlternatingSignMatrix, MonotoneTriangle> = {
  id: 'asm-to-monotone-triangle',
  from: 'alternating-sign-matrices',
  to: 'monotone-triangles',
  description: 'row k of the triangle lists the columns whose sums over the first k rows of the matrix equal 1',
  source: 'Mills–Robbins–Rumsey, J. Combin. Theory Ser. A 34 (1983); Bressoud, Proofs and Confirmations (1999) §1.2',
  examples: [
    [[[1, 0, 0], [0, 1, 0], [0, 0, 1]], [[1], [1, 2], [1, 2, 3]]],
    [[[0, 1, 0], [1, -1, 1], [0, 1, 0]], [[2], [1, 3], [1, 2, 3]]],
    [[[0, 1, 0], [0, 0, 1], [1, 0, 0]], [[2], [2, 3], [1, 2, 3]]],
  ],
  apply: triangleOfAsm,
};
