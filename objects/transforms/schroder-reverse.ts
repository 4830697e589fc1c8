/** Reversal of a Schröder path: read backwards, north and east exchanged, diagonal steps kept. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { SchroderPath } from '../types.js';

export const schroderReverse: Transform<SchroderPath, SchroderPath> = {
  id: 'schroder-reverse',
  from: 'schroder-paths',
  to: 'schroder-paths',
  description: 'the path read backwards with north and east exchanged (reflection in the antidiagonal; keeps the area)',
  source: 'common practice',
  examples: [
    [[1, 0, 2], [2, 1, 0]],
    [[1, 2, 0], [1, 2, 0]],
    [[1, 1, 0, 2, 0], [1, 2, 1, 0, 0]],
  ],
  apply: (p) => p.map((s) => (s === 2 ? 2 : 1 - s) as 0 | 1 | 2).reverse(),
  involution: true,
};
