/**
 * Integer partitions of n, optionally with exactly k parts. All partitions come in
 * reverse lexicographic order (src/core/partitions.ts); with k, the conjugates of the
 * partitions whose largest part is k.
 */
import { conjugate, partitionCount, partitions as streamPartitions } from '../src/core/partitions.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { drawDiagram } from './support/diagram.js';
import { partitionsWithParts, randomPartitionAtMost, randomPartitionWithParts } from './support/partition-counts.js';
import { checkAtMost, emptyFamilyError, intParam, optIntParam, validateBySpec } from './support/params.js';
import type { PartitionObj } from './types.js';

const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'size n', min: 0, max: 200 },
  { name: 'k', kind: 'int', description: 'number of parts k (0..n); any number when omitted', min: 0, max: 200, optional: true },
];
function validate(params: Params): void {
  validateBySpec('partitions', PARAMS, params);
  checkAtMost('partitions', 'k', optIntParam(params, 'k'), intParam(params, 'n'), 'n');
}

export const partitions: Family<PartitionObj> = {
  id: 'partitions',
  description: 'integer partitions of n, optionally with exactly k parts',
  source: 'standard (Stanley, EC1 §1.7; Andrews, The Theory of Partitions)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    if (k === undefined) yield* streamPartitions(n);
    else if (k === 0) {
      if (n === 0) yield [];
    } else for (const rest of streamPartitions(n - k, k)) yield conjugate([k, ...rest]);
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    return k === undefined ? partitionCount(n) : partitionsWithParts(n, k);
  },
  render: (l) => `${l.join(',') || '∅'}\n${drawDiagram(l)}`,
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    if (k === undefined) return randomPartitionAtMost(n, n, random);
    if (partitionsWithParts(n, k) === 0n) throw emptyFamilyError('partitions', params);
    return randomPartitionWithParts(n, k, random);
  },
  key: (l) => l.join(','),
  shape: (l) => l,
  testParams: [{ n: 0 }, { n: 1 }, { n: 6 }, { n: 8, k: 3 }, { n: 5, k: 0 }, { n: 0, k: 0 }],
};
