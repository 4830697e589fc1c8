/** The inverse of the rotation correspondence: left child → first child, right child → next sibling. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { forestOfBinary } from '../support/catalan-trees.js';
import type { BinaryTree, PlaneTree } from '../types.js';

export const binaryToPlaneTree: Transform<BinaryTree, PlaneTree> = {
  id: 'binary-to-plane-tree',
  from: 'binary-trees',
  to: 'plane-trees',
  description: 'inverse rotation correspondence: a left child becomes the first child, a right child the next sibling',
  source: 'Knuth, TAOCP vol. 1 §2.3.2 (natural correspondence between forests and binary trees)',
  examples: [
    [[null, null], [[]]],
    [[null, [null, null]], [[], []]],
    [[[null, [null, null]], [null, null]], [[[], []], []]],
  ],
  apply: forestOfBinary,
};
