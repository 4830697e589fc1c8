/**
 * Increasing (recursive) trees on the vertices 0..n rooted at 0: every vertex i ≥ 1 has a
 * parent smaller than i, children unordered. n! trees, coded by their parent arrays and
 * streamed in lexicographic order of those.
 * Fast path: `visit` steps one parent array; shards by a prefix of parents.
 */
import { factorial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { nextMixedRadix, randomMixedRadix, visitMixedRadix } from './support/mixed-radix.js';
import { intParam, validateBySpec } from './support/params.js';
import { drawParentTree } from './support/tree-drawing.js';
import type { IncreasingTree } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'number of non-root vertices n (vertices 0..n)', min: 0, max: 20 }];
const validate = (params: Params): void => validateBySpec('increasing-trees', PARAMS, params);
/** Vertex i+1 chooses its parent among 0..i. */
const radixOf = (n: number): number[] => Array.from({ length: n }, (_, i) => i + 1);

export const increasingTrees: Family<IncreasingTree> = {
  id: 'increasing-trees',
  description: 'increasing (recursive) trees on 0..n rooted at 0, labels increasing away from the root, children unordered',
  source: 'standard (Stanley, EC1 (2nd ed.) §1.5; Flajolet–Sedgewick, Analytic Combinatorics §II.6)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const radix = radixOf(intParam(params, 'n'));
    const a = new Array<number>(radix.length).fill(0);
    do yield a.slice();
    while (nextMixedRadix(a, radix));
  },
  visit(params, f, shard) {
    validate(params);
    visitMixedRadix(radixOf(intParam(params, 'n')), f, shard);
  },
  count(params) {
    validate(params);
    return factorial(intParam(params, 'n'));
  },
  render: drawParentTree,
  sample(params, random) {
    validate(params);
    return randomMixedRadix(radixOf(intParam(params, 'n')), random);
  },
  key: (p) => p.join(','),
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 5 }],
};
