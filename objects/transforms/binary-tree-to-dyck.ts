/** A binary tree [L, R] ↦ the Dyck path 1 B(L) 0 B(R) (a bijection onto paths of semilength n). */
import type { Transform } from '../../src/enumerate/plugin.js';
import { dyckOfBinaryTree } from '../support/catalan-trees.js';
import type { BinaryTree, DyckPath } from '../types.js';

export const binaryTreeToDyck: Transform<BinaryTree, DyckPath> = {
  id: 'binary-tree-to-dyck',
  from: 'binary-trees',
  to: 'dyck-paths',
  description: 'the Dyck path 1 B(L) 0 B(R) of a binary tree with left subtree L and right subtree R',
  source: 'Stanley, EC2 §6.19 (binary trees and Dyck paths); common practice',
  examples: [
    [[null, null], [1, 0]],
    [[[null, null], null], [1, 1, 0, 0]],
    [[[null, [null, null]], [null, null]], [1, 1, 0, 1, 0, 0, 1, 0]],
  ],
  apply: dyckOfBinaryTree,
};
