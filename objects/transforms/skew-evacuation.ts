/**
 * Schützenberger's evacuation on skew standard tableaux: n times, remove the smallest entry
 * still active, slide its hole outwards through the active cells, and freeze the last hole
 * with n + 1 − i (step i). An involution keeping the shape; on straight shapes it is the
 * evacuation of standard Young tableaux (Stanley, "Promotion and evacuation", Electron. J.
 * Combin. 16(2) (2009) #R9, §2; the tests check the involution, ε∂ = ∂^{-1}ε and agreement).
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import { fromGrid, toGrid } from '../support/skew.js';
import type { SkewTableau } from '../types.js';
import { slideHole } from './skew-promotion.js';

export function evacuateSkew(t: SkewTableau): SkewTableau {
  const grid = toGrid(t);
  const n = t.rows.reduce((s, row) => s + row.length, 0);
  const out = grid.map((row) => new Array<number>(row.length).fill(0));
  for (let i = 1; i <= n; i++) {
    // Active entries are i..n; the smallest is i.
    const r0 = grid.findIndex((row) => row.includes(i));
    const [r, c] = slideHole(grid, t.inner, r0, grid[r0]!.indexOf(i), n);
    grid[r]![c] = 0;
    out[r]![c] = n + 1 - i;
  }
  return fromGrid(t.outer, t.inner, out);
}

export const skewEvacuation: Transform<SkewTableau, SkewTableau> = {
  id: 'skew-evacuation',
  from: 'skew-standard-tableaux',
  to: 'skew-standard-tableaux',
  description: "Schützenberger's evacuation on the skew shape (an involution)",
  source: 'Stanley, "Promotion and evacuation", Electron. J. Combin. 16(2) (2009) #R9, §2',
  examples: [
    [{ outer: [2, 1], inner: [1], rows: [[1], [2]] }, { outer: [2, 1], inner: [1], rows: [[2], [1]] }],
    [{ outer: [3, 1], inner: [], rows: [[1, 2, 3], [4]] }, { outer: [3, 1], inner: [], rows: [[1, 3, 4], [2]] }],
    [{ outer: [3, 2], inner: [1], rows: [[1, 3], [2, 4]] }, { outer: [3, 2], inner: [1], rows: [[2, 4], [1, 3]] }],
  ],
  apply: evacuateSkew,
  involution: true,
};
