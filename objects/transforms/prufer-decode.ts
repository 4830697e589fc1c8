/** A Prüfer code ↦ its tree on 0..n, rooted at 0 (the inverse of prufer-code). */
import type { Transform } from '../../src/enumerate/plugin.js';
import { decodePrufer } from '../support/cayley-trees.js';
import type { LabelledTree, PruferCode } from '../types.js';

export const pruferDecode: Transform<PruferCode, LabelledTree> = {
  id: 'prufer-decode',
  from: 'prufer-codes',
  to: 'labelled-trees',
  description: 'the tree of a Prüfer code: join each letter to the smallest current leaf, then the last two leaves',
  source: 'Prüfer (1918); Stanley, EC2 §5.3 (from memory)',
  examples: [
    [[0], [0, 0]],
    [[3, 3], [3, 3, 0]],
    [[1, 3], [0, 3, 1]],
  ],
  // The code alone does not tell n ≤ 1 apart: its length is n − 1 (n = 0 and 1 both give []).
  apply: (c) => decodePrufer(c, c.length + 1, new Array<number>(c.length + 1)),
};
