/**
 * Trees on 0..n → parking functions of size n by breadth-first search: visit the tree from 0,
 * children in increasing order; a vertex whose parent is the j-th vertex visited (from 0)
 * is a car preferring spot j. Root degree becomes the number of cars preferring spot 0.
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import { parkingOfTree } from '../support/cayley-trees.js';
import type { LabelledDyckPath, LabelledTree } from '../types.js';

export const treeToParking: Transform<LabelledTree, LabelledDyckPath> = {
  id: 'tree-to-parking',
  from: 'labelled-trees',
  to: 'parking-functions',
  description: 'breadth-first search bijection: the children of the j-th vertex visited become the cars in column j',
  source: 'Foata–Riordan, "Mappings of acyclic and parking functions", Aequationes Math. 10 (1974); C. H. Yan, "Parking functions", Handbook of Enumerative Combinatorics (2015) §13.2 (from memory)',
  examples: [
    [[0, 0], { path: [1, 1, 0, 0], labels: [1, 2] }],
    [[3, 3, 0], { path: [1, 0, 1, 1, 0, 0], labels: [3, 1, 2] }],
    [[0, 3, 1], { path: [1, 0, 1, 0, 1, 0], labels: [1, 3, 2] }],
  ],
  apply: parkingOfTree,
};
