/**
 * Trees on the vertices 0..n (Cayley trees on n + 1 labelled vertices), rooted at 0 and coded
 * by parent arrays, streamed in the lexicographic order of their Prüfer codes. (n+1)^(n−1) of
 * them: 4 782 969 at n = 8. Rooting at 0 makes them the trees of the Kreweras and
 * Mallows–Riordan inversion enumerator, matched with parking functions of size n.
 * Fast path: `visit` decodes into one reused parent array; shards by a prefix of the code.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { decodePrufer } from './support/cayley-trees.js';
import { nextMixedRadix, randomMixedRadix, visitMixedRadix } from './support/mixed-radix.js';
import { intParam, validateBySpec } from './support/params.js';
import { drawParentTree } from './support/tree-drawing.js';
import type { LabelledTree } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'number of non-root vertices n (vertices 0..n)', min: 0, max: 16 }];
const validate = (params: Params): void => validateBySpec('labelled-trees', PARAMS, params);
/** Prüfer codes of trees on 0..n: n − 1 letters from 0..n. */
const radixOf = (n: number): number[] => new Array<number>(Math.max(0, n - 1)).fill(n + 1);

export const labelledTrees: Family<LabelledTree> = {
  id: 'labelled-trees',
  description: 'trees on the vertices 0..n (Cayley trees), rooted at 0, as parent arrays parent(1) … parent(n)',
  source: 'standard (Cayley 1889; Stanley, EC2 §5.3 and §5.6 (Prüfer codes)); (n+1)^(n−1) trees',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    const radix = radixOf(n);
    const code = new Array<number>(radix.length).fill(0);
    do yield decodePrufer(code, n, new Array<number>(n));
    while (nextMixedRadix(code, radix));
  },
  visit(params, f, shard) {
    validate(params);
    const n = intParam(params, 'n');
    const parent = new Array<number>(n);
    const scratch = new Int32Array(2 * n + 2);
    visitMixedRadix(radixOf(n), (code) => f(decodePrufer(code, n, parent, scratch)), shard);
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    return n === 0 ? 1n : BigInt(n + 1) ** BigInt(n - 1);
  },
  render: drawParentTree,
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    return decodePrufer(randomMixedRadix(radixOf(n), random), n, new Array<number>(n));
  },
  key: (p) => p.join(','),
  testParams: [{ n: 0 }, { n: 1 }, { n: 2 }, { n: 4 }],
};
