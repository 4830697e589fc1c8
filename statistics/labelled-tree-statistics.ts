/**
 * Statistics on trees on 0..n rooted at 0 (parent arrays). Tree inversions are those of
 * Kreweras ("Une famille de polynômes ayant plusieurs propriétés énumeratives", Period. Math.
 * Hungar. 11 (1980)) and Mallows–Riordan ("The inversion enumerator for labeled trees",
 * Bull. Amer. Math. Soc. 74 (1968)): Σ_T q^{inv T} equals the area enumerator of parking functions.
 */
import { childrenOf, depthsOf } from '../objects/support/tree-drawing.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import type { LabelledTree } from '../objects/types.js';

// Examples: [2,0] is 0–2–1; [3,3,0] is 0–3 with 1, 2 below 3; [0,3,1] is the path 0–1–3–2.
const MR = 'Mallows–Riordan, Bull. Amer. Math. Soc. 74 (1968); Kreweras, Period. Math. Hungar. 11 (1980)';

export const treeInversions: Statistic<LabelledTree> = {
  id: 'tree-inversions',
  family: 'labelled-trees',
  description: 'pairs of vertices i > j ≥ 1 with i on the path from the root 0 to j',
  source: MR,
  examples: [[[], 0], [[0, 1], 0], [[2, 0], 1], [[3, 3, 0], 2], [[0, 3, 1], 1]],
  compute(p) {
    let s = 0;
    for (let j = 1; j <= p.length; j++) for (let a = p[j - 1]!; a !== 0; a = p[a - 1]!) if (a > j) s++;
    return s;
  },
};

export const treeLeaves: Statistic<LabelledTree> = {
  id: 'tree-leaves',
  family: 'labelled-trees',
  description: 'vertices of degree one in the (unrooted) tree, the vertex 0 included',
  source: 'Rényi, "Some remarks on the theory of trees" (1959): trees on [m] with k leaves number (m!/k!)·S(m−2, m−k) (from memory)',
  examples: [[[], 0], [[0], 2], [[0, 0], 2], [[3, 3, 0], 3], [[0, 3, 1], 2]],
  compute(p) {
    const deg = new Array<number>(p.length + 1).fill(0);
    p.forEach((q, i) => {
      deg[q]!++;
      deg[i + 1]!++;
    });
    return deg.filter((d) => d === 1).length;
  },
};

export const treeRootDegree: Statistic<LabelledTree> = {
  id: 'tree-root-degree',
  family: 'labelled-trees',
  description: 'number of neighbours of the root 0',
  source: 'common practice (the root appears deg − 1 times in the Prüfer code; Stanley, EC2 §5.3)',
  examples: [[[], 0], [[0], 1], [[0, 0], 2], [[3, 3, 0], 1], [[0, 3, 1], 1]],
  compute: (p) => p.reduce((s, q) => (q === 0 ? s + 1 : s), 0),
};

export const treeHeight: Statistic<LabelledTree> = {
  id: 'tree-height',
  family: 'labelled-trees',
  description: 'largest distance from the root 0 to a vertex',
  source: 'common practice (Rényi–Szekeres, height of random labelled trees, 1967)',
  examples: [[[], 0], [[0], 1], [[0, 0], 1], [[2, 0], 2], [[3, 3, 0], 2], [[0, 3, 1], 3]],
  compute: (p) => Math.max(...depthsOf(p)),
};

export const treePathLength: Statistic<LabelledTree> = {
  id: 'tree-path-length',
  family: 'labelled-trees',
  description: 'sum of the distances from the root 0 to all vertices',
  source: 'common practice (path length; Knuth, TAOCP vol. 1 §2.3.4.5)',
  examples: [[[], 0], [[0], 1], [[0, 0], 2], [[2, 0], 3], [[3, 3, 0], 5], [[0, 3, 1], 6]],
  compute: (p) => depthsOf(p).reduce((a, b) => a + b, 0),
};

export const treeDecreasingEdges: Statistic<LabelledTree> = {
  id: 'tree-decreasing-edges',
  family: 'labelled-trees',
  description: 'edges whose endpoint nearer the root carries the larger label (edges at the root never count)',
  source: 'common practice (descents of rooted labelled trees; Eğecioğlu–Remmel, J. Combin. Theory Ser. A 42 (1986), from memory)',
  examples: [[[], 0], [[0, 1], 0], [[2, 0], 1], [[3, 3, 0], 2], [[0, 3, 1], 1]],
  compute: (p) => p.reduce((s, q, i) => (q > i + 1 ? s + 1 : s), 0),
};

export const treeChildlessVertices: Statistic<LabelledTree> = {
  id: 'tree-childless-vertices',
  family: 'labelled-trees',
  description: 'vertices without children in the tree rooted at 0 (the root itself when n = 0)',
  source: 'common practice (leaves of the rooted tree)',
  examples: [[[], 1], [[0], 1], [[0, 0], 2], [[3, 3, 0], 2], [[0, 3, 1], 1]],
  compute: (p) => childrenOf(p).filter((c) => c.length === 0).length,
};

export const treeMaxDegree: Statistic<LabelledTree> = {
  id: 'tree-max-degree',
  family: 'labelled-trees',
  description: 'largest number of neighbours of a vertex (0 when n = 0)',
  source: 'common practice (maximum degree of random labelled trees; Moon, Counting Labelled Trees (1970))',
  examples: [[[], 0], [[0], 1], [[0, 0], 2], [[3, 3, 0], 3], [[0, 3, 1], 2]],
  compute(p) {
    const deg = new Array<number>(p.length + 1).fill(0);
    p.forEach((q, i) => {
      deg[q]!++;
      deg[i + 1]!++;
    });
    return Math.max(...deg);
  },
};
