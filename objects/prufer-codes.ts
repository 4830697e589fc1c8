/**
 * Prüfer codes of the trees on 0..n: all words of n − 1 letters from 0..n (one empty word for
 * n ≤ 1), in lexicographic order. Fast path: `visit` steps one buffer; shards by a prefix.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { nextMixedRadix, randomMixedRadix, visitMixedRadix } from './support/mixed-radix.js';
import { intParam, validateBySpec } from './support/params.js';
import type { PruferCode } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'the trees have vertices 0..n (codes of length n − 1)', min: 0, max: 16 }];
const validate = (params: Params): void => validateBySpec('prufer-codes', PARAMS, params);
const radixOf = (n: number): number[] => new Array<number>(Math.max(0, n - 1)).fill(n + 1);

export const pruferCodes: Family<PruferCode> = {
  id: 'prufer-codes',
  description: 'Prüfer codes of trees on 0..n: words of length n − 1 over the letters 0..n',
  source: 'Prüfer (1918); Stanley, EC2 §5.3 (from memory)',
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
    const n = intParam(params, 'n');
    return n === 0 ? 1n : BigInt(n + 1) ** BigInt(n - 1);
  },
  render: (c) => (c.length === 0 ? '(empty code)' : c.join(' ')),
  sample(params, random) {
    validate(params);
    return randomMixedRadix(radixOf(intParam(params, 'n')), random);
  },
  key: (c) => c.join(',') || '-',
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 4 }],
};
