/**
 * The Robinson–Schensted correspondence (row insertion): a permutation w ↦ (P, Q), P the
 * insertion tableau of w(1), …, w(n) and Q the recording tableau, a bijection from S_n
 * onto pairs of standard Young tableaux of the same shape (Stanley, EC2 §7.11; Sagan,
 * The Symmetric Group, ch. 3). Two transforms: w ↦ P and w ↦ Q (Q(w) = P(w⁻¹)).
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Permutation, Tableau } from '../types.js';

/** Row-inserts x into P in place (bumping the leftmost larger entry); returns the row that grew. */
export function rowInsert(p: number[][], x: number): number {
  let r = 0;
  for (;;) {
    const row = (p[r] ??= []);
    let j = 0;
    while (j < row.length && row[j]! <= x) j++;
    if (j === row.length) {
      row.push(x);
      return r;
    }
    const bumped = row[j]!;
    row[j] = x;
    x = bumped;
    r++;
  }
}

/** The pair (P, Q) of w (works for words too: then P is semistandard). */
export function rsk(w: readonly number[]): [number[][], number[][]] {
  const p: number[][] = [];
  const q: number[][] = [];
  w.forEach((x, i) => {
    const r = rowInsert(p, x);
    (q[r] ??= []).push(i + 1);
  });
  return [p, q];
}

/** The permutation of a pair (P, Q) of standard tableaux of one shape (reverse bumping). */
export function rskInverse(pIn: Tableau, qIn: Tableau): number[] {
  const p = pIn.map((r) => [...r]);
  const q = qIn.map((r) => [...r]);
  const n = q.reduce((s, r) => s + r.length, 0);
  const w = new Array<number>(n);
  for (let m = n; m >= 1; m--) {
    const r = q.findIndex((row) => row[row.length - 1] === m);
    q[r]!.pop();
    let x = p[r]!.pop()!;
    if (q[r]!.length === 0) {
      q.splice(r, 1);
      p.splice(r, 1);
    }
    for (let i = r - 1; i >= 0; i--) {
      const row = p[i]!;
      let j = row.length - 1;
      while (row[j]! >= x) j--; // rightmost entry smaller than x
      const out = row[j]!;
      row[j] = x;
      x = out;
    }
    w[m - 1] = x;
  }
  return w;
}

export const rskInsertion: Transform<Permutation, Tableau> = {
  id: 'rsk-insertion',
  from: 'permutations',
  to: 'standard-tableaux',
  description: 'the insertion tableau P(w) of Robinson–Schensted row insertion',
  source: 'Schensted (1961); Stanley, EC2 §7.11',
  examples: [
    [[3, 1, 2], [[1, 2], [3]]],
    [[2, 4, 1, 3], [[1, 3], [2, 4]]],
  ],
  apply: (w) => rsk(w)[0],
};

export const rskRecording: Transform<Permutation, Tableau> = {
  id: 'rsk-recording',
  from: 'permutations',
  to: 'standard-tableaux',
  description: 'the recording tableau Q(w) of Robinson–Schensted row insertion (Q(w) = P(w⁻¹))',
  source: 'Schensted (1961); Stanley, EC2 §7.11 and §7.13',
  examples: [
    [[3, 1, 2], [[1, 3], [2]]],
    [[2, 4, 1, 3], [[1, 2], [3, 4]]],
  ],
  apply: (w) => rsk(w)[1],
};
