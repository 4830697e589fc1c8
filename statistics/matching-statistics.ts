/**
 * Statistics on perfect matchings of [2n] (partner arrays). Two arcs (a, b), (c, d) with
 * a < c cross when a < c < b < d, nest when a < c < d < b, and are aligned when b < c;
 * crossings + nestings + alignments = C(n, 2). Crossings and nestings have a symmetric joint
 * distribution (Chen–Deng–Du–Stanley–Yan, "Crossings and nestings of matchings and
 * partitions", Trans. Amer. Math. Soc. 359 (2007); Kasraoui–Zeng, Electron. J. Combin. 13
 * (2006)); crossings are q-counted by the Touchard–Riordan formula (Riordan, Math. Comp. 29 (1975)).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { PerfectMatching } from '../objects/types.js';

const CDDSY = 'Chen–Deng–Du–Stanley–Yan, Trans. Amer. Math. Soc. 359 (2007)';

/** Counts pairs of arcs (a, b), (c, d) with a < c by their relative position. */
function arcPairs(m: PerfectMatching, kind: 'cross' | 'nest' | 'align'): number {
  let s = 0;
  for (let a = 1; a <= m.length; a++) {
    const b = m[a - 1]!;
    if (b < a) continue;
    for (let c = a + 1; c <= m.length; c++) {
      const d = m[c - 1]!;
      if (d < c) continue;
      const rel = c > b ? 'align' : d > b ? 'cross' : 'nest';
      if (rel === kind) s++;
    }
  }
  return s;
}

// Examples: [3,4,1,2] = (1,3)(2,4); [4,3,2,1] = (1,4)(2,3); [4,3,2,1,6,5] = (1,4)(2,3)(5,6); [3,5,1,6,2,4] = (1,3)(2,5)(4,6).

export const matchingCrossings: Statistic<PerfectMatching> = {
  id: 'matching-crossings',
  family: 'perfect-matchings',
  description: 'pairs of arcs (a, b), (c, d) with a < c < b < d',
  source: `${CDDSY}; Touchard (1952), Riordan, Math. Comp. 29 (1975) (q-count of crossings)`,
  examples: [[[], 0], [[2, 1], 0], [[3, 4, 1, 2], 1], [[4, 3, 2, 1], 0], [[3, 5, 1, 6, 2, 4], 2]],
  compute: (m) => arcPairs(m, 'cross'),
};

export const matchingNestings: Statistic<PerfectMatching> = {
  id: 'matching-nestings',
  family: 'perfect-matchings',
  description: 'pairs of arcs (a, b), (c, d) with a < c < d < b',
  source: CDDSY,
  examples: [[[], 0], [[2, 1], 0], [[3, 4, 1, 2], 0], [[4, 3, 2, 1], 1], [[4, 3, 2, 1, 6, 5], 1]],
  compute: (m) => arcPairs(m, 'nest'),
};

export const matchingAlignments: Statistic<PerfectMatching> = {
  id: 'matching-alignments',
  family: 'perfect-matchings',
  description: 'pairs of arcs (a, b), (c, d) with b < c (one wholly left of the other)',
  source: 'Kasraoui–Zeng, Electron. J. Combin. 13 (2006) (alignments, from memory); common practice',
  examples: [[[], 0], [[2, 1, 4, 3], 1], [[3, 4, 1, 2], 0], [[4, 3, 2, 1, 6, 5], 2], [[3, 5, 1, 6, 2, 4], 1]],
  compute: (m) => arcPairs(m, 'align'),
};

export const matchingShortArcs: Statistic<PerfectMatching> = {
  id: 'matching-short-arcs',
  family: 'perfect-matchings',
  description: 'arcs joining neighbours i and i + 1',
  source: 'common practice (short pairs; Stanley, EC1 §2.2 exercises, from memory)',
  examples: [[[], 0], [[2, 1], 1], [[2, 1, 4, 3], 2], [[3, 4, 1, 2], 0], [[4, 3, 2, 1, 6, 5], 2]],
  compute: (m) => m.reduce((s, b, i) => (b === i + 2 ? s + 1 : s), 0),
};

export const matchingComponents: Statistic<PerfectMatching> = {
  id: 'matching-components',
  family: 'perfect-matchings',
  description: 'number of blocks: the i such that the points 1..i are matched among themselves (i ≥ 1)',
  source: 'common practice (irreducible decomposition; returns of the associated path)',
  examples: [[[], 0], [[2, 1], 1], [[2, 1, 4, 3], 2], [[3, 4, 1, 2], 1], [[4, 3, 2, 1, 6, 5], 2]],
  compute(m) {
    let s = 0;
    let far = 0;
    m.forEach((b, i) => {
      far = Math.max(far, b);
      if (far === i + 1) s++;
    });
    return s;
  },
};

export const matchingFirstArcLength: Statistic<PerfectMatching> = {
  id: 'matching-first-arc-length',
  family: 'perfect-matchings',
  description: 'partner of 1 minus 1 (uniform on 1..2n−1 for n ≥ 1; 0 for the empty matching)',
  source: 'common practice',
  examples: [[[], 0], [[2, 1], 1], [[3, 4, 1, 2], 2], [[4, 3, 2, 1], 3], [[3, 5, 1, 6, 2, 4], 2]],
  compute: (m) => (m.length === 0 ? 0 : m[0]! - 1),
};

export const matchingOuterArcs: Statistic<PerfectMatching> = {
  id: 'matching-outer-arcs',
  family: 'perfect-matchings',
  description: 'arcs (a, b) not nested under another arc (no arc (c, d) with c < a < b < d)',
  source: 'common practice (outer arcs of an arc diagram)',
  examples: [[[], 0], [[2, 1], 1], [[3, 4, 1, 2], 2], [[4, 3, 2, 1], 1], [[4, 3, 2, 1, 6, 5], 2], [[3, 5, 1, 6, 2, 4], 3]],
  compute(m) {
    let s = 0;
    for (let a = 1; a <= m.length; a++) {
      const b = m[a - 1]!;
      if (b < a) continue;
      let covered = false;
      for (let c = 1; c < a && !covered; c++) covered = m[c - 1]! > b;
      if (!covered) s++;
    }
    return s;
  },
};
