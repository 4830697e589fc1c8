/**
 * Set partitions of [n], all or with exactly k blocks, as restricted growth words
 * (a[i] = block of i+1, blocks numbered by their minima) in lexicographic order.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { firstGrowthWord, growthWordToBlocks, nextGrowthWord, renderBlocks } from './support/growth-words.js';
import { bell, stirling2 } from './support/numbers.js';
import { checkAtMost, emptyFamilyError, intParam, optIntParam, validateBySpec } from './support/params.js';
import { randomSetPartition } from './support/random-set-partition.js';
import { weightedIndex } from './support/random.js';
import type { SetPartition } from './types.js';

const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'size n (elements 1..n)', min: 0, max: 30 },
  { name: 'k', kind: 'int', description: 'number of blocks k (0..n); any number when omitted', min: 0, max: 30, optional: true },
];
function validate(params: Params): void {
  validateBySpec('set-partitions', PARAMS, params);
  checkAtMost('set-partitions', 'k', optIntParam(params, 'k'), intParam(params, 'n'), 'n');
}

export const setPartitions: Family<SetPartition> = {
  id: 'set-partitions',
  description: 'set partitions of [n] (blocks sorted by their minima), all or with exactly k blocks',
  source: 'standard (Stanley, EC1 §1.9); counted by Bell numbers and S(n,k)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    if (k !== undefined && stirling2(n, k) === 0n) return;
    const a = firstGrowthWord(n, k);
    do yield growthWordToBlocks(a);
    while (nextGrowthWord(a, k));
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    return k === undefined ? bell(n) : stirling2(n, k);
  },
  render: renderBlocks,
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    let k = optIntParam(params, 'k');
    if (k === undefined) k = weightedIndex(random, Array.from({ length: n + 1 }, (_, j) => stirling2(n, j)));
    if (stirling2(n, k) === 0n) throw emptyFamilyError('set-partitions', params);
    return randomSetPartition(n, k, random);
  },
  key: (p) => p.map((b) => b.join(',')).join('|'),
  testParams: [{ n: 0 }, { n: 1 }, { n: 4 }, { n: 6 }, { n: 5, k: 2 }, { n: 4, k: 4 }, { n: 3, k: 0 }, { n: 0, k: 0 }],
};
