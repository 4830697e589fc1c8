/** Statistics on 0/1 words (subsets of [n] as indicator words). */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { BinaryWord } from '../objects/types.js';

export const ones: Statistic<BinaryWord> = {
  id: 'ones',
  family: 'subsets',
  description: 'number of 1s (the size of the subset)',
  source: 'common practice (binomial coefficients)',
  examples: [
    [[], 0],
    [[0, 0], 0],
    [[1, 0, 1], 2],
  ],
  compute(w) {
    let s = 0;
    for (const x of w) s += x;
    return s;
  },
};

export const binaryInversions: Statistic<BinaryWord> = {
  id: 'binary-inversions',
  family: 'subsets',
  description: 'pairs i < j with w(i) = 1 and w(j) = 0 (q-binomial for a fixed number of 1s)',
  source: 'standard (Stanley, EC1 §1.7, case of two letters)',
  examples: [
    [[0, 1], 0],
    [[1, 0], 1],
    [[1, 0, 1, 0], 3],
    [[1, 1, 0, 0], 4],
  ],
  compute(w) {
    let s = 0;
    let seenOnes = 0;
    for (const x of w) {
      if (x === 1) seenOnes++;
      else s += seenOnes;
    }
    return s;
  },
};

export const subsetSum: Statistic<BinaryWord> = {
  id: 'subset-sum',
  family: 'subsets',
  description: 'sum of the elements of the subset (positions i with w(i) = 1)',
  source: 'common practice (partitions into distinct parts ≤ n)',
  examples: [
    [[0, 0], 0],
    [[1, 0, 1], 4],
    [[0, 1, 1, 1], 9],
  ],
  compute(w) {
    let s = 0;
    for (let i = 0; i < w.length; i++) if (w[i] === 1) s += i + 1;
    return s;
  },
};
