/** Mirror image of a plane tree: the order of the children reversed at every node. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { PlaneTree } from '../types.js';

export function mirrorPlane(t: PlaneTree): PlaneTree {
  return t.map(mirrorPlane).reverse();
}

export const planeTreeMirror: Transform<PlaneTree, PlaneTree> = {
  id: 'plane-tree-mirror',
  from: 'plane-trees',
  to: 'plane-trees',
  description: 'the mirror image: children listed right to left at every node (reverses the depth-first walk)',
  source: 'common practice',
  examples: [
    [[[]], [[]]],
    [[[[], []], []], [[], [[], []]]],
    [[[[]], []], [[], [[]]]],
  ],
  apply: mirrorPlane,
  involution: true,
};
