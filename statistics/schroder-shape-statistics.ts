/** Step and shape statistics on Schröder paths (1 = north, 0 = east, 2 = diagonal); common practice. */
import { schroderRows } from '../objects/support/schroder.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import type { SchroderPath } from '../objects/types.js';

const FAMILY = 'schroder-paths';

/** Occurrences of the factor (a, b) in the step word. */
function factors(p: SchroderPath, a: number, b: number): number {
  let s = 0;
  for (let i = 1; i < p.length; i++) if (p[i - 1] === a && p[i] === b) s++;
  return s;
}

export const schroderDiagonals: Statistic<SchroderPath> = {
  id: 'schroder-diagonal-steps',
  family: FAMILY,
  description: 'number of diagonal steps',
  source: 'common practice (the d of ⟨∇e_n, e_{n−d}h_d⟩, Haglund AMS 2008 ch. 4)',
  examples: [
    [[1, 0, 2], 1],
    [[2, 2], 2],
    [[1, 1, 0, 0], 0],
  ],
  compute: (p) => p.filter((s) => s === 2).length,
};

export const schroderPeaks: Statistic<SchroderPath> = {
  id: 'schroder-peaks',
  family: FAMILY,
  description: 'number of north steps followed directly by an east step',
  source: 'common practice',
  examples: [
    [[1, 0, 2], 1],
    [[1, 2, 0], 0],
    [[1, 0, 1, 0], 2],
  ],
  compute: (p) => factors(p, 1, 0),
};

export const schroderValleys: Statistic<SchroderPath> = {
  id: 'schroder-valleys',
  family: FAMILY,
  description: 'number of east steps followed directly by a north step',
  source: 'common practice',
  examples: [
    [[1, 0, 1, 0], 1],
    [[1, 0, 2], 0],
    [[1, 1, 0, 1, 0, 0], 1],
  ],
  compute: (p) => factors(p, 0, 1),
};

export const schroderReturns: Statistic<SchroderPath> = {
  id: 'schroder-returns',
  family: FAMILY,
  description: 'number of lattice points of the diagonal the path reaches after its start (the end included)',
  source: 'common practice',
  examples: [
    [[1, 0, 2], 2],
    [[1, 2, 0], 1],
    [[2, 1, 0], 2],
    [[2, 2], 2],
  ],
  compute(p) {
    let h = 0;
    let s = 0;
    for (const x of p) {
      if (x === 1) h++;
      else if (x === 0) h--;
      if (h === 0) s++;
    }
    return s;
  },
};

export const schroderDiagonalsOnLine: Statistic<SchroderPath> = {
  id: 'schroder-diagonals-on-line',
  family: FAMILY,
  description: 'number of diagonal steps lying on the main diagonal',
  source: 'common practice',
  examples: [
    [[1, 0, 2], 1],
    [[1, 2, 0], 0],
    [[2, 2], 2],
  ],
  compute(p) {
    let h = 0;
    let s = 0;
    for (const x of p) {
      if (x === 2 && h === 0) s++;
      if (x === 1) h++;
      else if (x === 0) h--;
    }
    return s;
  },
};

export const schroderHeight: Statistic<SchroderPath> = {
  id: 'schroder-height',
  family: FAMILY,
  description: 'largest a_r (lower triangles in one row between the path and the diagonal)',
  source: 'common practice',
  examples: [
    [[1, 1, 2, 0, 0], 2],
    [[1, 2, 0], 1],
    [[2, 2], 0],
  ],
  compute: (p) => schroderRows(p).area.reduce((m, x) => Math.max(m, x), 0),
};

export const schroderInitialRise: Statistic<SchroderPath> = {
  id: 'schroder-initial-rise',
  family: FAMILY,
  description: 'number of north steps before the first east or diagonal step',
  source: 'common practice',
  examples: [
    [[1, 1, 2, 0, 0], 2],
    [[2, 1, 0], 0],
    [[1, 0, 2], 1],
  ],
  compute(p) {
    let i = 0;
    while (i < p.length && p[i] === 1) i++;
    return i;
  },
};

export const schroderDoubleRises: Statistic<SchroderPath> = {
  id: 'schroder-double-rises',
  family: FAMILY,
  description: 'number of north steps followed directly by a north step',
  source: 'common practice',
  examples: [
    [[1, 1, 0, 0], 1],
    [[1, 1, 1, 0, 0, 0], 2],
    [[1, 0, 2], 0],
  ],
  compute: (p) => factors(p, 1, 1),
};

export const schroderFirstReturn: Statistic<SchroderPath> = {
  id: 'schroder-first-return',
  family: FAMILY,
  description: 'x-coordinate of the first point of the diagonal reached after the start (0 for the empty path)',
  source: 'common practice',
  examples: [
    [[], 0],
    [[1, 0, 2], 1],
    [[2, 1, 0], 1],
    [[1, 2, 0], 2],
  ],
  compute(p) {
    let x = 0;
    let y = 0;
    for (const s of p) {
      if (s !== 1) x++;
      if (s !== 0) y++;
      if (x === y) return x;
    }
    return 0;
  },
};
