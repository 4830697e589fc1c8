/**
 * inv and maj of standard fillings of a diagram μ (French: rows[0] is the bottom row), the
 * statistics of the Haglund–Haiman–Loehr formula H̃_μ = Σ_σ q^{inv σ} t^{maj σ} x^σ
 * (J. Amer. Math. Soc. 18 (2005)). Reading order: rows top to bottom, each left
 * to right. A descent is a cell above the bottom row whose entry exceeds the entry directly
 * below; maj = Σ_{descents u} (leg(u) + 1). Cells attack when in the same row, or in adjacent
 * rows with the upper one strictly right of the lower one; inv = #(attacking pairs u before
 * v in reading order with σ(u) > σ(v)) − Σ_{descents u} arm(u).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Filling } from '../objects/types.js';

/** Height of column c: the number of rows longer than c. */
function columnHeight(rows: Filling['rows'], c: number): number {
  let h = 0;
  while (h < rows.length && rows[h]!.length > c) h++;
  return h;
}

const SOURCE = 'Haglund–Haiman–Loehr, A combinatorial formula for Macdonald polynomials, J. Amer. Math. Soc. 18 (2005)';

export const fillingMaj: Statistic<Filling> = {
  id: 'filling-maj',
  family: 'fillings',
  description: 'Σ over descents (entry above a smaller one) of leg + 1',
  source: SOURCE,
  examples: [
    [{ shape: [2], rows: [[2, 1]] }, 0],
    [{ shape: [1, 1], rows: [[1], [2]] }, 1],
    [{ shape: [2, 1], rows: [[1, 2], [3]] }, 1],
    [{ shape: [2, 2], rows: [[1, 2], [3, 4]] }, 2],
    [{ shape: [1, 1, 1], rows: [[1], [3], [2]] }, 2],
  ],
  compute({ rows }) {
    let s = 0;
    for (let r = 1; r < rows.length; r++) {
      const row = rows[r]!;
      const below = rows[r - 1]!;
      for (let c = 0; c < row.length; c++) if (row[c]! > below[c]!) s += columnHeight(rows, c) - r;
    }
    return s;
  },
};

export const fillingInv: Statistic<Filling> = {
  id: 'filling-inv',
  family: 'fillings',
  description: 'attacking pairs out of order in reading order, less the arms of the descents',
  source: SOURCE,
  examples: [
    [{ shape: [2], rows: [[2, 1]] }, 1],
    [{ shape: [1, 1], rows: [[1], [2]] }, 0],
    [{ shape: [2, 1], rows: [[2, 1], [3]] }, 1],
    [{ shape: [2, 2], rows: [[1, 2], [3, 4]] }, 0],
    [{ shape: [2, 2], rows: [[2, 1], [4, 3]] }, 2],
  ],
  compute({ rows }) {
    let s = 0;
    for (let r = 0; r < rows.length; r++) {
      const row = rows[r]!;
      for (let c = 0; c < row.length; c++) {
        const x = row[c]!;
        for (let d = c + 1; d < row.length; d++) if (x > row[d]!) s++; // same row
        if (r > 0) {
          const below = rows[r - 1]!;
          for (let d = 0; d < c; d++) if (x > below[d]!) s++; // upper cell strictly right
          if (x > below[c]!) s -= row.length - c - 1; // descent: subtract its arm
        }
      }
    }
    return s;
  },
};
