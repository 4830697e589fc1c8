/**
 * Statistics on increasing (recursive) trees on 0..n rooted at 0 (parent arrays with
 * parent(i) < i). Through the bijection with permutations (objects/transforms) leaves go to
 * descents + 1 (Eulerian numbers) and root degree to left-to-right minima (Stirling numbers
 * of the first kind): Stanley, EC1 (2nd ed.) §1.5; Bergeron–Flajolet–Salvy, "Varieties of
 * increasing trees", CAAP '92, LNCS 581 (from memory).
 */
import { childrenOf, depthsOf } from '../objects/support/tree-drawing.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import type { IncreasingTree } from '../objects/types.js';

// Examples: [0,0] a root with two children; [0,1] a chain; [0,1,1] is 0–1 with 2, 3 below 1; [0,0,2] is 0–1, 0–2–3.
const EC1 = 'Stanley, EC1 (2nd ed.) §1.5 (increasing trees)';

export const increasingTreeLeaves: Statistic<IncreasingTree> = {
  id: 'increasing-tree-leaves',
  family: 'increasing-trees',
  description: 'vertices without children (the root itself when n = 0); Eulerian distributed',
  source: EC1,
  examples: [[[], 1], [[0], 1], [[0, 0], 2], [[0, 1], 1], [[0, 1, 1], 2], [[0, 0, 2], 2]],
  compute: (p) => childrenOf(p).filter((c) => c.length === 0).length,
};

export const increasingTreeRootDegree: Statistic<IncreasingTree> = {
  id: 'increasing-tree-root-degree',
  family: 'increasing-trees',
  description: 'number of children of the root 0 (Stirling numbers of the first kind)',
  source: EC1,
  examples: [[[], 0], [[0], 1], [[0, 0], 2], [[0, 1], 1], [[0, 1, 1], 1], [[0, 0, 2], 2]],
  compute: (p) => p.reduce((s, q) => (q === 0 ? s + 1 : s), 0),
};

export const increasingTreeHeight: Statistic<IncreasingTree> = {
  id: 'increasing-tree-height',
  family: 'increasing-trees',
  description: 'largest depth of a vertex (edges from the root 0)',
  source: 'Devroye, "Branching processes in the analysis of the heights of trees", Acta Inform. 24 (1987) (from memory); common practice',
  examples: [[[], 0], [[0], 1], [[0, 0], 1], [[0, 1], 2], [[0, 1, 1], 2], [[0, 1, 2], 3]],
  compute(p) {
    // parent(i) < i, so depths fill in increasing order of the labels.
    let h = 0;
    const d = [0];
    p.forEach((q, i) => {
      d[i + 1] = d[q]! + 1;
      h = Math.max(h, d[i + 1]!);
    });
    return h;
  },
};

export const increasingTreeDepthOfLast: Statistic<IncreasingTree> = {
  id: 'increasing-tree-depth-of-last',
  family: 'increasing-trees',
  description: 'depth of the largest vertex n (0 when n = 0)',
  source: 'Moon, "The distance between nodes in recursive trees" (1974) (from memory); common practice',
  examples: [[[], 0], [[0], 1], [[0, 0], 1], [[0, 1], 2], [[0, 1, 1], 2], [[0, 0, 0], 1]],
  compute: (p) => depthsOf(p)[p.length]!,
};

export const increasingTreePathLength: Statistic<IncreasingTree> = {
  id: 'increasing-tree-path-length',
  family: 'increasing-trees',
  description: 'sum of the depths of all vertices',
  source: 'common practice (total path length of recursive trees; Mahmoud, Evolution of Random Search Trees, 1992)',
  examples: [[[], 0], [[0], 1], [[0, 0], 2], [[0, 1], 3], [[0, 1, 1], 5], [[0, 0, 2], 4]],
  compute: (p) => depthsOf(p).reduce((a, b) => a + b, 0),
};

export const increasingTreeChildrenOfOne: Statistic<IncreasingTree> = {
  id: 'increasing-tree-children-of-one',
  family: 'increasing-trees',
  description: 'number of children of the vertex 1 (0 when n = 0)',
  source: 'common practice (degree of a given vertex in a recursive tree)',
  examples: [[[], 0], [[0], 0], [[0, 1], 1], [[0, 1, 1], 2], [[0, 0, 2], 0]],
  compute: (p) => p.reduce((s, q) => (q === 1 ? s + 1 : s), 0),
};

export const increasingTreeMaxDegree: Statistic<IncreasingTree> = {
  id: 'increasing-tree-max-degree',
  family: 'increasing-trees',
  description: 'largest number of children of a vertex',
  source: 'common practice (maximum degree of recursive trees; Goh–Schmutz, Random Struct. Algorithms 20 (2002), from memory)',
  examples: [[[], 0], [[0], 1], [[0, 0], 2], [[0, 1], 1], [[0, 1, 1], 2], [[0, 0, 0], 3]],
  compute: (p) => Math.max(0, ...childrenOf(p).map((c) => c.length)),
};
