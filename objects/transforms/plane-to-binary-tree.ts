/**
 * The rotation correspondence: the subtrees of a plane tree's root, a forest, become a binary
 * tree in which a node's left child is its first child and its right child its next sibling.
 * It commutes with the two Dyck-path codings (checked in the tests).
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import { binaryOfForest } from '../support/catalan-trees.js';
import type { BinaryTree, PlaneTree } from '../types.js';

export const planeToBinaryTree: Transform<PlaneTree, BinaryTree> = {
  id: 'plane-to-binary-tree',
  from: 'plane-trees',
  to: 'binary-trees',
  description: 'rotation correspondence: first child → left child, next sibling → right child (n edges ↦ n nodes)',
  source: 'Knuth, TAOCP vol. 1 §2.3.2 (natural correspondence between forests and binary trees)',
  examples: [
    [[[]], [null, null]],
    [[[], []], [null, [null, null]]],
    [[[[]]], [[null, null], null]],
    [[[[], []], []], [[null, [null, null]], [null, null]]],
  ],
  apply: (t) => binaryOfForest(t),
};
