/**
 * Charge and cocharge (Lascoux–Schützenberger, "Sur une conjecture de H. O. Foulkes",
 * C. R. Acad. Sci. Paris 286A (1978)) on words of partition content and on semistandard
 * tableaux through their reading word (rows bottom to top, each left to right).
 *
 * The word is cut into standard subwords: from the right end scan leftwards for a 1, then
 * on leftwards (wrapping around at the left end) for a 2, and so on up to the largest letter
 * left; repeat on the letters not yet used. In a standard subword the 1 gets index 0 and r+1
 * gets the index of r, plus one for charge when the scan wrapped (r+1 right of r), plus one
 * for cocharge when it did not. Σ over SSYT(λ, μ) of q^charge is the Kostka–Foulkes K_{λμ}(q);
 * cocharge = n(μ) − charge.
 */
import { InputError } from '../src/core/errors.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Tableau, Word } from '../objects/types.js';

function chargeOf(w: readonly number[], co: boolean): number {
  const n = w.length;
  const left = new Int32Array(n + 2); // letters not yet used, by value
  let maxLetter = 0;
  for (const x of w) {
    if (!Number.isInteger(x) || x < 1 || x > n) throw new InputError(`charge needs letters 1..${n} (got ${w.join(',')})`, 'word');
    left[x]!++;
    if (x > maxLetter) maxLetter = x;
  }
  for (let v = 2; v <= maxLetter; v++) {
    if (left[v]! > left[v - 1]!) throw new InputError(`charge needs a partition content (got ${w.join(',')})`, 'word');
  }
  const used = new Uint8Array(n);
  let remaining = n;
  let total = 0;
  while (remaining > 0) {
    let top = 0;
    while (top < maxLetter && left[top + 1]! > 0) top++;
    let pos = n; // scanning starts at the right end
    let index = 0;
    for (let r = 1; r <= top; r++) {
      let p = pos - 1;
      let wrapped = false;
      for (;;) {
        if (p < 0) {
          p = n - 1;
          wrapped = true;
        }
        if (!used[p] && w[p] === r) break;
        p--;
      }
      if (r > 1 && wrapped !== co) index++;
      total += index;
      used[p] = 1;
      left[r]!--;
      remaining--;
      pos = p;
    }
  }
  return total;
}

/** Reading word of a tableau in English notation: rows bottom to top, left to right. */
function readingWord(t: Tableau): number[] {
  const out: number[] = [];
  for (let i = t.length - 1; i >= 0; i--) out.push(...t[i]!);
  return out;
}

const SOURCE = 'Lascoux–Schützenberger, C. R. Acad. Sci. Paris 286A (1978); Macdonald, Symmetric Functions and Hall Polynomials III.6';

export const wordCharge: Statistic<Word> = {
  id: 'word-charge',
  family: 'words',
  description: 'charge of a word of partition content (sum over its standard subwords)',
  source: SOURCE,
  examples: [
    [[1, 2], 1],
    [[2, 1], 0],
    [[3, 1, 2], 2],
    [[2, 1, 3], 1],
    [[1, 1, 2, 2], 2],
  ],
  compute: (w) => chargeOf(w, false),
};

export const wordCocharge: Statistic<Word> = {
  id: 'word-cocharge',
  family: 'words',
  description: 'cocharge of a word of partition content μ (n(μ) − charge)',
  source: SOURCE,
  examples: [
    [[1, 2], 0],
    [[2, 1], 1],
    [[3, 1, 2], 1],
    [[2, 1, 3], 2],
    [[1, 1, 2, 2], 0],
  ],
  compute: (w) => chargeOf(w, true),
};

export const tableauCharge: Statistic<Tableau> = {
  id: 'tableau-charge',
  family: 'semistandard-tableaux',
  description: 'charge of the reading word (rows bottom to top) of a tableau of partition content',
  source: SOURCE,
  examples: [
    [[[1, 2], [3]], 2],
    [[[1, 3], [2]], 1],
    [[[1, 1, 2]], 1],
    [[[1, 1], [2]], 0],
  ],
  compute: (t) => chargeOf(readingWord(t), false),
};

export const tableauCocharge: Statistic<Tableau> = {
  id: 'tableau-cocharge',
  family: 'semistandard-tableaux',
  description: 'cocharge of the reading word (rows bottom to top) of a tableau of partition content',
  source: SOURCE,
  examples: [
    [[[1, 2], [3]], 1],
    [[[1, 3], [2]], 2],
    [[[1, 1, 2]], 0],
    [[[1, 1], [2]], 1],
  ],
  compute: (t) => chargeOf(readingWord(t), true),
};
