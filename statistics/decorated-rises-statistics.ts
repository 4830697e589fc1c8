/**
 * Statistics on unlabelled Dyck paths with decorated double rises (rise version of the
 * Delta theorem read at ⟨·, e_n⟩; Haglund–Remmel–Wilson, "The Delta Conjecture", Trans.
 * Amer. Math. Soc. 370 (2018)). Rows 1..n bottom to top, a_r the area of row r.
 */
import { areaSequence } from '../objects/support/dyck.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import { dyckBounce, dyckReturns } from './dyck-statistics.js';
import type { DecoratedDyckPath } from '../objects/types.js';

const FAMILY = 'dyck-paths-decorated-rises';
const HRW = 'Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018), rise version';

export const decoratedRisesArea: Statistic<DecoratedDyckPath> = {
  id: 'decorated-rises-area',
  family: FAMILY,
  description: 'area of the rows without a decoration (Σ a_r over undecorated rows)',
  source: HRW,
  examples: [
    [{ path: [1, 1, 0, 0], decorated: [2] }, 0],
    [{ path: [1, 1, 1, 0, 0, 0], decorated: [3] }, 1],
    [{ path: [1, 1, 1, 0, 0, 0], decorated: [2] }, 2],
    [{ path: [1, 1, 0, 1, 0, 0], decorated: [2] }, 1],
  ],
  compute(p) {
    const a = areaSequence(p.path);
    let s = a.reduce((x, y) => x + y, 0);
    for (const r of p.decorated) s -= a[r - 1]!;
    return s;
  },
};

export const decoratedRisesDinv: Statistic<DecoratedDyckPath> = {
  id: 'decorated-rises-dinv',
  family: FAMILY,
  description: 'pairs of rows r < s with a_r = a_s or a_r = a_s + 1 (decorations on rises leave it alone)',
  source: HRW,
  examples: [
    [{ path: [1, 1, 0, 0], decorated: [2] }, 0],
    [{ path: [1, 1, 0, 1, 0, 0], decorated: [2] }, 1],
    [{ path: [1, 0, 1, 1, 0, 0], decorated: [] }, 1],
    [{ path: [1, 0, 1, 0, 1, 0], decorated: [] }, 3],
  ],
  compute(p) {
    const a = areaSequence(p.path);
    let s = 0;
    for (let i = 0; i < a.length; i++) {
      for (let j = i + 1; j < a.length; j++) {
        const d = a[i]! - a[j]!;
        if (d === 0 || d === 1) s++;
      }
    }
    return s;
  },
};

export const decoratedRisesMarkedArea: Statistic<DecoratedDyckPath> = {
  id: 'decorated-rises-marked-area',
  family: FAMILY,
  description: 'area of the decorated rows (Σ a_r over decorated rows)',
  source: 'common practice',
  examples: [
    [{ path: [1, 1, 0, 0], decorated: [2] }, 1],
    [{ path: [1, 1, 1, 0, 0, 0], decorated: [3] }, 2],
    [{ path: [1, 1, 1, 0, 0, 0], decorated: [2, 3] }, 3],
    [{ path: [1, 0, 1, 0], decorated: [] }, 0],
  ],
  compute(p) {
    const a = areaSequence(p.path);
    return p.decorated.reduce((s, r) => s + a[r - 1]!, 0);
  },
};

export const decoratedRisesPeaks: Statistic<DecoratedDyckPath> = {
  id: 'decorated-rises-peaks',
  family: FAMILY,
  description: 'number of peaks (a north step followed by an east step) of the path',
  source: 'common practice (Narayana numbers)',
  examples: [
    [{ path: [1, 1, 0, 0], decorated: [2] }, 1],
    [{ path: [1, 1, 0, 1, 0, 0], decorated: [2] }, 2],
    [{ path: [1, 0, 1, 0, 1, 0], decorated: [] }, 3],
  ],
  compute(p) {
    let s = 0;
    for (let i = 1; i < p.path.length; i++) if (p.path[i - 1] === 1 && p.path[i] === 0) s++;
    return s;
  },
};

export const decoratedRisesFirstRise: Statistic<DecoratedDyckPath> = {
  id: 'decorated-rises-first-rise',
  family: FAMILY,
  description: 'number of north steps before the first east step',
  source: 'common practice',
  examples: [
    [{ path: [1, 1, 0, 0], decorated: [2] }, 2],
    [{ path: [1, 0, 1, 1, 0, 0], decorated: [3] }, 1],
    [{ path: [1, 1, 1, 0, 0, 0], decorated: [] }, 3],
  ],
  compute: (p) => {
    const i = p.path.indexOf(0);
    return i < 0 ? p.path.length : i;
  },
};

export const decoratedRisesReturns: Statistic<DecoratedDyckPath> = {
  id: 'decorated-rises-returns',
  family: FAMILY,
  description: 'number of returns of the path to the diagonal (the end included)',
  source: 'common practice',
  examples: [
    [{ path: [1, 1, 0, 0], decorated: [2] }, 1],
    [{ path: [1, 0, 1, 0, 1, 0], decorated: [] }, 3],
    [{ path: [1, 1, 0, 1, 0, 0], decorated: [2] }, 1],
  ],
  compute: (p) => dyckReturns.compute(p.path),
};

export const decoratedRisesBounce: Statistic<DecoratedDyckPath> = {
  id: 'decorated-rises-bounce',
  family: FAMILY,
  description: "Haglund's bounce of the path",
  source: 'Haglund, The q,t-Catalan numbers and the space of diagonal harmonics, AMS 2008',
  examples: [
    [{ path: [1, 1, 0, 0], decorated: [2] }, 0],
    [{ path: [1, 0, 1, 0, 1, 0], decorated: [] }, 3],
    [{ path: [1, 0, 1, 1, 0, 0], decorated: [3] }, 2],
  ],
  compute: (p) => dyckBounce.compute(p.path),
};
