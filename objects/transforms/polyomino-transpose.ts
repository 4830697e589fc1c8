/** Reflection of a parallelogram polyomino in the line y = x: rows become columns (width ↔ height). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { ParallelogramPolyomino } from '../types.js';

export function transposePolyomino(p: ParallelogramPolyomino): [number, number][] {
  const h = p.reduce((m, c) => Math.max(m, c[1]), 0);
  const out: [number, number][] = [];
  for (let y = 0; y < h; y++) {
    // The columns covering row y form an interval [first, last + 1).
    let first = -1;
    let last = -1;
    p.forEach(([b, t], x) => {
      if (y >= b && y < t) {
        if (first < 0) first = x;
        last = x;
      }
    });
    out.push([first, last + 1]);
  }
  return out;
}

export const polyominoTranspose: Transform<ParallelogramPolyomino, ParallelogramPolyomino> = {
  id: 'polyomino-transpose',
  from: 'parallelogram-polyominoes',
  to: 'parallelogram-polyominoes',
  description: 'reflection in the line y = x: rows become columns, width and height exchanged (keeps the area)',
  source: 'common practice',
  examples: [
    [[[0, 1]], [[0, 1]]],
    [[[0, 1], [0, 2]], [[0, 2], [1, 2]]],
    [[[0, 2], [1, 3], [1, 3]], [[0, 1], [0, 3], [1, 3]]],
  ],
  apply: transposePolyomino,
  involution: true,
};
