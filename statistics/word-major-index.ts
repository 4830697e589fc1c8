/** Major index and descents of a word (multiset permutation). */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Word } from '../objects/types.js';

export const wordMajorIndex: Statistic<Word> = {
  id: 'word-major-index',
  family: 'words',
  description: 'sum of the i with w(i) > w(i+1)',
  source: 'MacMahon, Combinatory Analysis (1915); Stanley, EC1 §1.7',
  examples: [
    [[1, 1, 2], 0],
    [[2, 1, 1], 1],
    [[1, 2, 1, 2], 2],
    [[2, 2, 1, 1], 2],
  ],
  step: (at, v, prev) => (prev > v ? at : 0),
  compute(w) {
    let s = 0;
    for (let i = 1; i < w.length; i++) if (w[i - 1]! > w[i]!) s += i;
    return s;
  },
};

export const wordDescents: Statistic<Word> = {
  id: 'word-descents',
  family: 'words',
  description: 'number of i with w(i) > w(i+1)',
  source: 'standard (Stanley, EC1 §1.7)',
  examples: [
    [[1, 1, 2], 0],
    [[2, 1, 2, 1], 2],
    [[2, 2, 1, 1], 1],
  ],
  step: (_at, v, prev) => (prev > v ? 1 : 0),
  compute(w) {
    let s = 0;
    for (let i = 1; i < w.length; i++) if (w[i - 1]! > w[i]!) s++;
    return s;
  },
};
