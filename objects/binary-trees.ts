/**
 * Binary trees with n nodes (each node has an optional left and an optional right child),
 * streamed through their Dyck-path coding 1 B(L) 0 B(R) in the lexicographic order of the paths.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { binaryTreeOfDyck } from './support/catalan-trees.js';
import { firstDyckPath, nextDyckPath, randomDyckPath } from './support/dyck.js';
import { catalan } from './support/numbers.js';
import { intParam, validateBySpec } from './support/params.js';
import { drawRooted } from './support/tree-drawing.js';
import type { BinaryTree } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'number of nodes n', min: 0, max: 30 }];
const validate = (params: Params): void => validateBySpec('binary-trees', PARAMS, params);

/** Preorder word: 1 for a node, 0 for an empty subtree (2n+1 letters). */
export function binaryTreeKey(t: BinaryTree): string {
  return t === null ? '0' : `1${binaryTreeKey(t[0])}${binaryTreeKey(t[1])}`;
}

function draw(t: BinaryTree): string {
  if (t === null) return '(empty tree)';
  // Number the nodes so the generic drawing can walk them; children are marked L or R.
  const nodes: (readonly [BinaryTree, BinaryTree])[] = [];
  const side: string[] = [];
  const kids: number[][] = [];
  const add = (u: readonly [BinaryTree, BinaryTree], s: string): number => {
    const id = nodes.length;
    nodes.push(u);
    side.push(s);
    kids.push([]);
    if (u[0] !== null) kids[id]!.push(add(u[0], 'L'));
    if (u[1] !== null) kids[id]!.push(add(u[1], 'R'));
    return id;
  };
  add(t, 'o');
  return drawRooted(0, (v) => kids[v]!, (v) => side[v]!);
}

export const binaryTrees: Family<BinaryTree> = {
  id: 'binary-trees',
  description: 'binary trees with n nodes (left and right children distinguished), as nested [left, right] pairs',
  source: 'standard (Stanley, EC2 §6.19 and Catalan Numbers (2015), item on binary trees); counted by Catalan numbers',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const a = firstDyckPath(intParam(params, 'n'));
    do yield binaryTreeOfDyck(a);
    while (nextDyckPath(a));
  },
  count(params) {
    validate(params);
    return catalan(intParam(params, 'n'));
  },
  render: draw,
  sample(params, random) {
    validate(params);
    return binaryTreeOfDyck(randomDyckPath(intParam(params, 'n'), random));
  },
  key: binaryTreeKey,
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 5 }],
};
