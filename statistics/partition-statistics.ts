/** Statistics on integer partitions λ (weakly decreasing parts). */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { PartitionObj } from '../objects/types.js';

export const nLambda: Statistic<PartitionObj> = {
  id: 'n-lambda',
  family: 'partitions',
  description: 'n(λ) = Σ (i−1) λ_i',
  source: 'Macdonald, Symmetric Functions and Hall Polynomials I.1',
  examples: [
    [[], 0],
    [[3], 0],
    [[2, 1], 1],
    [[1, 1, 1], 3],
    [[3, 2, 2], 6],
  ],
  compute(l) {
    let s = 0;
    for (let i = 1; i < l.length; i++) s += i * l[i]!;
    return s;
  },
};

export const partitionParts: Statistic<PartitionObj> = {
  id: 'partition-parts',
  family: 'partitions',
  description: 'number of parts ℓ(λ)',
  source: 'standard (Andrews, The Theory of Partitions, ch. 1)',
  examples: [
    [[], 0],
    [[4], 1],
    [[2, 1, 1], 3],
  ],
  compute: (l) => l.length,
};

export const largestPart: Statistic<PartitionObj> = {
  id: 'largest-part',
  family: 'partitions',
  description: 'largest part λ_1 (equidistributed with the number of parts, by conjugation)',
  source: 'standard (Andrews, The Theory of Partitions, ch. 1)',
  examples: [
    [[], 0],
    [[4], 4],
    [[2, 1, 1], 2],
  ],
  compute: (l) => l[0] ?? 0,
};

export const durfeeSquare: Statistic<PartitionObj> = {
  id: 'durfee-square',
  family: 'partitions',
  description: 'side of the Durfee square: the largest d with λ_d ≥ d',
  source: 'standard (Andrews, The Theory of Partitions, ch. 2)',
  examples: [
    [[], 0],
    [[5], 1],
    [[3, 2, 2], 2],
    [[3, 3, 3, 1], 3],
  ],
  compute(l) {
    let d = 0;
    while (d < l.length && l[d]! >= d + 1) d++;
    return d;
  },
};

export const distinctParts: Statistic<PartitionObj> = {
  id: 'distinct-parts',
  family: 'partitions',
  description: 'number of distinct part sizes',
  source: 'common practice',
  examples: [
    [[], 0],
    [[2, 2, 1], 2],
    [[3, 2, 1], 3],
    [[1, 1, 1], 1],
  ],
  compute(l) {
    let s = 0;
    for (let i = 0; i < l.length; i++) if (i === 0 || l[i] !== l[i - 1]) s++;
    return s;
  },
};
