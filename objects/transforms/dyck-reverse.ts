/** Reversal of a Dyck path: read it backwards exchanging north and east (a reflection). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { DyckPath } from '../types.js';

export const dyckReverse: Transform<DyckPath, DyckPath> = {
  id: 'dyck-reverse',
  from: 'dyck-paths',
  to: 'dyck-paths',
  description: 'the path read backwards with north and east exchanged (reflection in the antidiagonal; keeps the area)',
  source: 'common practice',
  examples: [
    [[1, 1, 0, 1, 0, 0], [1, 1, 0, 1, 0, 0]],
    [[1, 1, 0, 0, 1, 0], [1, 0, 1, 1, 0, 0]],
  ],
  apply: (p) => p.map((s) => (1 - s) as 0 | 1).reverse(),
  involution: true,
};
