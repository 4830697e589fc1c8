/**
 * Transpose of a skew standard tableau: the entry in row r, column c moves to row c,
 * column r, giving a tableau of shape λ′/μ′. Descents go to non-descents (i + 1 lies either
 * lower or further right, never both, in a skew standard tableau), so des + des′ = n − 1.
 */
import { conjugate } from '../../src/core/partitions.js';
import type { Transform } from '../../src/enumerate/plugin.js';
import { fromGrid, toGrid } from '../support/skew.js';
import type { SkewTableau } from '../types.js';

export function transposeSkew(t: SkewTableau): SkewTableau {
  const outer = conjugate(t.outer);
  const inner = conjugate(t.inner);
  const grid = toGrid(t);
  const out = outer.map((len, c) => Array.from({ length: len }, (_, r) => grid[r]![c]!));
  return fromGrid(outer, inner, out);
}

export const skewTranspose: Transform<SkewTableau, SkewTableau> = {
  id: 'skew-transpose',
  from: 'skew-standard-tableaux',
  to: 'skew-standard-tableaux',
  description: 'transpose: rows become columns, shape λ/μ becomes λ′/μ′ (an involution)',
  source: 'common practice (Stanley, EC2 §7.10)',
  examples: [
    [{ outer: [2, 1], inner: [1], rows: [[1], [2]] }, { outer: [2, 1], inner: [1], rows: [[2], [1]] }],
    [{ outer: [3, 1], inner: [], rows: [[1, 2, 3], [4]] }, { outer: [2, 1, 1], inner: [], rows: [[1, 4], [2], [3]] }],
    [{ outer: [3, 2], inner: [1], rows: [[1, 3], [2, 4]] }, { outer: [2, 2, 1], inner: [1], rows: [[2], [1, 4], [3]] }],
  ],
  apply: transposeSkew,
  involution: true,
};
