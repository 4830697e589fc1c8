/**
 * Permutations of [n] in one-line notation, in lexicographic order.
 * Fast path: `visit` steps one buffer with nextPermutationFrom (no allocation per object);
 * shards split by the first three letters (visitRearrangements).
 */
import { factorial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { visitRearrangements } from './support/multiset-visit.js';
import { nextPermutationFrom } from './support/next-permutation.js';
import { intParam, validateBySpec } from './support/params.js';
import { shuffleInPlace } from './support/random.js';
import type { Permutation } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'size n', min: 0, max: 20 }];
const validate = (params: Params): void => validateBySpec('permutations', PARAMS, params);

export const permutations: Family<Permutation> = {
  id: 'permutations',
  description: 'permutations of [n] in one-line notation',
  source: 'standard (Stanley, EC1 §1.3)',
  params: PARAMS,
  validate,
  *generate(params: Params) {
    validate(params);
    const a = Array.from({ length: intParam(params, 'n') }, (_, i) => i + 1);
    do yield a.slice();
    while (nextPermutationFrom(a, 0));
  },
  visit(params, f, shard) {
    validate(params);
    visitRearrangements(Array.from({ length: intParam(params, 'n') }, (_, i) => i + 1), f, shard);
  },
  count(params) {
    validate(params);
    return factorial(intParam(params, 'n'));
  },
  render: (w) => (w.length === 0 ? '(empty)' : w.join(' ')),
  sample: (params, random) => (validate(params), shuffleInPlace(Array.from({ length: intParam(params, 'n') }, (_, i) => i + 1), random)),
  key: (w) => w.join(','),
  readingWord: (w) => w,
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 5 }],
};

/** Re-exported: the in-place lexicographic step used by several families. */
export { nextPermutationFrom };
