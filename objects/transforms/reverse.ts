/** Reading a permutation or a word backwards. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Permutation, Word } from '../types.js';

export const reverse: Transform<Permutation, Permutation> = {
  id: 'reverse',
  from: 'permutations',
  to: 'permutations',
  description: 'the reverse w(n)…w(1) of a permutation',
  source: 'standard (Stanley, EC1 §1.3)',
  examples: [[[2, 3, 1], [1, 3, 2]]],
  apply: (w) => [...w].reverse(),
  involution: true,
};

export const wordReverse: Transform<Word, Word> = {
  id: 'word-reverse',
  from: 'words',
  to: 'words',
  description: 'the reverse of a word (same content)',
  source: 'standard (Lothaire, Combinatorics on Words)',
  examples: [[[1, 1, 2, 3], [3, 2, 1, 1]]],
  apply: (w) => [...w].reverse(),
  involution: true,
};
