/**
 * Standardization of a word: equal letters are numbered left to right, smaller letters
 * first, giving a permutation with the same descent set and inversions (common practice;
 * Stanley, EC1 §1.7).
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Permutation, Word } from '../types.js';

export function standardizeWord(w: Word): number[] {
  const order = w.map((x, i) => [x, i] as const).sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  const out = new Array<number>(w.length);
  order.forEach(([, i], rank) => (out[i] = rank + 1));
  return out;
}

export const standardize: Transform<Word, Permutation> = {
  id: 'standardize',
  from: 'words',
  to: 'permutations',
  description: 'the standardization of a word (equal letters numbered left to right): same descents and inversions',
  source: 'common practice (Stanley, EC1 §1.7)',
  examples: [
    [[2, 1, 1, 2], [3, 1, 2, 4]],
    [[1, 3, 1, 2], [1, 4, 2, 3]],
  ],
  apply: standardizeWord,
};
