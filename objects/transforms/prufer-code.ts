/** A tree on 0..n ↦ its Prüfer code: remove the smallest leaf n − 1 times, writing down its neighbour. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { encodePrufer } from '../support/cayley-trees.js';
import type { LabelledTree, PruferCode } from '../types.js';

export const pruferCode: Transform<LabelledTree, PruferCode> = {
  id: 'prufer-code',
  from: 'labelled-trees',
  to: 'prufer-codes',
  description: 'the Prüfer code: repeatedly delete the smallest leaf and record its neighbour (n − 1 letters)',
  source: 'Prüfer (1918); Stanley, EC2 §5.3 (from memory)',
  examples: [
    [[0, 0], [0]],
    [[2, 0], [2]],
    [[3, 3, 0], [3, 3]],
    [[0, 3, 1], [1, 3]],
  ],
  apply: encodePrufer,
};
