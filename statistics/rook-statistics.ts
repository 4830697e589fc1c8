/**
 * Statistics on rook placements on a Ferrers board (columns left to right, heights weakly
 * increasing). The Garsia–Remmel statistic: every rook cancels the cells above it in its
 * column and the cells to its right in its row; inv counts the board cells neither holding a
 * rook nor cancelled. Σ q^{inv} over the placements of k rooks is R_k(B, q), and
 * Σ_k R_k(B,q) [x]_q[x−1]_q…[x−c+k+1]_q = Π_i [x + h_i − i + 1]_q (Garsia–Remmel, "Q-counting
 * rook configurations and a formula of Frobenius", J. Combin. Theory Ser. A 41 (1986), their factorization theorem;
 * checked in the tests).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { RookPlacement } from '../objects/types.js';

const FAMILY = 'rook-placements';
const GR = 'Garsia–Remmel, J. Combin. Theory Ser. A 41 (1986)';

/** Cells cancelled by the rooks (not counting the rook cells). */
function cancelled(p: RookPlacement): number {
  const rookAt = new Map<number, number>(); // row → column of its rook
  p.rows.forEach((r, c) => r > 0 && rookAt.set(r, c));
  let s = 0;
  p.heights.forEach((h, c) => {
    for (let y = 1; y <= h; y++) {
      if (p.rows[c] === y) continue;
      const above = p.rows[c]! > 0 && y > p.rows[c]!;
      const right = rookAt.has(y) && rookAt.get(y)! < c;
      if (above || right) s++;
    }
  });
  return s;
}
const rooks = (p: RookPlacement): number => p.rows.filter((r) => r > 0).length;
const cells = (p: RookPlacement): number => p.heights.reduce((a, b) => a + b, 0);

// Board (1,2,2) = shape 2,2,1: cells (col 1: row 1), (col 2: rows 1,2), (col 3: rows 1,2).
const B = [1, 2, 2];

export const rookInv: Statistic<RookPlacement> = {
  id: 'rook-inv',
  family: FAMILY,
  description: 'board cells neither holding a rook nor lying above a rook in its column or right of a rook in its row',
  source: `${GR} (the factorization theorem)`,
  examples: [
    [{ heights: B, rows: [0, 0, 0] }, 5],
    [{ heights: B, rows: [1, 0, 0] }, 2],
    [{ heights: B, rows: [0, 2, 1] }, 2],
    [{ heights: B, rows: [1, 2, 0] }, 0],
  ],
  compute: (p) => cells(p) - rooks(p) - cancelled(p),
};

export const rookCount: Statistic<RookPlacement> = {
  id: 'rook-count',
  family: FAMILY,
  description: 'number of rooks',
  source: 'Goldman–Joichi–White, Proc. Amer. Math. Soc. 52 (1975) (rook numbers)',
  examples: [
    [{ heights: B, rows: [0, 0, 0] }, 0],
    [{ heights: B, rows: [1, 0, 0] }, 1],
    [{ heights: B, rows: [0, 2, 1] }, 2],
  ],
  compute: rooks,
};

export const rookCancelled: Statistic<RookPlacement> = {
  id: 'rook-cancelled',
  family: FAMILY,
  description: 'board cells without a rook lying above a rook in its column or right of a rook in its row',
  source: GR,
  examples: [
    [{ heights: B, rows: [0, 0, 0] }, 0],
    [{ heights: B, rows: [1, 0, 0] }, 2],
    [{ heights: B, rows: [0, 2, 1] }, 1],
  ],
  compute: cancelled,
};

export const rookEmptyColumns: Statistic<RookPlacement> = {
  id: 'rook-empty-columns',
  family: FAMILY,
  description: 'number of columns without a rook',
  source: 'common practice',
  examples: [
    [{ heights: B, rows: [0, 0, 0] }, 3],
    [{ heights: B, rows: [1, 0, 0] }, 2],
    [{ heights: B, rows: [0, 2, 1] }, 1],
  ],
  compute: (p) => p.rows.filter((r) => r === 0).length,
};

export const rookRowSum: Statistic<RookPlacement> = {
  id: 'rook-row-sum',
  family: FAMILY,
  description: 'sum of the rows of the rooks (row 1 at the bottom)',
  source: 'common practice',
  examples: [
    [{ heights: B, rows: [0, 0, 0] }, 0],
    [{ heights: B, rows: [1, 0, 0] }, 1],
    [{ heights: B, rows: [0, 2, 1] }, 3],
  ],
  compute: (p) => p.rows.reduce((a, b) => a + b, 0),
};
