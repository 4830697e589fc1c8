/**
 * Plane (ordered) trees with n edges, as nested lists of subtrees, streamed through their
 * depth-first walks (Dyck paths, 1 down an edge, 0 back up) in lexicographic order.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { dyckOfPlaneTree, planeTreeOfDyck } from './support/catalan-trees.js';
import { firstDyckPath, nextDyckPath, randomDyckPath } from './support/dyck.js';
import { catalan } from './support/numbers.js';
import { intParam, validateBySpec } from './support/params.js';
import { drawRooted } from './support/tree-drawing.js';
import type { PlaneTree } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'number of edges n (n + 1 nodes)', min: 0, max: 30 }];
const validate = (params: Params): void => validateBySpec('plane-trees', PARAMS, params);

function draw(t: PlaneTree): string {
  const nodes: PlaneTree[] = [];
  const kids: number[][] = [];
  const add = (u: PlaneTree): number => {
    const id = nodes.length;
    nodes.push(u);
    kids.push([]);
    for (const c of u) kids[id]!.push(add(c));
    return id;
  };
  add(t);
  return drawRooted(0, (v) => kids[v]!, () => 'o');
}

export const planeTrees: Family<PlaneTree> = {
  id: 'plane-trees',
  description: 'plane (ordered) trees with n edges: a root and an ordered list of subtrees',
  source: 'standard (Stanley, EC2 §6.19; Flajolet–Sedgewick, Analytic Combinatorics §I.5); counted by Catalan numbers',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const a = firstDyckPath(intParam(params, 'n'));
    do yield planeTreeOfDyck(a);
    while (nextDyckPath(a));
  },
  count(params) {
    validate(params);
    return catalan(intParam(params, 'n'));
  },
  render: draw,
  sample(params, random) {
    validate(params);
    return planeTreeOfDyck(randomDyckPath(intParam(params, 'n'), random));
  },
  key: (t) => dyckOfPlaneTree(t).map((s) => (s === 1 ? '(' : ')')).join('') || '.',
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 5 }],
};
