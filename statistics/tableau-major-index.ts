/**
 * Descents of a standard Young tableau (English notation): i is a descent when i+1 lies in
 * a strictly lower row than i. Σ_{T∈SYT(λ)} q^{maj T} = q^{n(λ)} [n]_q! / Π_c [h(c)]_q
 * (Stanley, EC2 Cor. 7.21.5), checked by the tests.
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Tableau } from '../objects/types.js';

/** Row of each entry 1..n (index = entry). */
function rowsOf(t: Tableau): Int32Array {
  let n = 0;
  for (const r of t) n += r.length;
  const row = new Int32Array(n + 2);
  t.forEach((r, i) => r.forEach((x) => (row[x] = i)));
  return row;
}

export const tableauMajorIndex: Statistic<Tableau> = {
  id: 'tableau-major-index',
  family: 'standard-tableaux',
  description: 'sum of the descents i (i+1 in a lower row than i)',
  source: 'Stanley, EC2 §7.19 and Cor. 7.21.5',
  examples: [
    [[], 0],
    [[[1, 2, 3]], 0],
    [[[1], [2], [3]], 3],
    [[[1, 2], [3]], 2],
    [[[1, 3], [2, 4]], 4],
  ],
  compute(t) {
    const row = rowsOf(t);
    const n = row.length - 2;
    let s = 0;
    for (let i = 1; i < n; i++) if (row[i + 1]! > row[i]!) s += i;
    return s;
  },
};

export const tableauDescents: Statistic<Tableau> = {
  id: 'tableau-descents',
  family: 'standard-tableaux',
  description: 'number of descents i (i+1 in a lower row than i)',
  source: 'Stanley, EC2 §7.19',
  examples: [
    [[[1, 2, 3]], 0],
    [[[1], [2], [3]], 2],
    [[[1, 3], [2, 4]], 2],
    [[[1, 2, 4], [3]], 1],
  ],
  compute(t) {
    const row = rowsOf(t);
    const n = row.length - 2;
    let s = 0;
    for (let i = 1; i < n; i++) if (row[i + 1]! > row[i]!) s++;
    return s;
  },
};
