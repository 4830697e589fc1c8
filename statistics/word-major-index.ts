/** Major index and descents of a word (multiset permutation). */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Word } from '../objects/types.js';
import { descents } from './descents.js';
import { majorIndex } from './major-index.js';

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
  // descents are strict, so the permutation kernel applies to words as they are
  step: majorIndex.step,
  compute: majorIndex.compute,
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
  step: descents.step,
  compute: descents.compute,
};
