/** Left-to-right and right-to-left minima and maxima (records) of a permutation. */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Permutation } from '../objects/types.js';

const SOURCE = 'standard (Stanley, EC1 §1.3, records); Stirling numbers of the first kind';

export const leftToRightMinima: Statistic<Permutation> = {
  id: 'left-to-right-minima',
  family: 'permutations',
  description: 'number of i with w(i) < w(j) for every j < i',
  source: SOURCE,
  examples: [
    [[], 0],
    [[1, 2, 3], 1],
    [[3, 1, 4, 2], 2],
    [[4, 3, 2, 1], 4],
  ],
  step: (_at, v, _prev, rank) => (rank === v - 1 ? 1 : 0), // nothing smaller placed yet
  compute(w) {
    let m = Infinity;
    let s = 0;
    for (const x of w) if (x < m) (m = x), s++;
    return s;
  },
};

export const leftToRightMaxima: Statistic<Permutation> = {
  id: 'left-to-right-maxima',
  family: 'permutations',
  description: 'number of i with w(i) > w(j) for every j < i',
  source: SOURCE,
  examples: [
    [[], 0],
    [[1, 2, 3], 3],
    [[3, 1, 4, 2], 2],
    [[4, 3, 2, 1], 1],
  ],
  step: (_at, v, _prev, _rank, placed) => (placed >>> (v - 1) === 0 ? 1 : 0), // nothing larger placed yet
  compute(w) {
    let m = -Infinity;
    let s = 0;
    for (const x of w) if (x > m) (m = x), s++;
    return s;
  },
};

export const rightToLeftMinima: Statistic<Permutation> = {
  id: 'right-to-left-minima',
  family: 'permutations',
  description: 'number of i with w(i) < w(j) for every j > i',
  source: SOURCE,
  examples: [
    [[1, 2, 3], 3],
    [[3, 1, 4, 2], 2],
    [[4, 3, 2, 1], 1],
  ],
  step: (_at, v, _prev, rank) => (rank === 0 ? 1 : 0), // every later value is larger
  compute(w) {
    let m = Infinity;
    let s = 0;
    for (let i = w.length - 1; i >= 0; i--) if (w[i]! < m) (m = w[i]!), s++;
    return s;
  },
};

export const rightToLeftMaxima: Statistic<Permutation> = {
  id: 'right-to-left-maxima',
  family: 'permutations',
  description: 'number of i with w(i) > w(j) for every j > i',
  source: SOURCE,
  examples: [
    [[1, 2, 3], 1],
    [[3, 1, 4, 2], 2],
    [[4, 3, 2, 1], 4],
  ],
  compute(w) {
    let m = -Infinity;
    let s = 0;
    for (let i = w.length - 1; i >= 0; i--) if (w[i]! > m) (m = w[i]!), s++;
    return s;
  },
};
