/** Noncrossing partitions to Dyck paths: N^{|B|} at the least element of each block B, then E; blocks ↦ peaks. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { noncrossingToDyck } from '../support/noncrossing.js';
import type { DyckPath, SetPartition } from '../types.js';

export const ncToDyck: Transform<SetPartition, DyckPath> = {
  id: 'nc-to-dyck',
  from: 'noncrossing-partitions',
  to: 'dyck-paths',
  description: 'reading 1..n: N^{|B|} when i is the least element of its block B, then E (blocks become peaks)',
  source: 'Simion, "Noncrossing partitions", Discrete Math. 217 (2000) (from memory; bijectivity checked in the tests)',
  examples: [
    [[[1, 2, 3]], [1, 1, 1, 0, 0, 0]],
    [[[1], [2], [3]], [1, 0, 1, 0, 1, 0]],
    [[[1, 3], [2]], [1, 1, 0, 1, 0, 0]],
  ],
  apply: noncrossingToDyck,
};
