/** The inverse of tree-to-parking: the cars in column j become the children of the j-th vertex in breadth-first order. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { treeOfParking } from '../support/cayley-trees.js';
import type { LabelledDyckPath, LabelledTree } from '../types.js';

export const parkingToTree: Transform<LabelledDyckPath, LabelledTree> = {
  id: 'parking-to-tree',
  from: 'parking-functions',
  to: 'labelled-trees',
  description: 'breadth-first search bijection: cars preferring spot j hang below the j-th vertex visited from 0',
  source: 'Foata–Riordan, Aequationes Math. 10 (1974); C. H. Yan, "Parking functions", Handbook of Enumerative Combinatorics (2015) §13.2 (from memory)',
  examples: [
    [{ path: [1, 1, 0, 0], labels: [1, 2] }, [0, 0]],
    [{ path: [1, 0, 1, 1, 0, 0], labels: [3, 1, 2] }, [3, 3, 0]],
    [{ path: [1, 0, 1, 0], labels: [2, 1] }, [2, 0]],
  ],
  apply: treeOfParking,
};
