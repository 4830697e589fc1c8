/**
 * Schützenberger's promotion on skew standard tableaux (linear extensions of the cell
 * poset): delete 1, slide the hole towards the outer rim (the smaller of its right and lower
 * neighbours moves in each time), put n + 1 in the last hole and lower every entry by one
 * (Stanley, "Promotion and evacuation", Electron. J. Combin. 16(2) (2009) #R9, §2).
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import { fromGrid, toGrid } from '../support/skew.js';
import type { SkewTableau } from '../types.js';

/** Slides the hole at (r, c) out of the active cells of `grid` (active: value > 0 and ≤ top); returns its last cell. */
export function slideHole(grid: number[][], inner: readonly number[], r: number, c: number, top: number): [number, number] {
  for (;;) {
    const rightOk = c + 1 < grid[r]!.length && grid[r]![c + 1]! > 0 && grid[r]![c + 1]! <= top;
    const belowOk = r + 1 < grid.length && c < grid[r + 1]!.length && c >= (inner[r + 1] ?? 0) && grid[r + 1]![c]! > 0 && grid[r + 1]![c]! <= top;
    if (!rightOk && !belowOk) return [r, c];
    if (rightOk && (!belowOk || grid[r]![c + 1]! < grid[r + 1]![c]!)) {
      grid[r]![c] = grid[r]![c + 1]!;
      c++;
    } else {
      grid[r]![c] = grid[r + 1]![c]!;
      r++;
    }
  }
}

export function promote(t: SkewTableau): SkewTableau {
  const grid = toGrid(t);
  const n = t.rows.reduce((s, row) => s + row.length, 0);
  if (n === 0) return t;
  const r0 = grid.findIndex((row) => row.includes(1));
  const [r, c] = slideHole(grid, t.inner, r0, grid[r0]!.indexOf(1), n);
  grid[r]![c] = n + 1;
  for (const row of grid) for (let j = 0; j < row.length; j++) if (row[j]! > 0) row[j]!--;
  return fromGrid(t.outer, t.inner, grid);
}

export const skewPromotion: Transform<SkewTableau, SkewTableau> = {
  id: 'skew-promotion',
  from: 'skew-standard-tableaux',
  to: 'skew-standard-tableaux',
  description: "Schützenberger's promotion: delete 1, slide the hole outwards, write n + 1, subtract 1",
  source: 'Stanley, "Promotion and evacuation", Electron. J. Combin. 16(2) (2009) #R9, §2',
  examples: [
    [{ outer: [2, 1], inner: [1], rows: [[1], [2]] }, { outer: [2, 1], inner: [1], rows: [[2], [1]] }],
    [{ outer: [2, 2], inner: [], rows: [[1, 2], [3, 4]] }, { outer: [2, 2], inner: [], rows: [[1, 3], [2, 4]] }],
    [{ outer: [3, 2], inner: [1], rows: [[1, 3], [2, 4]] }, { outer: [3, 2], inner: [1], rows: [[2, 4], [1, 3]] }],
  ],
  apply: promote,
};
