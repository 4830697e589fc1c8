/**
 * Loehr's pmaj on parking functions (labelled Dyck paths): read the columns left to right,
 * keeping a pool of cars; at column i add its cars and take out β_i, the largest car in the
 * pool below β_{i−1} if there is one, else the largest car; pmaj = Σ (n − i) over the i with
 * β_i < β_{i+1}. Σ q^{area} t^{pmaj} = Σ q^{dinv} t^{area} (Loehr, "Combinatorics of q,t-parking
 * functions", Adv. in Appl. Math. 34 (2005); Haglund, The q,t-Catalan numbers and the space of
 * diagonal harmonics, AMS 2008, ch. 5); the tests check it for n ≤ 6.
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { LabelledDyckPath } from '../objects/types.js';

export const parkingPmaj: Statistic<LabelledDyckPath> = {
  id: 'parking-pmaj',
  family: 'parking-functions',
  description: "Loehr's pmaj: pick cars column by column (largest below the last pick, else largest); Σ (n − i) over ascents of the picks",
  source: 'Loehr, Adv. in Appl. Math. 34 (2005); Haglund, AMS 2008, ch. 5',
  examples: [
    [{ path: [1, 0, 1, 0], labels: [1, 2] }, 1],
    [{ path: [1, 0, 1, 0], labels: [2, 1] }, 0],
    [{ path: [1, 1, 0, 0], labels: [1, 2] }, 0],
    [{ path: [1, 0, 1, 1, 0, 0], labels: [3, 1, 2] }, 0],
    [{ path: [1, 0, 1, 1, 0, 0], labels: [1, 2, 3] }, 2],
  ],
  compute(pf) {
    const n = pf.labels.length;
    const byColumn: number[][] = Array.from({ length: n }, () => []);
    let col = 0;
    let row = 0;
    for (const s of pf.path) {
      if (s === 1) byColumn[col]!.push(pf.labels[row++]!);
      else col++;
    }
    const pool: number[] = [];
    let prev = Infinity;
    let s = 0;
    for (let i = 0; i < n; i++) {
      pool.push(...byColumn[i]!);
      let pick = -1;
      let largest = -1;
      for (const c of pool) {
        if (c < prev && c > pick) pick = c;
        if (c > largest) largest = c;
      }
      if (pick < 0) pick = largest;
      pool.splice(pool.indexOf(pick), 1);
      if (i > 0 && prev < pick) s += n - i; // ascent between picks i and i+1 (1-based)
      prev = pick;
    }
    return s;
  },
};
