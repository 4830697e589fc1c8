/**
 * Statistics on increasing plane trees on 0..n (children lists). Leaves correspond to the
 * plateaux of the Stirling permutation (Janson, DMTCS Proc. AI (2008)); root degree, depth of
 * the last vertex and path length are those studied for plane-oriented recursive trees
 * (Mahmoud–Smythe–Szymański, "On the structure of random plane-oriented recursive trees and
 * their branches", Random Struct. Algorithms 4 (1993), from memory).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { IncreasingPlaneTree } from '../objects/types.js';

// Examples: [[1],[]] one edge; [[1,2],[],[]] a root with children 1, 2; [[1],[2],[]] a chain; [[1,3],[2],[],[]] ↔ 1 2 2 1 3 3.
const MSS = 'Mahmoud–Smythe–Szymański, Random Struct. Algorithms 4 (1993) (from memory)';

function depths(t: IncreasingPlaneTree): number[] {
  // Children carry larger labels, so one pass in label order suffices.
  const d = new Array<number>(t.length).fill(0);
  t.forEach((cs, v) => cs.forEach((c) => (d[c] = d[v]! + 1)));
  return d;
}

export const increasingPlaneTreeLeaves: Statistic<IncreasingPlaneTree> = {
  id: 'increasing-plane-tree-leaves',
  family: 'increasing-plane-trees',
  description: 'vertices without children (the root itself when n = 0)',
  source: 'Janson, DMTCS Proc. AI (2008) (leaves ↔ plateaux of Stirling permutations)',
  examples: [[[[]], 1], [[[1], []], 1], [[[1, 2], [], []], 2], [[[1], [2], []], 1], [[[1, 3], [2], [], []], 2]],
  compute: (t) => t.filter((c) => c.length === 0).length,
};

export const increasingPlaneTreeRootDegree: Statistic<IncreasingPlaneTree> = {
  id: 'increasing-plane-tree-root-degree',
  family: 'increasing-plane-trees',
  description: 'number of children of the root 0',
  source: MSS,
  examples: [[[[]], 0], [[[1], []], 1], [[[1, 2], [], []], 2], [[[1], [2], []], 1], [[[1, 3], [2], [], []], 2]],
  compute: (t) => t[0]!.length,
};

export const increasingPlaneTreeHeight: Statistic<IncreasingPlaneTree> = {
  id: 'increasing-plane-tree-height',
  family: 'increasing-plane-trees',
  description: 'largest depth of a vertex (edges from the root)',
  source: 'Pittel, "Note on the heights of random recursive trees and random m-ary search trees", Random Struct. Algorithms 5 (1994) (from memory)',
  examples: [[[[]], 0], [[[1], []], 1], [[[1, 2], [], []], 1], [[[1], [2], []], 2], [[[1, 3], [2], [], []], 2]],
  compute: (t) => Math.max(...depths(t)),
};

export const increasingPlaneTreeDepthOfLast: Statistic<IncreasingPlaneTree> = {
  id: 'increasing-plane-tree-depth-of-last',
  family: 'increasing-plane-trees',
  description: 'depth of the largest vertex n (0 when n = 0)',
  source: MSS,
  examples: [[[[]], 0], [[[1], []], 1], [[[1, 2], [], []], 1], [[[1], [2], []], 2], [[[1, 3], [2], [], []], 1]],
  compute: (t) => depths(t)[t.length - 1]!,
};

export const increasingPlaneTreePathLength: Statistic<IncreasingPlaneTree> = {
  id: 'increasing-plane-tree-path-length',
  family: 'increasing-plane-trees',
  description: 'sum of the depths of all vertices',
  source: MSS,
  examples: [[[[]], 0], [[[1], []], 1], [[[1, 2], [], []], 2], [[[1], [2], []], 3], [[[1, 3], [2], [], []], 4]],
  compute: (t) => depths(t).reduce((a, b) => a + b, 0),
};

export const increasingPlaneTreeMaxDegree: Statistic<IncreasingPlaneTree> = {
  id: 'increasing-plane-tree-max-degree',
  family: 'increasing-plane-trees',
  description: 'largest number of children of a vertex',
  source: MSS,
  examples: [[[[]], 0], [[[1], []], 1], [[[1, 2], [], []], 2], [[[1], [2], []], 1], [[[1, 3], [2], [], []], 2]],
  compute: (t) => Math.max(...t.map((c) => c.length)),
};
