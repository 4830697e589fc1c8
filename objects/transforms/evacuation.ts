/**
 * Schützenberger's evacuation of a standard Young tableau: remove the entry 1, close the
 * hole by jeu de taquin (the smaller of the right and lower neighbours moves in), lower
 * every entry by one, and write n+1−i into the cell vacated at step i. An involution
 * keeping the shape, with P(w^#) = evac(P(w)) for w^# the reverse complement of w
 * (Schützenberger; Stanley, EC2 §A1.2; Sagan, The Symmetric Group §3.11), checked in the tests.
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Tableau } from '../types.js';

/** One jeu de taquin slide of the hole at (0,0) out of t (rows edited in place); the vacated cell. */
function slideOut(t: number[][]): [number, number] {
  let r = 0;
  let c = 0;
  for (;;) {
    const right = t[r]![c + 1];
    const below = t[r + 1]?.[c];
    if (right === undefined && below === undefined) break;
    if (below === undefined || (right !== undefined && right < below)) {
      t[r]![c] = right!;
      c++;
    } else {
      t[r]![c] = below;
      r++;
    }
  }
  t[r]!.pop();
  if (t[r]!.length === 0) t.pop();
  return [r, c];
}

export function evacuate(tableau: Tableau): number[][] {
  const n = tableau.reduce((s, row) => s + row.length, 0);
  const t = tableau.map((row) => [...row]);
  const out = tableau.map((row) => new Array<number>(row.length).fill(0));
  for (let i = 1; i <= n; i++) {
    const [r, c] = slideOut(t);
    out[r]![c] = n + 1 - i;
  }
  return out;
}

export const evacuation: Transform<Tableau, Tableau> = {
  id: 'evacuation',
  from: 'standard-tableaux',
  to: 'standard-tableaux',
  description: "Schützenberger's evacuation (jeu de taquin), an involution keeping the shape",
  source: 'Schützenberger (1972); Stanley, EC2 §A1.2',
  examples: [
    [[[1, 2, 3], [4]], [[1, 3, 4], [2]]],
    [[[1, 2, 4], [3]], [[1, 2, 4], [3]]],
    [[[1, 2], [3]], [[1, 3], [2]]],
  ],
  apply: evacuate,
  involution: true,
};
