/** The inverse of increasing-tree-of-permutation: the preorder of the tree with children visited in decreasing order. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { childrenOf } from '../support/tree-drawing.js';
import type { IncreasingTree, Permutation } from '../types.js';

export function preorderDecreasing(parent: IncreasingTree): number[] {
  const children = childrenOf(parent);
  const out: number[] = [];
  // Children are stored increasing; pushing them in that order pops the largest first.
  const stack = [...children[0]!];
  while (stack.length > 0) {
    const v = stack.pop()!;
    out.push(v);
    stack.push(...children[v]!);
  }
  return out;
}

export const permutationOfIncreasingTree: Transform<IncreasingTree, Permutation> = {
  id: 'permutation-of-increasing-tree',
  from: 'increasing-trees',
  to: 'permutations',
  description: 'the vertices 1..n in preorder, children visited from the largest to the smallest',
  source: 'Stanley, EC1 (2nd ed.) §1.5 (increasing trees, from memory)',
  examples: [
    [[0, 1, 2], [1, 2, 3]],
    [[0, 1, 0], [3, 1, 2]],
    [[0, 1, 1], [1, 3, 2]],
    [[0, 0, 2], [2, 3, 1]],
  ],
  apply: preorderDecreasing,
};
