/** The transpose of a standard Young tableau (entries reflected in the main diagonal). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Tableau } from '../types.js';

/** The transpose of a tableau: row j of the result is column j of t. */
export function transposeTableau(t: Tableau): number[][] {
  const out: number[][] = [];
  for (const row of t) row.forEach((x, j) => (out[j] ??= []).push(x));
  return out;
}

export const transpose: Transform<Tableau, Tableau> = {
  id: 'transpose',
  from: 'standard-tableaux',
  to: 'standard-tableaux',
  description: "the transposed tableau, of the conjugate shape λ'",
  source: 'standard (Stanley, EC2 §7.10)',
  examples: [
    [[[1, 2, 4], [3]], [[1, 3], [2], [4]]],
    [[[1, 3], [2, 4]], [[1, 2], [3, 4]]],
  ],
  apply: transposeTableau,
  involution: true,
};
