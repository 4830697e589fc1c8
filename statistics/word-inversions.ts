/** Inversions of a word (multiset permutation). */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Word } from '../objects/types.js';

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
  step: (_at, _v, _prev, rank) => rank, // smaller letters still to come,
  compute(w) {
    const n = w.length;
    let s = 0;
    for (let i = 0; i < n - 1; i++) {
      const x = w[i]!;
      for (let j = i + 1; j < n; j++) if (w[j]! < x) s++;
    }
    return s;
  },
};
