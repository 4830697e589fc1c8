/** The inverse of Janson's bijection: walk the increasing plane tree depth first, writing each child's label down and up. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { stirlingOfPlaneTree } from '../support/stirling.js';
import type { IncreasingPlaneTree, StirlingPermutation } from '../types.js';

export const planeTreeToStirling: Transform<IncreasingPlaneTree, StirlingPermutation> = {
  id: 'plane-tree-to-stirling',
  from: 'increasing-plane-trees',
  to: 'stirling-permutations',
  description: 'the depth-first walk of the tree, children left to right, each label written on the way down and on the way up',
  source: 'Janson, "Plane recursive trees, Stirling permutations and an urn model", DMTCS Proc. AI (2008)',
  examples: [
    [[[1], []], [1, 1]],
    [[[1], [2], []], [1, 2, 2, 1]],
    [[[1, 3], [2], [], []], [1, 2, 2, 1, 3, 3]],
  ],
  apply: stirlingOfPlaneTree,
};
