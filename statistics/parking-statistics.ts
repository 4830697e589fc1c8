/**
 * area and dinv of parking functions (labelled Dyck paths), as in the shuffle theorem
 * ∇e_n = Σ q^{dinv} t^{area} F_{iDes(reading word)} (Carlsson–Mellit,
 * J. Amer. Math. Soc. 31 (2018); statistics from Haglund's book, AMS 2008).
 * Rows are counted bottom to top; a_i is the area of row i and l_i its car. dinv counts
 * pairs of rows i < j with a_i = a_j and l_i < l_j, or a_i = a_j + 1 and l_i > l_j.
 */
import { areaSequence } from '../objects/support/dyck.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import type { DecoratedLabelledDyckPath, LabelledDyckPath } from '../objects/types.js';

function dinvOf(a: readonly number[], l: readonly number[]): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) {
    for (let j = i + 1; j < a.length; j++) {
      const d = a[i]! - a[j]!;
      if ((d === 0 && l[i]! < l[j]!) || (d === 1 && l[i]! > l[j]!)) s++;
    }
  }
  return s;
}

const SOURCE = 'Haglund, The q,t-Catalan numbers and the space of diagonal harmonics, AMS 2008; Carlsson–Mellit, A proof of the shuffle conjecture, J. Amer. Math. Soc. 31 (2018)';

export const parkingArea: Statistic<LabelledDyckPath> = {
  id: 'parking-area',
  family: 'parking-functions',
  description: 'area of the underlying Dyck path',
  source: SOURCE,
  examples: [
    [{ path: [1, 0, 1, 0], labels: [2, 1] }, 0],
    [{ path: [1, 1, 0, 0], labels: [1, 2] }, 1],
    [{ path: [1, 1, 0, 1, 0, 0], labels: [2, 3, 1] }, 2],
  ],
  compute(pf) {
    let s = 0;
    for (const x of areaSequence(pf.path)) s += x;
    return s;
  },
};

export const parkingDinv: Statistic<LabelledDyckPath> = {
  id: 'parking-dinv',
  family: 'parking-functions',
  description: 'rows i < j on one diagonal with l_i < l_j, or on adjacent diagonals (a_i = a_j + 1) with l_i > l_j',
  source: SOURCE,
  examples: [
    [{ path: [1, 0, 1, 0], labels: [1, 2] }, 1],
    [{ path: [1, 0, 1, 0], labels: [2, 1] }, 0],
    [{ path: [1, 1, 0, 0], labels: [1, 2] }, 0],
    [{ path: [1, 1, 0, 1, 0, 0], labels: [2, 3, 1] }, 0],
    [{ path: [1, 1, 0, 0, 1, 0], labels: [1, 3, 2] }, 2],
  ],
  compute: (pf) => dinvOf(areaSequence(pf.path), pf.labels),
};

const RISE = 'Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018), rise version';

export const decoratedArea: Statistic<DecoratedLabelledDyckPath> = {
  id: 'decorated-area',
  family: 'decorated-dyck-paths',
  description: 'area of the rows that carry no decoration (Σ a_i over undecorated rows i)',
  source: RISE,
  examples: [
    [{ path: [1, 1, 0, 0], labels: [1, 2], decorated: [] }, 1],
    [{ path: [1, 1, 0, 0], labels: [1, 2], decorated: [2] }, 0],
    [{ path: [1, 1, 1, 0, 0, 0], labels: [1, 2, 3], decorated: [2] }, 2],
  ],
  compute(p) {
    const a = areaSequence(p.path);
    let s = 0;
    for (const x of a) s += x;
    for (const r of p.decorated) s -= a[r - 1]!;
    return s;
  },
};

export const decoratedDinv: Statistic<DecoratedLabelledDyckPath> = {
  id: 'decorated-dinv',
  family: 'decorated-dyck-paths',
  description: 'dinv of the underlying labelled Dyck path (decorations on rises do not change it)',
  source: RISE,
  examples: [
    [{ path: [1, 0, 1, 0], labels: [1, 2], decorated: [] }, 1],
    [{ path: [1, 1, 0, 0], labels: [1, 2], decorated: [2] }, 0],
    [{ path: [1, 1, 0, 0, 1, 0], labels: [1, 3, 2], decorated: [2] }, 2],
  ],
  compute: (p) => dinvOf(areaSequence(p.path), p.labels),
};
