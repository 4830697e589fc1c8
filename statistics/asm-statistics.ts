/**
 * Statistics on alternating sign matrices A (rows top to bottom, columns left to right, both
 * numbered from 1). The inversion number ν(A) = Σ A_ij A_kl over i < k, j > l and the number
 * μ(A) of −1 entries are those of Mills–Robbins–Rumsey ("Alternating sign matrices and
 * descending plane partitions", J. Combin. Theory Ser. A 34 (1983)): Σ_A x^ν (1 + 1/x)^μ =
 * (1 + x)^C(n,2). The position of the 1 in the first row is the refined statistic of
 * Zeilberger, "Proof of the refined alternating sign matrix conjecture", New York J. Math. 2 (1996).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { AlternatingSignMatrix } from '../objects/types.js';

const MRR = 'Mills–Robbins–Rumsey, J. Combin. Theory Ser. A 34 (1983)';
const ZEIL = 'Zeilberger, New York J. Math. 2 (1996) (refined ASM theorem)';

const ID3 = [[1, 0, 0], [0, 1, 0], [0, 0, 1]];
/** The permutation matrix of 2 3 1 (a 1 in row i, column w(i)). */
const P231 = [[0, 1, 0], [0, 0, 1], [1, 0, 0]];
const P321 = [[0, 0, 1], [0, 1, 0], [1, 0, 0]];
/** The 3 × 3 matrix with a −1 in the centre. */
const M3 = [[0, 1, 0], [1, -1, 1], [0, 1, 0]];
/** A 4 × 4 matrix with two −1s. */
const M4 = [[0, 1, 0, 0], [1, -1, 1, 0], [0, 1, -1, 1], [0, 0, 1, 0]];

export const asmInversions: Statistic<AlternatingSignMatrix> = {
  id: 'asm-inversions',
  family: 'alternating-sign-matrices',
  description: 'inversion number: Σ A_ij·A_kl over pairs of cells with i < k and j > l (inversions for permutation matrices)',
  source: `${MRR}; Robbins–Rumsey, Adv. Math. 62 (1986)`,
  examples: [[[], 0], [ID3, 0], [P231, 2], [P321, 3], [M3, 2], [M4, 3]],
  compute(a) {
    const n = a.length;
    // above[j] = Σ of column j over the rows already passed; for each cell, the part right of it.
    const above = new Array<number>(n).fill(0);
    let s = 0;
    for (const row of a) {
      let right = 0;
      for (let l = n - 1; l >= 0; l--) {
        if (row[l] !== 0) s += row[l]! * right;
        right += above[l]!;
      }
      row.forEach((x, j) => (above[j]! += x));
    }
    return s;
  },
};

export const asmNegatives: Statistic<AlternatingSignMatrix> = {
  id: 'asm-negatives',
  family: 'alternating-sign-matrices',
  description: 'number of entries equal to −1',
  source: `${MRR}; Elkies–Kuperberg–Larsen–Propp, J. Algebraic Combin. 1 (1992) (2-enumeration)`,
  examples: [[[], 0], [ID3, 0], [P231, 0], [M3, 1], [M4, 2]],
  compute: (a) => a.reduce((s, r) => s + r.filter((x) => x === -1).length, 0),
};

export const asmFirstRowOne: Statistic<AlternatingSignMatrix> = {
  id: 'asm-first-row-one',
  family: 'alternating-sign-matrices',
  description: 'the column (1..n) of the single 1 in the first row (0 for n = 0)',
  source: ZEIL,
  examples: [[[], 0], [ID3, 1], [P231, 2], [P321, 3], [M3, 2], [M4, 2]],
  compute: (a) => (a.length === 0 ? 0 : a[0]!.indexOf(1) + 1),
};

export const asmLastRowOne: Statistic<AlternatingSignMatrix> = {
  id: 'asm-last-row-one',
  family: 'alternating-sign-matrices',
  description: 'the column (1..n) of the single 1 in the last row (0 for n = 0)',
  source: `${ZEIL} (by the vertical flip, distributed like the first row)`,
  examples: [[[], 0], [ID3, 3], [P231, 1], [M3, 2], [M4, 3]],
  compute: (a) => (a.length === 0 ? 0 : a[a.length - 1]!.indexOf(1) + 1),
};

export const asmFirstColumnOne: Statistic<AlternatingSignMatrix> = {
  id: 'asm-first-column-one',
  family: 'alternating-sign-matrices',
  description: 'the row (1..n) of the single 1 in the first column (0 for n = 0)',
  source: `${ZEIL} (by transposition, distributed like the first row)`,
  examples: [[[], 0], [ID3, 1], [P231, 3], [P321, 3], [M3, 2], [M4, 2]],
  compute: (a) => (a.length === 0 ? 0 : a.findIndex((r) => r[0] === 1) + 1),
};

export const asmDiagonalOnes: Statistic<AlternatingSignMatrix> = {
  id: 'asm-diagonal-ones',
  family: 'alternating-sign-matrices',
  description: 'number of 1 entries on the main diagonal (fixed points for permutation matrices)',
  source: 'common practice (the analogue of fixed points)',
  examples: [[[], 0], [ID3, 3], [P231, 0], [P321, 1], [M3, 0], [M4, 0]],
  compute: (a) => a.reduce((s, r, i) => (r[i] === 1 ? s + 1 : s), 0),
};

export const asmLastColumnOne: Statistic<AlternatingSignMatrix> = {
  id: 'asm-last-column-one',
  family: 'alternating-sign-matrices',
  description: 'the row (1..n) of the single 1 in the last column (0 for n = 0)',
  source: 'Behrend, "Multiply-refined enumeration of alternating sign matrices", Adv. Math. 245 (2013) (the four boundary positions, from memory)',
  examples: [[[], 0], [ID3, 3], [P231, 2], [M3, 2], [M4, 3]],
  compute: (a) => (a.length === 0 ? 0 : a.findIndex((r) => r[r.length - 1] === 1) + 1),
};
