/**
 * Statistics on plane (ordered) trees with n edges; depths count edges from the root.
 * Deutsch, "Dyck path enumeration", Discrete Math. 204 (1999) reads each of them on the
 * depth-first walk (leaves = peaks, root degree = returns, height = height of the path).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { PlaneTree } from '../objects/types.js';

const CHERRY: PlaneTree = [[], []];
const PATH2: PlaneTree = [[[]]];
/** Root with children A (two leaf children) and B (a leaf): 4 edges. */
const T4: PlaneTree = [[[], []], []];

function overNodes(t: PlaneTree, f: (u: PlaneTree, depth: number) => number, depth = 0): number {
  let s = f(t, depth);
  for (const c of t) s += overNodes(c, f, depth + 1);
  return s;
}

const DEUTSCH = 'Deutsch, "Dyck path enumeration", Discrete Math. 204 (1999)';

export const planeTreeLeaves: Statistic<PlaneTree> = {
  id: 'plane-tree-leaves',
  family: 'plane-trees',
  description: 'nodes without children (the root too when n = 0): Narayana distributed',
  source: `${DEUTSCH} (peaks); Stanley, EC2 ex. 6.36`,
  examples: [[[], 1], [[[]], 1], [CHERRY, 2], [PATH2, 1], [T4, 3]],
  compute: (t) => overNodes(t, (u) => (u.length === 0 ? 1 : 0)),
};

export const planeTreeRootDegree: Statistic<PlaneTree> = {
  id: 'plane-tree-root-degree',
  family: 'plane-trees',
  description: 'number of children of the root (ballot numbers)',
  source: `${DEUTSCH} (returns)`,
  examples: [[[], 0], [[[]], 1], [CHERRY, 2], [PATH2, 1], [T4, 2]],
  compute: (t) => t.length,
};

function height(t: PlaneTree): number {
  let h = 0;
  for (const c of t) h = Math.max(h, 1 + height(c));
  return h;
}

export const planeTreeHeight: Statistic<PlaneTree> = {
  id: 'plane-tree-height',
  family: 'plane-trees',
  description: 'largest depth of a node (edges from the root)',
  source: `${DEUTSCH} (height); de Bruijn–Knuth–Rice, "The average height of planted plane trees" (1972)`,
  examples: [[[], 0], [[[]], 1], [CHERRY, 1], [PATH2, 2], [T4, 2]],
  compute: height,
};

export const planeTreePathLength: Statistic<PlaneTree> = {
  id: 'plane-tree-path-length',
  family: 'plane-trees',
  description: 'sum of the depths of all nodes',
  source: 'Knuth, TAOCP vol. 1 §2.3.4.5 (path length)',
  examples: [[[], 0], [[[]], 1], [CHERRY, 2], [PATH2, 3], [T4, 6]],
  compute: (t) => overNodes(t, (_u, d) => d),
};

export const planeTreeBinaryNodes: Statistic<PlaneTree> = {
  id: 'plane-tree-binary-nodes',
  family: 'plane-trees',
  description: 'nodes with exactly two children',
  source: DEUTSCH,
  examples: [[[], 0], [CHERRY, 1], [PATH2, 0], [T4, 2]],
  compute: (t) => overNodes(t, (u) => (u.length === 2 ? 1 : 0)),
};

export const planeTreeUnaryNodes: Statistic<PlaneTree> = {
  id: 'plane-tree-unary-nodes',
  family: 'plane-trees',
  description: 'nodes with exactly one child',
  source: DEUTSCH,
  examples: [[[], 0], [[[]], 1], [CHERRY, 0], [PATH2, 2], [T4, 0]],
  compute: (t) => overNodes(t, (u) => (u.length === 1 ? 1 : 0)),
};

export const planeTreeLeftBranch: Statistic<PlaneTree> = {
  id: 'plane-tree-left-branch',
  family: 'plane-trees',
  description: 'edges on the path from the root always to the first (leftmost) child',
  source: 'common practice (the initial run of down steps of the depth-first walk)',
  examples: [[[], 0], [[[]], 1], [CHERRY, 1], [PATH2, 2], [T4, 2]],
  compute(t) {
    let s = 0;
    for (let u = t; u.length > 0; u = u[0]!) s++;
    return s;
  },
};

export const planeTreeRightBranch: Statistic<PlaneTree> = {
  id: 'plane-tree-right-branch',
  family: 'plane-trees',
  description: 'edges on the path from the root always to the last (rightmost) child',
  source: 'common practice (the final run of up steps of the depth-first walk)',
  examples: [[[], 0], [[[]], 1], [CHERRY, 1], [PATH2, 2], [T4, 1]],
  compute(t) {
    let s = 0;
    for (let u = t; u.length > 0; u = u[u.length - 1]!) s++;
    return s;
  },
};

export const planeTreeMaxDegree: Statistic<PlaneTree> = {
  id: 'plane-tree-max-degree',
  family: 'plane-trees',
  description: 'largest number of children of a node',
  source: 'common practice (maximum outdegree; Flajolet–Sedgewick, Analytic Combinatorics §III)',
  examples: [[[], 0], [[[]], 1], [CHERRY, 2], [PATH2, 1], [T4, 2]],
  compute: (t) => {
    let m = t.length;
    for (const c of t) m = Math.max(m, planeTreeMaxDegree.compute(c));
    return m;
  },
};
