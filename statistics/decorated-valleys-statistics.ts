/**
 * Statistics on unlabelled Dyck paths with decorated valleys (valley version of the Delta
 * conjecture read at ⟨·, e_n⟩; Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer.
 * Math. Soc. 370 (2018)). Rows 1..n bottom to top, a_r the area of row r, Val the decorated rows.
 */
import { areaSequence } from '../objects/support/dyck.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import { dyckBounce, dyckPeaks } from './dyck-statistics.js';
import type { DecoratedDyckPath } from '../objects/types.js';

const FAMILY = 'dyck-paths-decorated-valleys';
const HRW = 'Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018), valley version';

export const decoratedValleysArea: Statistic<DecoratedDyckPath> = {
  id: 'decorated-valleys-area',
  family: FAMILY,
  description: 'area of the path (every row)',
  source: HRW,
  examples: [
    [{ path: [1, 0, 1, 0], decorated: [2] }, 0],
    [{ path: [1, 1, 0, 0, 1, 0], decorated: [3] }, 1],
    [{ path: [1, 1, 0, 1, 0, 0], decorated: [3] }, 2],
  ],
  compute: (p) => areaSequence(p.path).reduce((a, b) => a + b, 0),
};

export const decoratedValleysDinv: Statistic<DecoratedDyckPath> = {
  id: 'decorated-valleys-dinv',
  family: FAMILY,
  description: 'pairs r < s with a_r = a_s or a_r = a_s + 1 whose lower row r is not decorated, minus the number of decorations',
  source: HRW,
  examples: [
    [{ path: [1, 0, 1, 0], decorated: [2] }, 0],
    [{ path: [1, 0, 1, 0, 1, 0], decorated: [] }, 3],
    [{ path: [1, 0, 1, 0, 1, 0], decorated: [2] }, 1],
    [{ path: [1, 0, 1, 0, 1, 0], decorated: [2, 3] }, 0],
    [{ path: [1, 1, 0, 0, 1, 0], decorated: [3] }, 1],
  ],
  compute(p) {
    const a = areaSequence(p.path);
    const val = new Set(p.decorated);
    let s = 0;
    for (let i = 0; i < a.length; i++) {
      if (val.has(i + 1)) continue;
      for (let j = i + 1; j < a.length; j++) {
        const d = a[i]! - a[j]!;
        if (d === 0 || d === 1) s++;
      }
    }
    return s - val.size;
  },
};

export const decoratedValleysMarkedArea: Statistic<DecoratedDyckPath> = {
  id: 'decorated-valleys-marked-area',
  family: FAMILY,
  description: 'area of the decorated rows (Σ a_r over decorated valleys)',
  source: 'common practice',
  examples: [
    [{ path: [1, 0, 1, 0], decorated: [2] }, 0],
    [{ path: [1, 1, 0, 1, 0, 0], decorated: [3] }, 1],
    [{ path: [1, 1, 1, 0, 0, 1, 0, 0], decorated: [4] }, 1],
  ],
  compute(p) {
    const a = areaSequence(p.path);
    return p.decorated.reduce((s, r) => s + a[r - 1]!, 0);
  },
};

export const decoratedValleysReturns: Statistic<DecoratedDyckPath> = {
  id: 'decorated-valleys-returns',
  family: FAMILY,
  description: 'number of returns of the path to the diagonal (the end included)',
  source: 'common practice',
  examples: [
    [{ path: [1, 0, 1, 0], decorated: [2] }, 2],
    [{ path: [1, 1, 0, 0, 1, 0], decorated: [3] }, 2],
    [{ path: [1, 1, 0, 1, 0, 0], decorated: [3] }, 1],
  ],
  compute(p) {
    let h = 0;
    let s = 0;
    for (const x of p.path) {
      h += x === 1 ? 1 : -1;
      if (h === 0) s++;
    }
    return s;
  },
};

export const decoratedValleysOnDiagonal: Statistic<DecoratedDyckPath> = {
  id: 'decorated-valleys-on-diagonal',
  family: FAMILY,
  description: 'number of decorated valleys on the main diagonal (a_r = 0)',
  source: 'common practice',
  examples: [
    [{ path: [1, 0, 1, 0], decorated: [2] }, 1],
    [{ path: [1, 1, 0, 1, 0, 0], decorated: [3] }, 0],
    [{ path: [1, 1, 0, 0, 1, 0, 1, 0], decorated: [3, 4] }, 2],
  ],
  compute(p) {
    const a = areaSequence(p.path);
    return p.decorated.filter((r) => a[r - 1] === 0).length;
  },
};

export const decoratedValleysPeaks: Statistic<DecoratedDyckPath> = {
  id: 'decorated-valleys-peaks',
  family: FAMILY,
  description: 'number of peaks (a north step followed by an east step) of the path',
  source: 'common practice (Narayana numbers)',
  examples: [
    [{ path: [1, 0, 1, 0], decorated: [2] }, 2],
    [{ path: [1, 1, 0, 0, 1, 0], decorated: [3] }, 2],
    [{ path: [1, 1, 1, 0, 0, 0], decorated: [] }, 1],
  ],
  compute: (p) => dyckPeaks.compute(p.path),
};

export const decoratedValleysBounce: Statistic<DecoratedDyckPath> = {
  id: 'decorated-valleys-bounce',
  family: FAMILY,
  description: "Haglund's bounce of the path",
  source: 'Haglund, The q,t-Catalan numbers and the space of diagonal harmonics, AMS 2008',
  examples: [
    [{ path: [1, 0, 1, 0], decorated: [2] }, 1],
    [{ path: [1, 1, 0, 1, 0, 0], decorated: [3] }, 1],
    [{ path: [1, 0, 1, 0, 1, 0], decorated: [2, 3] }, 3],
  ],
  compute: (p) => dyckBounce.compute(p.path),
};
