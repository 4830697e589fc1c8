/** A plane tree ↦ its depth-first walk as a Dyck path (1 down an edge, 0 back up). */
import type { Transform } from '../../src/enumerate/plugin.js';
import { dyckOfPlaneTree } from '../support/catalan-trees.js';
import type { DyckPath, PlaneTree } from '../types.js';

export const planeTreeToDyck: Transform<PlaneTree, DyckPath> = {
  id: 'plane-tree-to-dyck',
  from: 'plane-trees',
  to: 'dyck-paths',
  description: 'the depth-first walk of a plane tree: a north step down each edge, an east step back up',
  source: 'Stanley, EC2 §6.19 (plane trees and Dyck paths); Deutsch, Discrete Math. 204 (1999)',
  examples: [
    [[[]], [1, 0]],
    [[[], []], [1, 0, 1, 0]],
    [[[[], []], []], [1, 1, 0, 1, 0, 0, 1, 0]],
  ],
  apply: dyckOfPlaneTree,
};
