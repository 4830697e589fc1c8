/** Dyck paths to noncrossing partitions, the inverse of nc-to-dyck (peaks ↦ blocks). */
import type { Transform } from '../../src/enumerate/plugin.js';
import { dyckToNoncrossing } from '../support/noncrossing.js';
import type { DyckPath, SetPartition } from '../types.js';

export const dyckToNc: Transform<DyckPath, SetPartition> = {
  id: 'dyck-to-nc',
  from: 'dyck-paths',
  to: 'noncrossing-partitions',
  description: 'the inverse of nc-to-dyck: a run of j north steps before the i-th east step opens a block {i, …} of size j; other i join the innermost open block',
  source: 'Simion, "Noncrossing partitions", Discrete Math. 217 (2000) (from memory; bijectivity checked in the tests)',
  examples: [
    [[1, 1, 1, 0, 0, 0], [[1, 2, 3]]],
    [[1, 0, 1, 0, 1, 0], [[1], [2], [3]]],
    [[1, 1, 0, 1, 0, 0], [[1, 3], [2]]],
    [[1, 1, 0, 0], [[1, 2]]],
  ],
  apply: dyckToNoncrossing,
};
