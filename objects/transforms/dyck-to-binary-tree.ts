/** The inverse of binary-tree-to-dyck: a Dyck path 1 P 0 Q ↦ the binary tree [tree(P), tree(Q)]. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { binaryTreeOfDyck } from '../support/catalan-trees.js';
import type { BinaryTree, DyckPath } from '../types.js';

export const dyckToBinaryTree: Transform<DyckPath, BinaryTree> = {
  id: 'dyck-to-binary-tree',
  from: 'dyck-paths',
  to: 'binary-trees',
  description: 'the binary tree of a Dyck path split at its first return as 1 P 0 Q: left subtree from P, right from Q',
  source: 'Stanley, EC2 §6.19 (binary trees and Dyck paths); common practice',
  examples: [
    [[1, 0], [null, null]],
    [[1, 0, 1, 0], [null, [null, null]]],
    [[1, 1, 0, 1, 0, 0, 1, 0], [[null, [null, null]], [null, null]]],
  ],
  apply: binaryTreeOfDyck,
};
