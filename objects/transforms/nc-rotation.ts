/** Rotation of a noncrossing partition: every element i moves to i + 1, and n to 1. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { SetPartition } from '../types.js';

export function rotateNoncrossing(p: SetPartition): number[][] {
  const n = p.reduce((s, b) => s + b.length, 0);
  return p.map((b) => b.map((x) => (x % n) + 1).sort((a, c) => a - c)).sort((a, c) => a[0]! - c[0]!);
}

export const ncRotation: Transform<SetPartition, SetPartition> = {
  id: 'nc-rotation',
  from: 'noncrossing-partitions',
  to: 'noncrossing-partitions',
  description: 'rotation i ↦ i + 1 (n ↦ 1) of the points around the circle',
  source: 'common practice (Kreweras, Discrete Math. 1 (1972))',
  examples: [
    [[[1, 2], [3]], [[1], [2, 3]]],
    [[[1, 4], [2, 3]], [[1, 2], [3, 4]]],
    [[[1], [2, 3]], [[1, 3], [2]]],
  ],
  apply: rotateNoncrossing,
};
