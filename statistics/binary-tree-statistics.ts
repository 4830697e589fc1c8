/**
 * Statistics on binary trees (n nodes; a node's children are an optional left and an optional
 * right one). Definitions as in Stanley, EC2 §6.19 and Deutsch, "Dyck path enumeration",
 * Discrete Math. 204 (1999), where they are read on the coding 1 B(L) 0 B(R).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { BinaryTree } from '../objects/types.js';

const ONE: BinaryTree = [null, null];
const LEFT2: BinaryTree = [ONE, null];
const RIGHT2: BinaryTree = [null, ONE];
const FULL3: BinaryTree = [ONE, ONE];
/** Root with a left child that has a right child, and a right child: 4 nodes. */
const T4: BinaryTree = [RIGHT2, ONE];
const LEFT3: BinaryTree = [LEFT2, null];

/** Sum of f over the nodes (f sees the node and its depth). */
function overNodes(t: BinaryTree, f: (u: readonly [BinaryTree, BinaryTree], depth: number) => number, depth = 0): number {
  return t === null ? 0 : f(t, depth) + overNodes(t[0], f, depth + 1) + overNodes(t[1], f, depth + 1);
}

const STANLEY = 'Stanley, EC2 §6.19 (binary trees)';

export const binaryTreeLeaves: Statistic<BinaryTree> = {
  id: 'binary-tree-leaves',
  family: 'binary-trees',
  description: 'nodes with neither a left nor a right child',
  source: `${STANLEY}; the count by leaves is Touchard's identity (Riordan, Combinatorial Identities, 1968)`,
  examples: [[null, 0], [ONE, 1], [LEFT2, 1], [FULL3, 2], [T4, 2]],
  compute: (t) => overNodes(t, (u) => (u[0] === null && u[1] === null ? 1 : 0)),
};

export const binaryTreeFullNodes: Statistic<BinaryTree> = {
  id: 'binary-tree-full-nodes',
  family: 'binary-trees',
  description: 'nodes with both a left and a right child (one fewer than the leaves when n ≥ 1)',
  source: STANLEY,
  examples: [[null, 0], [ONE, 0], [LEFT2, 0], [FULL3, 1], [T4, 1]],
  compute: (t) => overNodes(t, (u) => (u[0] !== null && u[1] !== null ? 1 : 0)),
};

function height(t: BinaryTree): number {
  return t === null ? 0 : 1 + Math.max(height(t[0]), height(t[1]));
}

export const binaryTreeHeight: Statistic<BinaryTree> = {
  id: 'binary-tree-height',
  family: 'binary-trees',
  description: 'number of nodes on a longest path from the root down (0 for the empty tree)',
  source: 'common practice (Flajolet–Sedgewick, Analytic Combinatorics §VII.10, height of binary trees)',
  examples: [[null, 0], [ONE, 1], [LEFT2, 2], [FULL3, 2], [T4, 3]],
  compute: height,
};

export const binaryTreeLeftBranch: Statistic<BinaryTree> = {
  id: 'binary-tree-left-branch',
  family: 'binary-trees',
  description: 'nodes on the path from the root going always to the left child (the first run of 1s of the coding)',
  source: 'common practice (Deutsch, Discrete Math. 204 (1999), initial rise of the Dyck path)',
  examples: [[null, 0], [ONE, 1], [LEFT2, 2], [RIGHT2, 1], [T4, 2]],
  compute(t) {
    let s = 0;
    for (let u = t; u !== null; u = u[0]) s++;
    return s;
  },
};

export const binaryTreeRightBranch: Statistic<BinaryTree> = {
  id: 'binary-tree-right-branch',
  family: 'binary-trees',
  description: 'nodes on the path from the root going always to the right child (returns of the coding Dyck path)',
  source: 'common practice (Deutsch, Discrete Math. 204 (1999), returns of Dyck paths)',
  examples: [[null, 0], [ONE, 1], [LEFT2, 1], [RIGHT2, 2], [T4, 2]],
  compute(t) {
    let s = 0;
    for (let u = t; u !== null; u = u[1]) s++;
    return s;
  },
};

export const binaryTreePathLength: Statistic<BinaryTree> = {
  id: 'binary-tree-path-length',
  family: 'binary-trees',
  description: 'internal path length: the sum of the depths of the nodes (the root at depth 0)',
  source: 'Knuth, TAOCP vol. 1 §2.3.4.5 (path length)',
  examples: [[null, 0], [ONE, 0], [LEFT2, 1], [FULL3, 2], [T4, 4]],
  compute: (t) => overNodes(t, (_u, d) => d),
};

export const binaryTreeLeftEdges: Statistic<BinaryTree> = {
  id: 'binary-tree-left-edges',
  family: 'binary-trees',
  description: 'nodes that have a left child (Narayana distributed)',
  source: 'Stanley, EC2 ex. 6.36 (Narayana numbers, from memory)',
  examples: [[null, 0], [ONE, 0], [LEFT2, 1], [LEFT3, 2], [T4, 1]],
  compute: (t) => overNodes(t, (u) => (u[0] !== null ? 1 : 0)),
};

export const binaryTreeLeftSubtree: Statistic<BinaryTree> = {
  id: 'binary-tree-left-subtree',
  family: 'binary-trees',
  description: "number of nodes in the root's left subtree (0 for the empty tree)",
  source: 'common practice (the Catalan recurrence C_n = Σ C_k C_{n−1−k} splits on it)',
  examples: [[null, 0], [ONE, 0], [LEFT2, 1], [FULL3, 1], [T4, 2]],
  compute: (t) => (t === null ? 0 : overNodes(t[0], () => 1)),
};
