/** The inverse of plane-tree-to-dyck: the plane tree whose depth-first walk is the path. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { planeTreeOfDyck } from '../support/catalan-trees.js';
import type { DyckPath, PlaneTree } from '../types.js';

export const dyckToPlaneTree: Transform<DyckPath, PlaneTree> = {
  id: 'dyck-to-plane-tree',
  from: 'dyck-paths',
  to: 'plane-trees',
  description: 'the plane tree whose depth-first walk is the Dyck path (returns become the children of the root)',
  source: 'Stanley, EC2 §6.19 (plane trees and Dyck paths); Deutsch, Discrete Math. 204 (1999)',
  examples: [
    [[1, 0], [[]]],
    [[1, 1, 0, 0], [[[]]]],
    [[1, 1, 0, 1, 0, 0, 1, 0], [[[], []], []]],
  ],
  apply: planeTreeOfDyck,
};
