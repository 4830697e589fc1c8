/**
 * Inversion sequences e_1 … e_n with 0 ≤ e_i ≤ i − 1 (n! of them), in lexicographic order.
 * Fast path: `visit` steps one buffer; shards by a prefix of entries.
 */
import { factorial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { nextMixedRadix, randomMixedRadix, visitMixedRadix } from './support/mixed-radix.js';
import { intParam, validateBySpec } from './support/params.js';
import type { InversionSequence } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'length n', min: 0, max: 20 }];
const validate = (params: Params): void => validateBySpec('inversion-sequences', PARAMS, params);
/** Entry i (0-based) ranges over 0..i. */
const radixOf = (n: number): number[] => Array.from({ length: n }, (_, i) => i + 1);

export const inversionSequences: Family<InversionSequence> = {
  id: 'inversion-sequences',
  description: 'inversion sequences e_1 … e_n with 0 ≤ e_i ≤ i − 1',
  source: 'standard (Stanley, EC1 §1.3; Savage–Schuster, J. Combin. Theory Ser. A 119 (2012))',
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
  render: (e) => (e.length === 0 ? '(empty)' : e.join(' ')),
  sample(params, random) {
    validate(params);
    return randomMixedRadix(radixOf(intParam(params, 'n')), random);
  },
  key: (e) => e.join(','),
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 5 }],
};
