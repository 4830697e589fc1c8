/** Block-size statistics on ordered multiset partitions B_1|…|B_k (common practice). */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { OrderedMultisetPartition } from '../objects/types.js';

const FAMILY = 'ordered-multiset-partitions';

export const ompSingletonBlocks: Statistic<OrderedMultisetPartition> = {
  id: 'omp-singleton-blocks',
  family: FAMILY,
  description: 'number of blocks with one letter',
  source: 'common practice',
  examples: [
    [[[1, 2], [1]], 1],
    [[[1, 3], [2], [1]], 2],
    [[[1, 2], [1, 2]], 0],
  ],
  compute: (p) => p.filter((b) => b.length === 1).length,
};

export const ompFirstBlockSize: Statistic<OrderedMultisetPartition> = {
  id: 'omp-first-block-size',
  family: FAMILY,
  description: 'number of letters in the first block',
  source: 'common practice',
  examples: [
    [[], 0],
    [[[1, 2], [1]], 2],
    [[[2], [1, 2], [1]], 1],
  ],
  compute: (p) => p[0]?.length ?? 0,
};

export const ompLastBlockSize: Statistic<OrderedMultisetPartition> = {
  id: 'omp-last-block-size',
  family: FAMILY,
  description: 'number of letters in the last block',
  source: 'common practice',
  examples: [
    [[], 0],
    [[[1, 2], [1]], 1],
    [[[1], [1, 2, 3]], 3],
  ],
  compute: (p) => p[p.length - 1]?.length ?? 0,
};

export const ompLargestBlock: Statistic<OrderedMultisetPartition> = {
  id: 'omp-largest-block',
  family: FAMILY,
  description: 'size of a largest block',
  source: 'common practice',
  examples: [
    [[], 0],
    [[[1], [1, 2, 3]], 3],
    [[[1, 3], [2], [1]], 2],
  ],
  compute: (p) => p.reduce((m, b) => Math.max(m, b.length), 0),
};

export const ompMinimaDescents: Statistic<OrderedMultisetPartition> = {
  id: 'omp-minima-descents',
  family: FAMILY,
  description: 'number of j with min B_j > min B_{j+1} (strict descents of the word of block minima)',
  source: 'common practice',
  examples: [
    [[[1, 2], [1]], 0],
    [[[2], [1, 2], [1]], 1],
    [[[3], [2], [1, 2]], 2],
  ],
  compute(p) {
    let s = 0;
    for (let j = 0; j + 1 < p.length; j++) if (p[j]![0]! > p[j + 1]![0]!) s++;
    return s;
  },
};

export const ompMaximaDescents: Statistic<OrderedMultisetPartition> = {
  id: 'omp-maxima-descents',
  family: FAMILY,
  description: 'number of j with max B_j > max B_{j+1} (strict descents of the word of block maxima)',
  source: 'common practice',
  examples: [
    [[[1, 2], [1]], 1],
    [[[2], [1, 2], [1]], 1],
    [[[1], [1, 2, 3]], 0],
  ],
  compute(p) {
    let s = 0;
    for (let j = 0; j + 1 < p.length; j++) if (p[j]![p[j]!.length - 1]! > p[j + 1]![p[j + 1]!.length - 1]!) s++;
    return s;
  },
};
