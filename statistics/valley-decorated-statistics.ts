/**
 * Statistics on labelled Dyck paths with decorated contractible valleys (valley version of
 * the Delta conjecture, Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math.
 * Soc. 370 (2018)). Rows 1..n bottom to top, a_r the area of row r, l_r its car, Val the
 * decorated rows. dinv counts the pairs r < s of Haglund's dinv (a_r = a_s and l_r < l_s, or
 * a_r = a_s + 1 and l_r > l_s) whose lower row r is not decorated, minus |Val|; area is the
 * whole area. The tests check Σ q^dinv t^area F_{iDes} against Δ′_{e_{k−1}} e_n.
 */
import { contractibleValleys } from '../objects/valley-decorated-dyck-paths.js';
import { valleyRows } from '../objects/support/decorations.js';
import { areaSequence } from '../objects/support/dyck.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import { dyckBounce, dyckReturns } from './dyck-statistics.js';
import type { ValleyDecoratedLabelledDyckPath } from '../objects/types.js';

const FAMILY = 'valley-decorated-dyck-paths';
const HRW = 'Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018), valley version';

export const valleyDecoratedArea: Statistic<ValleyDecoratedLabelledDyckPath> = {
  id: 'valley-decorated-area',
  family: FAMILY,
  description: 'area of the path (every row, decorated or not)',
  source: HRW,
  examples: [
    [{ path: [1, 0, 1, 0], labels: [1, 2], decorated: [2] }, 0],
    [{ path: [1, 1, 0, 0, 1, 0], labels: [2, 3, 1], decorated: [3] }, 1],
    [{ path: [1, 1, 0, 1, 0, 0], labels: [1, 2, 3], decorated: [] }, 2],
  ],
  compute: (p) => areaSequence(p.path).reduce((a, b) => a + b, 0),
};

export const valleyDecoratedDinv: Statistic<ValleyDecoratedLabelledDyckPath> = {
  id: 'valley-decorated-dinv',
  family: FAMILY,
  description: 'dinv pairs whose lower row is not a decorated valley, minus the number of decorated valleys',
  source: HRW,
  examples: [
    [{ path: [1, 0, 1, 0], labels: [1, 2], decorated: [] }, 1],
    [{ path: [1, 0, 1, 0], labels: [1, 2], decorated: [2] }, 0],
    [{ path: [1, 1, 0, 0, 1, 0], labels: [2, 3, 1], decorated: [3] }, 0],
    [{ path: [1, 1, 0, 0, 1, 0], labels: [1, 3, 2], decorated: [] }, 2],
    [{ path: [1, 0, 1, 0, 1, 0], labels: [1, 2, 3], decorated: [2] }, 1],
  ],
  compute(p) {
    const a = areaSequence(p.path);
    const l = p.labels;
    const val = new Set(p.decorated);
    let s = 0;
    for (let i = 0; i < a.length; i++) {
      if (val.has(i + 1)) continue;
      for (let j = i + 1; j < a.length; j++) {
        const d = a[i]! - a[j]!;
        if ((d === 0 && l[i]! < l[j]!) || (d === 1 && l[i]! > l[j]!)) s++;
      }
    }
    return s - val.size;
  },
};

export const valleyDecoratedContractible: Statistic<ValleyDecoratedLabelledDyckPath> = {
  id: 'valley-decorated-contractible',
  family: FAMILY,
  description: 'number of contractible valleys (a_r < a_{r−1}, or a_r = a_{r−1} with l_{r−1} < l_r), decorated or not',
  source: HRW,
  examples: [
    [{ path: [1, 0, 1, 0], labels: [2, 1], decorated: [] }, 0],
    [{ path: [1, 1, 0, 0, 1, 0], labels: [2, 3, 1], decorated: [3] }, 1],
    [{ path: [1, 0, 1, 0, 1, 0], labels: [1, 2, 3], decorated: [2] }, 2],
  ],
  compute: (p) => contractibleValleys(p.path, p.labels).length,
};

export const valleyDecoratedValleys: Statistic<ValleyDecoratedLabelledDyckPath> = {
  id: 'valley-decorated-valleys',
  family: FAMILY,
  description: 'number of valleys of the path (north steps after an east step, the first row excluded)',
  source: 'common practice',
  examples: [
    [{ path: [1, 0, 1, 0], labels: [2, 1], decorated: [] }, 1],
    [{ path: [1, 1, 0, 1, 0, 0], labels: [1, 2, 3], decorated: [] }, 1],
    [{ path: [1, 0, 1, 0, 1, 0], labels: [1, 2, 3], decorated: [2] }, 2],
  ],
  compute: (p) => valleyRows(p.path).length,
};

export const valleyDecoratedReturns: Statistic<ValleyDecoratedLabelledDyckPath> = {
  id: 'valley-decorated-returns',
  family: FAMILY,
  description: 'number of returns of the path to the diagonal (the end included)',
  source: 'common practice',
  examples: [
    [{ path: [1, 0, 1, 0], labels: [2, 1], decorated: [] }, 2],
    [{ path: [1, 1, 0, 0, 1, 0], labels: [2, 3, 1], decorated: [3] }, 2],
    [{ path: [1, 1, 0, 1, 0, 0], labels: [1, 2, 3], decorated: [] }, 1],
  ],
  compute: (p) => dyckReturns.compute(p.path),
};

export const valleyDecoratedBounce: Statistic<ValleyDecoratedLabelledDyckPath> = {
  id: 'valley-decorated-bounce',
  family: FAMILY,
  description: "Haglund's bounce of the underlying Dyck path",
  source: 'Haglund, The q,t-Catalan numbers and the space of diagonal harmonics, AMS 2008',
  examples: [
    [{ path: [1, 0, 1, 0], labels: [2, 1], decorated: [] }, 1],
    [{ path: [1, 1, 0, 0], labels: [1, 2], decorated: [] }, 0],
    [{ path: [1, 0, 1, 0, 1, 0], labels: [1, 2, 3], decorated: [2] }, 3],
  ],
  compute: (p) => dyckBounce.compute(p.path),
};
