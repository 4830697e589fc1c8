/**
 * Permutations → increasing trees on 0..n: the parent of w(i) is the nearest entry to its left
 * that is smaller (0 when none). Leaves are the descents' tops and the last entry (leaves =
 * des + 1), the children of 0 the left-to-right minima. Inverse: read the tree in preorder,
 * children in decreasing order (Stanley, EC1 (2nd ed.) §1.5, from memory; bijectivity is tested).
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { IncreasingTree, Permutation } from '../types.js';

export function increasingTreeOf(w: Permutation): number[] {
  const parent = new Array<number>(w.length);
  const stack: number[] = []; // increasing entries seen, the candidates for a parent
  for (const x of w) {
    while (stack.length > 0 && stack[stack.length - 1]! > x) stack.pop();
    parent[x - 1] = stack.length > 0 ? stack[stack.length - 1]! : 0;
    stack.push(x);
  }
  return parent;
}

export const increasingTreeOfPermutation: Transform<Permutation, IncreasingTree> = {
  id: 'increasing-tree-of-permutation',
  from: 'permutations',
  to: 'increasing-trees',
  description: 'each entry hangs below the nearest smaller entry to its left (below 0 when none)',
  source: 'Stanley, EC1 (2nd ed.) §1.5 (increasing trees, from memory)',
  examples: [
    [[1, 2, 3], [0, 1, 2]],
    [[3, 1, 2], [0, 1, 0]],
    [[1, 3, 2], [0, 1, 1]],
    [[2, 3, 1], [0, 0, 2]],
  ],
  apply: increasingTreeOf,
};
