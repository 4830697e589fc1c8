/**
 * Noncrossing partitions of [n] (no a < b < c < d with a, c in one block and b, d in
 * another), all or with k blocks: Catalan and Narayana numbers (Kreweras, "Sur les
 * partitions non croisées d'un cycle", Discrete Math. 1 (1972)). Streamed in the
 * lexicographic order of their Dyck paths (noncrossing-to-Dyck bijection, blocks ↔ peaks).
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { firstDyckPath, nextDyckPath, randomDyckPath } from './support/dyck.js';
import { narayana, randomDyckPathWithPeaks } from './support/dyck-peaks.js';
import { renderBlocks } from './support/growth-words.js';
import { dyckToNoncrossing } from './support/noncrossing.js';
import { catalan } from './support/numbers.js';
import { checkAtMost, emptyFamilyError, intParam, optIntParam, validateBySpec } from './support/params.js';
import type { SetPartition } from './types.js';

const ID = 'noncrossing-partitions';
const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'size n (elements 1..n)', min: 0, max: 16 },
  { name: 'k', kind: 'int', description: 'number of blocks k (0..n); any number when omitted', min: 0, max: 16, optional: true },
];
function validate(params: Params): void {
  validateBySpec(ID, PARAMS, params);
  checkAtMost(ID, 'k', optIntParam(params, 'k'), intParam(params, 'n'), 'n');
}

function peaks(path: readonly number[]): number {
  let s = 0;
  for (let i = 1; i < path.length; i++) if (path[i - 1] === 1 && path[i] === 0) s++;
  return s;
}

export const noncrossingPartitions: Family<SetPartition> = {
  id: ID,
  description: 'noncrossing partitions of [n] (blocks sorted by their minima), all or with k blocks',
  source: 'Kreweras, Discrete Math. 1 (1972); Simion, "Noncrossing partitions", Discrete Math. 217 (2000)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    const path = firstDyckPath(n);
    do if (k === undefined || peaks(path) === k) yield dyckToNoncrossing(path);
    while (nextDyckPath(path));
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    return k === undefined ? catalan(n) : narayana(n, k);
  },
  render: renderBlocks,
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    if (k !== undefined && narayana(n, k) === 0n) throw emptyFamilyError(ID, params);
    const path = k === undefined ? randomDyckPath(n, random) : randomDyckPathWithPeaks(n, k, random);
    return dyckToNoncrossing(path);
  },
  key: (p) => p.map((b) => b.join(',')).join('|'),
  testParams: [{ n: 0 }, { n: 1 }, { n: 4 }, { n: 6 }, { n: 5, k: 2 }, { n: 4, k: 4 }, { n: 3, k: 0 }, { n: 0, k: 0 }],
};
