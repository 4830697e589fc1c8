/** Reversal of a Motzkin path: read backwards with up and down exchanged (a reflection). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { MotzkinPath } from '../types.js';

export const motzkinReverse: Transform<MotzkinPath, MotzkinPath> = {
  id: 'motzkin-reverse',
  from: 'motzkin-paths',
  to: 'motzkin-paths',
  description: 'the path read backwards with up and down exchanged (mirror image; keeps area and height)',
  source: 'common practice',
  examples: [
    [[1, 0, -1], [1, 0, -1]],
    [[0, 1, -1], [1, -1, 0]],
    [[1, 1, -1, 0, -1], [1, 0, 1, -1, -1]],
  ],
  apply: (p) => p.map((s) => (s === 0 ? 0 : -s) as -1 | 0 | 1).reverse(),
  involution: true,
};
