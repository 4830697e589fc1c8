/** The conjugate (transpose) of an integer partition. */
import { conjugate as conjugatePartition } from '../../src/core/partitions.js';
import type { Transform } from '../../src/enumerate/plugin.js';
import type { PartitionObj } from '../types.js';

export const conjugate: Transform<PartitionObj, PartitionObj> = {
  id: 'conjugate',
  from: 'partitions',
  to: 'partitions',
  description: "the conjugate partition λ' (rows and columns exchanged)",
  source: 'standard (Stanley, EC1 §1.8; Macdonald, Symmetric Functions, I.1)',
  examples: [
    [[3, 1], [2, 1, 1]],
    [[4, 2, 2, 1], [4, 3, 1, 1]],
  ],
  apply: (l) => conjugatePartition(l),
  involution: true,
};
