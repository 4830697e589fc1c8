/** Inversions of a word (multiset permutation). */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Word } from '../objects/types.js';
import { inversions } from './inversions.js';

export const wordInversions: Statistic<Word> = {
  id: 'word-inversions',
  family: 'words',
  description: 'pairs i < j with w(i) > w(j) (equal letters are no inversion)',
  source: 'MacMahon, Combinatory Analysis (1915); Stanley, EC1 §1.7',
  examples: [
    [[], 0],
    [[1, 1, 2], 0],
    [[2, 1, 1], 2],
    [[1, 2, 1, 2], 1],
    [[2, 2, 1, 1], 4],
  ],
  // the same count as on permutations: equal letters are never counted
  step: inversions.step,
  compute: inversions.compute,
};
