/**
 * Foata's bijection Φ on words (and so on permutations): maj(w) = inv(Φ(w)), and Φ keeps
 * the last letter and the content (Foata, Proc. Amer. Math. Soc. 19 (1968); Lothaire,
 * Combinatorics on Words §10.6; Stanley, EC1 §1.4 for permutations). Build Φ letter by
 * letter: to add x to the current image u, if the last letter of u is ≤ x cut u after
 * every letter ≤ x, else after every letter > x; move the last letter of each piece to
 * its front; then append x.
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Permutation, Word } from '../types.js';

export function foataMap(w: readonly number[]): number[] {
  let u: number[] = [];
  for (const x of w) {
    if (u.length > 0) {
      const small = u[u.length - 1]! <= x; // cut after letters on the same side of x as the last one
      const next: number[] = [];
      let start = 0;
      for (let i = 0; i < u.length; i++) {
        if ((u[i]! <= x) === small) {
          next.push(u[i]!, ...u.slice(start, i));
          start = i + 1;
        }
      }
      u = next;
    }
    u.push(x);
  }
  return u;
}

/** The inverse of Φ, undoing one letter at a time from the right. */
export function foataInverse(v: readonly number[]): number[] {
  let u = [...v];
  const out: number[] = [];
  while (u.length > 0) {
    const x = u.pop()!;
    out.push(x);
    if (u.length === 0) break;
    // Pieces now start with a cut letter; the first letter tells which side was cut.
    const small = u[0]! <= x;
    const prev: number[] = [];
    let i = 0;
    while (i < u.length) {
      let j = i + 1;
      while (j < u.length && (u[j]! <= x) !== small) j++;
      prev.push(...u.slice(i + 1, j), u[i]!);
      i = j;
    }
    u = prev;
  }
  return out.reverse();
}

export const foata: Transform<Permutation, Permutation> = {
  id: 'foata',
  from: 'permutations',
  to: 'permutations',
  description: "Foata's bijection: carries the major index to the number of inversions",
  source: 'Foata, Proc. Amer. Math. Soc. 19 (1968); Stanley, EC1 §1.4',
  examples: [
    [[3, 1, 2], [1, 3, 2]],
    [[2, 1, 4, 3], [4, 2, 1, 3]],
  ],
  apply: foataMap,
};

export const wordFoata: Transform<Word, Word> = {
  id: 'word-foata',
  from: 'words',
  to: 'words',
  description: "Foata's bijection on words of a given content: carries maj to inv (MacMahon's equidistribution)",
  source: 'Foata, Proc. Amer. Math. Soc. 19 (1968); Lothaire, Combinatorics on Words §10.6',
  examples: [[[2, 1, 1, 2], [1, 2, 1, 2]]],
  apply: foataMap,
};
