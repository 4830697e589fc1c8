/** The complement of a subset: its 0/1 word with every letter flipped. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { BinaryWord } from '../types.js';

export const subsetComplement: Transform<BinaryWord, BinaryWord> = {
  id: 'subset-complement',
  from: 'subsets',
  to: 'subsets',
  description: 'the complementary subset [n] ∖ S (0 and 1 exchanged; k becomes n − k)',
  source: 'common practice',
  examples: [[[0, 1, 1, 0], [1, 0, 0, 1]]],
  apply: (w) => w.map((b) => (1 - b) as 0 | 1),
  involution: true,
};
