/** Complement: letter i becomes (largest letter + 1 − i). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Permutation, Word } from '../types.js';

export const complement: Transform<Permutation, Permutation> = {
  id: 'complement',
  from: 'permutations',
  to: 'permutations',
  description: 'the complement n+1−w(1), …, n+1−w(n) of a permutation',
  source: 'standard (Stanley, EC1 §1.3)',
  examples: [[[2, 3, 1], [2, 1, 3]]],
  apply: (w) => w.map((x) => w.length + 1 - x),
  involution: true,
};

/**
 * The complement of a word: its letters reflected in the range they span, x ↦ a + b − x
 * with a, b the least and largest letters. For a word using letters 1..m this is m+1−x
 * (content reversed); reflecting in the used range keeps it an involution on every word.
 */
export const wordComplement: Transform<Word, Word> = {
  id: 'word-complement',
  from: 'words',
  to: 'words',
  description: 'the complement of a word: x ↦ a+b−x, a and b its least and largest letters (1..m: content reversed)',
  source: 'standard (Lothaire, Combinatorics on Words)',
  examples: [
    [[1, 1, 2, 3], [3, 3, 2, 1]],
    [[2, 3, 3], [3, 2, 2]],
  ],
  apply(w) {
    let a = Infinity;
    let b = -Infinity;
    for (const x of w) {
      if (x < a) a = x;
      if (x > b) b = x;
    }
    return w.map((x) => a + b - x);
  },
  involution: true,
};
