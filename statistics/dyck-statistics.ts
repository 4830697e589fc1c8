/**
 * Statistics on Dyck paths (1 = north, 0 = east, never below the diagonal), following
 * Haglund, "The q,t-Catalan numbers and the space of diagonal harmonics", AMS 2008.
 * Rows are counted bottom to top; a_i (the area sequence) is the number of whole cells
 * between the diagonal and the path in row i.
 */
import { areaSequence } from '../objects/support/dyck.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import type { DyckPath } from '../objects/types.js';

const HAGLUND = 'Haglund, The q,t-Catalan numbers and the space of diagonal harmonics, AMS 2008';

export const dyckArea: Statistic<DyckPath> = {
  id: 'dyck-area',
  family: 'dyck-paths',
  description: 'number of whole cells between the path and the diagonal',
  source: HAGLUND,
  examples: [
    [[], 0],
    [[1, 0, 1, 0], 0],
    [[1, 1, 0, 0], 1],
    [[1, 1, 1, 0, 0, 0], 3],
    [[1, 1, 0, 1, 0, 0], 2],
  ],
  compute(p) {
    let s = 0;
    for (const x of areaSequence(p)) s += x;
    return s;
  },
};

export const dyckDinv: Statistic<DyckPath> = {
  id: 'dyck-dinv',
  family: 'dyck-paths',
  description: 'pairs of rows i < j with a_i = a_j or a_i = a_j + 1',
  source: HAGLUND,
  examples: [
    [[1, 0, 1, 0], 1],
    [[1, 1, 0, 0], 0],
    [[1, 0, 1, 0, 1, 0], 3],
    [[1, 1, 0, 1, 0, 0], 1],
    [[1, 1, 1, 0, 0, 0], 0],
  ],
  compute(p) {
    const a = areaSequence(p);
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

export const dyckBounce: Statistic<DyckPath> = {
  id: 'dyck-bounce',
  family: 'dyck-paths',
  description: 'bounce path from (0,0): sum of n − j over the points (j, j) where it touches the diagonal before (n, n)',
  source: `${HAGLUND} (Haglund's bounce statistic)`,
  examples: [
    [[1, 0, 1, 0], 1],
    [[1, 1, 0, 0], 0],
    [[1, 0, 1, 0, 1, 0], 3],
    [[1, 1, 0, 1, 0, 0], 1],
    [[1, 0, 1, 1, 0, 0], 2],
  ],
  compute(p) {
    const n = p.length >> 1;
    // height[x] = north steps before the (x+1)-th east step (where that east step starts).
    const height = new Int32Array(n);
    let north = 0;
    let east = 0;
    for (const s of p) {
      if (s === 1) north++;
      else height[east++] = north;
    }
    let s = 0;
    // From column x go north to the start of the east step there, then east to (h, h);
    // on a Dyck path h > x, so the walk ends at (n, n).
    for (let x = 0; x < n; ) {
      const h = height[x]!;
      if (h >= n) break;
      s += n - h;
      x = h;
    }
    return s;
  },
};

export const dyckReturns: Statistic<DyckPath> = {
  id: 'dyck-returns',
  family: 'dyck-paths',
  description: 'number of returns to the diagonal after the start (the end included)',
  source: 'standard (Deutsch, "Dyck path enumeration", Discrete Math. 204 (1999))',
  examples: [
    [[], 0],
    [[1, 0, 1, 0], 2],
    [[1, 1, 0, 0], 1],
    [[1, 1, 0, 0, 1, 0], 2],
  ],
  compute(p) {
    let h = 0;
    let s = 0;
    for (const x of p) {
      h += x === 1 ? 1 : -1;
      if (h === 0) s++;
    }
    return s;
  },
};

export const dyckPeaks: Statistic<DyckPath> = {
  id: 'dyck-peaks',
  family: 'dyck-paths',
  description: 'number of north steps followed by an east step (Narayana numbers)',
  source: 'standard (Narayana numbers; Deutsch, Discrete Math. 204 (1999))',
  examples: [
    [[], 0],
    [[1, 0, 1, 0], 2],
    [[1, 1, 0, 0], 1],
    [[1, 1, 0, 1, 0, 0], 2],
  ],
  compute(p) {
    let s = 0;
    for (let i = 1; i < p.length; i++) if (p[i - 1] === 1 && p[i] === 0) s++;
    return s;
  },
};
