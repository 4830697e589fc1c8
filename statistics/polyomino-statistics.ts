/**
 * Statistics on parallelogram polyominoes (columns [bottom, top) left to right): area, the
 * bounding box, and column profiles (common practice; area and width as in Aval–D'Adderio–
 * Dukes–Hicks–Le Borgne, J. Combin. Theory Ser. A 123 (2014)).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { ParallelogramPolyomino } from '../objects/types.js';

const FAMILY = 'parallelogram-polyominoes';
const ADDHL = "Aval–D'Adderio–Dukes–Hicks–Le Borgne, J. Combin. Theory Ser. A 123 (2014)";
const P1: ParallelogramPolyomino = [[0, 1]];
const P2: ParallelogramPolyomino = [[0, 1], [0, 2]];
const P3: ParallelogramPolyomino = [[0, 2], [1, 3], [1, 3]];

export const polyominoArea: Statistic<ParallelogramPolyomino> = {
  id: 'polyomino-area',
  family: FAMILY,
  description: 'number of cells',
  source: ADDHL,
  examples: [
    [P1, 1],
    [P2, 3],
    [P3, 6],
  ],
  compute: (p) => p.reduce((s, [b, t]) => s + t - b, 0),
};

export const polyominoWidth: Statistic<ParallelogramPolyomino> = {
  id: 'polyomino-width',
  family: FAMILY,
  description: 'number of columns',
  source: `${ADDHL} (Narayana numbers by width)`,
  examples: [
    [P1, 1],
    [P2, 2],
    [P3, 3],
  ],
  compute: (p) => p.length,
};

export const polyominoHeight: Statistic<ParallelogramPolyomino> = {
  id: 'polyomino-height',
  family: FAMILY,
  description: 'number of rows (top of the last column)',
  source: ADDHL,
  examples: [
    [P1, 1],
    [P2, 2],
    [P3, 3],
  ],
  compute: (p) => p[p.length - 1]?.[1] ?? 0,
};

export const polyominoFirstColumn: Statistic<ParallelogramPolyomino> = {
  id: 'polyomino-first-column',
  family: FAMILY,
  description: 'number of cells in the first column',
  source: 'common practice',
  examples: [
    [P1, 1],
    [P2, 1],
    [P3, 2],
  ],
  compute: (p) => (p[0] ? p[0][1] - p[0][0] : 0),
};

export const polyominoLastColumn: Statistic<ParallelogramPolyomino> = {
  id: 'polyomino-last-column',
  family: FAMILY,
  description: 'number of cells in the last column',
  source: 'common practice',
  examples: [
    [P1, 1],
    [P2, 2],
    [P3, 2],
  ],
  compute: (p) => {
    const c = p[p.length - 1];
    return c ? c[1] - c[0] : 0;
  },
};

export const polyominoTopRises: Statistic<ParallelogramPolyomino> = {
  id: 'polyomino-top-rises',
  family: FAMILY,
  description: 'number of columns whose top is higher than the top of the column before',
  source: 'common practice',
  examples: [
    [P1, 0],
    [P2, 1],
    [P3, 1],
  ],
  compute(p) {
    let s = 0;
    for (let i = 1; i < p.length; i++) if (p[i]![1] > p[i - 1]![1]) s++;
    return s;
  },
};

export const polyominoUnitColumns: Statistic<ParallelogramPolyomino> = {
  id: 'polyomino-unit-columns',
  family: FAMILY,
  description: 'number of columns with a single cell',
  source: 'common practice',
  examples: [
    [P1, 1],
    [P2, 1],
    [P3, 0],
  ],
  compute: (p) => p.filter(([b, t]) => t - b === 1).length,
};

export const polyominoBottomRises: Statistic<ParallelogramPolyomino> = {
  id: 'polyomino-bottom-rises',
  family: FAMILY,
  description: 'number of columns whose bottom is higher than the bottom of the column before',
  source: 'common practice',
  examples: [
    [P1, 0],
    [P2, 0],
    [P3, 1],
  ],
  compute(p) {
    let s = 0;
    for (let i = 1; i < p.length; i++) if (p[i]![0] > p[i - 1]![0]) s++;
    return s;
  },
};
