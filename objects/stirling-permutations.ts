/**
 * Stirling permutations of order n (Gessel–Stanley, "Stirling polynomials", J. Combin. Theory
 * Ser. A 24 (1978)): words with two copies of each of 1..n in which every letter between the
 * two copies of i exceeds i. Built by inserting 1 1, 2 2, … into gaps (insertion codes in
 * lexicographic order); (2n−1)!! of them: 2 027 025 at n = 8.
 * Fast path: `visit` rebuilds one buffer from a stepped code; shards by a prefix of the code.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { nextMixedRadix, randomMixedRadix, visitMixedRadix } from './support/mixed-radix.js';
import { doubleFactorialOdd } from './support/odd-double-factorial.js';
import { intParam, validateBySpec } from './support/params.js';
import { insertionRadix, stirlingOfCode } from './support/stirling.js';
import type { StirlingPermutation } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'order n (each of 1..n twice)', min: 0, max: 16 }];
const validate = (params: Params): void => validateBySpec('stirling-permutations', PARAMS, params);

export const stirlingPermutations: Family<StirlingPermutation> = {
  id: 'stirling-permutations',
  description: 'Stirling permutations: 1,1,2,2,…,n,n arranged so that every letter between the two copies of i is larger than i',
  source: 'Gessel–Stanley, "Stirling polynomials", J. Combin. Theory Ser. A 24 (1978); (2n−1)!! of them',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const radix = insertionRadix(intParam(params, 'n'));
    const code = new Array<number>(radix.length).fill(0);
    do yield stirlingOfCode(code);
    while (nextMixedRadix(code, radix));
  },
  visit(params, f, shard) {
    validate(params);
    const out: number[] = [];
    visitMixedRadix(insertionRadix(intParam(params, 'n')), (code) => f(stirlingOfCode(code, out)), shard);
  },
  count(params) {
    validate(params);
    return doubleFactorialOdd(intParam(params, 'n'));
  },
  render: (w) => (w.length === 0 ? '(empty)' : w.join(' ')),
  sample(params, random) {
    validate(params);
    return stirlingOfCode(randomMixedRadix(insertionRadix(intParam(params, 'n')), random));
  },
  key: (w) => w.join(','),
  testParams: [{ n: 0 }, { n: 1 }, { n: 2 }, { n: 4 }],
};
