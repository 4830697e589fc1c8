/** A monotone triangle ↦ its alternating sign matrix: row k is the indicator of row k minus that of row k − 1. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { asmOfTriangle } from '../support/monotone-triangles.js';
import type { AlternatingSignMatrix, MonotoneTriangle } from '../types.js';

export const monotoneTriangleToAsm: Transform<MonotoneTriangle, AlternatingSignMatrix> = {
  id: 'monotone-triangle-to-asm',
  from: 'monotone-triangles',
  to: 'alternating-sign-matrices',
  description: 'the matrix whose row k is the indicator vector of row k of the triangle minus that of row k − 1',
  source: 'Mills–Robbins–Rumsey, J. Combin. Theory Ser. A 34 (1983); Bressoud, Proofs and Confirmations (1999) §1.2',
  examples: [
    [[[1], [1, 2], [1, 2, 3]], [[1, 0, 0], [0, 1, 0], [0, 0, 1]]],
    [[[2], [1, 3], [1, 2, 3]], [[0, 1, 0], [1, -1, 1], [0, 1, 0]]],
    [[[3], [1, 3], [1, 2, 3]], [[0, 0, 1], [1, 0, 0], [0, 1, 0]]],
  ],
  apply: asmOfTriangle,
};
