/**
 * Statistics on noncrossing partitions of [n] (blocks increasing, sorted by their minima).
 * Blocks are counted by the Narayana numbers (Kreweras, Discrete Math. 1 (1972)); the others
 * are common practice. A block C is nested in B when min B < min C and max C < max B.
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { SetPartition } from '../objects/types.js';

const FAMILY = 'noncrossing-partitions';
const COMMON = 'common practice';
const nested = (c: readonly number[], b: readonly number[]): boolean => b[0]! < c[0]! && c[c.length - 1]! < b[b.length - 1]!;

export const ncBlocks: Statistic<SetPartition> = {
  id: 'nc-blocks',
  family: FAMILY,
  description: 'number of blocks',
  source: 'Kreweras, Discrete Math. 1 (1972) (Narayana numbers)',
  examples: [
    [[], 0],
    [[[1, 2, 3]], 1],
    [[[1, 4], [2, 3]], 2],
  ],
  compute: (p) => p.length,
};

export const ncSingletons: Statistic<SetPartition> = {
  id: 'nc-singletons',
  family: FAMILY,
  description: 'number of blocks of size one',
  source: COMMON,
  examples: [
    [[[1, 2, 3]], 0],
    [[[1, 3], [2]], 1],
    [[[1], [2], [3]], 3],
  ],
  compute: (p) => p.filter((b) => b.length === 1).length,
};

export const ncLargestBlock: Statistic<SetPartition> = {
  id: 'nc-largest-block',
  family: FAMILY,
  description: 'size of a largest block',
  source: COMMON,
  examples: [
    [[], 0],
    [[[1, 4], [2, 3]], 2],
    [[[1, 2, 4], [3]], 3],
  ],
  compute: (p) => p.reduce((m, b) => Math.max(m, b.length), 0),
};

export const ncBlockOfOne: Statistic<SetPartition> = {
  id: 'nc-block-of-first',
  family: FAMILY,
  description: 'size of the block containing 1',
  source: COMMON,
  examples: [
    [[], 0],
    [[[1, 4], [2, 3]], 2],
    [[[1], [2, 3]], 1],
  ],
  compute: (p) => p[0]?.length ?? 0,
};

export const ncBlockOfLast: Statistic<SetPartition> = {
  id: 'nc-block-of-last',
  family: FAMILY,
  description: 'size of the block containing n',
  source: COMMON,
  examples: [
    [[], 0],
    [[[1, 4], [2, 3]], 2],
    [[[1], [2, 3]], 2],
  ],
  compute(p) {
    const n = p.reduce((s, b) => s + b.length, 0);
    return p.find((b) => b[b.length - 1] === n)?.length ?? 0;
  },
};

export const ncBonds: Statistic<SetPartition> = {
  id: 'nc-bonds',
  family: FAMILY,
  description: 'number of i with i and i + 1 in the same block',
  source: COMMON,
  examples: [
    [[[1, 2, 3]], 2],
    [[[1, 4], [2, 3]], 1],
    [[[1, 3], [2]], 0],
  ],
  compute(p) {
    let s = 0;
    for (const b of p) for (let t = 1; t < b.length; t++) if (b[t] === b[t - 1]! + 1) s++;
    return s;
  },
};

export const ncOuterBlocks: Statistic<SetPartition> = {
  id: 'nc-outer-blocks',
  family: FAMILY,
  description: 'number of blocks nested in no other block',
  source: COMMON,
  examples: [
    [[[1, 4], [2, 3]], 1],
    [[[1], [2], [3]], 3],
    [[[1, 3], [2], [4]], 2],
  ],
  compute: (p) => p.filter((c) => !p.some((b) => nested(c, b))).length,
};

export const ncNestings: Statistic<SetPartition> = {
  id: 'nc-nestings',
  family: FAMILY,
  description: 'number of pairs of blocks (B, C) with C nested in B',
  source: COMMON,
  examples: [
    [[[1, 4], [2, 3]], 1],
    [[[1, 5], [2, 4], [3]], 3],
    [[[1], [2], [3]], 0],
  ],
  compute(p) {
    let s = 0;
    for (const b of p) for (const c of p) if (nested(c, b)) s++;
    return s;
  },
};

export const ncDoubletons: Statistic<SetPartition> = {
  id: 'nc-doubletons',
  family: FAMILY,
  description: 'number of blocks of size two',
  source: COMMON,
  examples: [
    [[[1, 4], [2, 3]], 2],
    [[[1, 2, 3]], 0],
    [[[1, 3], [2]], 1],
  ],
  compute: (p) => p.filter((b) => b.length === 2).length,
};

export const ncDepth: Statistic<SetPartition> = {
  id: 'nc-depth',
  family: FAMILY,
  description: 'largest number of blocks in a chain, each nested in the one before (0 when empty)',
  source: COMMON,
  examples: [
    [[], 0],
    [[[1], [2], [3]], 1],
    [[[1, 4], [2, 3]], 2],
    [[[1, 5], [2, 4], [3]], 3],
  ],
  // The blocks around a block of a noncrossing partition are nested in one another.
  compute: (p) => p.reduce((m, c) => Math.max(m, 1 + p.filter((b) => nested(c, b)).length), 0),
};
