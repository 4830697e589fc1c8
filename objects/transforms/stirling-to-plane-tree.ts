/**
 * Janson's bijection, Stirling permutations → increasing plane trees: read the word left to
 * right; a first occurrence of i hangs i as the next child of the current vertex and moves down
 * to it, the second occurrence moves back up. Plateaux become leaves.
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import { planeTreeOfStirling } from '../support/stirling.js';
import type { IncreasingPlaneTree, StirlingPermutation } from '../types.js';

export const stirlingToPlaneTree: Transform<StirlingPermutation, IncreasingPlaneTree> = {
  id: 'stirling-to-plane-tree',
  from: 'stirling-permutations',
  to: 'increasing-plane-trees',
  description: 'the increasing plane tree whose depth-first walk, writing each child on the way down and up, is the word',
  source: 'Janson, "Plane recursive trees, Stirling permutations and an urn model", DMTCS Proc. AI (2008); Gessel (see there)',
  examples: [
    [[1, 1], [[1], []]],
    [[1, 1, 2, 2], [[1, 2], [], []]],
    [[2, 2, 1, 1], [[2, 1], [], []]],
    [[1, 2, 2, 1, 3, 3], [[1, 3], [2], [], []]],
  ],
  apply: planeTreeOfStirling,
};
