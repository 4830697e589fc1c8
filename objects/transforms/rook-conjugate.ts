/**
 * Reflection of a rook placement in the antidiagonal of its board: with C columns and
 * H = the tallest height, the cell (column c, row r) goes to (column H + 1 − r, row C + 1 − c).
 * The board of a partition λ goes to the board of λ′ (the staircase to itself), rooks stay
 * non-attacking, and the rook numbers of B and B′ agree (common practice).
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { RookPlacement } from '../types.js';

export function conjugateRooks(p: RookPlacement): RookPlacement {
  const cols = p.heights.length;
  const top = p.heights.reduce((m, h) => Math.max(m, h), 0);
  const heights = Array.from({ length: top }, (_, j) => p.heights.filter((h) => h >= top - j).length);
  const rows = new Array<number>(top).fill(0);
  p.rows.forEach((r, c) => {
    if (r > 0) rows[top - r] = cols - c;
  });
  return { heights, rows };
}

export const rookConjugate: Transform<RookPlacement, RookPlacement> = {
  id: 'rook-conjugate',
  from: 'rook-placements',
  to: 'rook-placements',
  description: "reflection in the antidiagonal: the board of λ becomes the board of λ′, rooks move with their cells",
  source: 'common practice',
  examples: [
    [{ heights: [1, 2, 2], rows: [1, 0, 0] }, { heights: [2, 3], rows: [0, 3] }],
    [{ heights: [1, 2, 2], rows: [0, 2, 1] }, { heights: [2, 3], rows: [2, 1] }],
    [{ heights: [1, 2, 3], rows: [0, 0, 3] }, { heights: [1, 2, 3], rows: [1, 0, 0] }],
  ],
  apply: conjugateRooks,
  involution: true,
};
