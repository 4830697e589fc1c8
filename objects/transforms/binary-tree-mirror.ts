/** Mirror image of a binary tree: left and right exchanged at every node. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { BinaryTree } from '../types.js';

export function mirrorBinary(t: BinaryTree): BinaryTree {
  return t === null ? null : [mirrorBinary(t[1]), mirrorBinary(t[0])];
}

export const binaryTreeMirror: Transform<BinaryTree, BinaryTree> = {
  id: 'binary-tree-mirror',
  from: 'binary-trees',
  to: 'binary-trees',
  description: 'the mirror image: left and right subtrees exchanged at every node (swaps the left and right branches)',
  source: 'common practice',
  examples: [
    [[null, null], [null, null]],
    [[[null, null], null], [null, [null, null]]],
    [[[null, [null, null]], [null, null]], [[null, null], [[null, null], null]]],
  ],
  apply: mirrorBinary,
  involution: true,
};
