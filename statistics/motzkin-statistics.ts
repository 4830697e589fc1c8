/**
 * Statistics on Motzkin paths (1 = up, 0 = level, −1 = down); heights h_0 = 0, …, h_n = 0
 * after each step. Common practice (Donaghey–Shapiro, J. Combin. Theory Ser. A 23 (1977)).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { MotzkinPath } from '../objects/types.js';

const FAMILY = 'motzkin-paths';
const COMMON = 'common practice';

/** Occurrences of the factor (a, b) in the step word. */
function factors(p: MotzkinPath, a: number, b: number): number {
  let s = 0;
  for (let i = 1; i < p.length; i++) if (p[i - 1] === a && p[i] === b) s++;
  return s;
}

/** Σ of f(step, height before, height after) over the steps. */
function sumSteps(p: MotzkinPath, f: (s: number, before: number, after: number) => number): number {
  let h = 0;
  let total = 0;
  for (const s of p) {
    total += f(s, h, h + s);
    h += s;
  }
  return total;
}

export const motzkinUpSteps: Statistic<MotzkinPath> = {
  id: 'motzkin-up-steps',
  family: FAMILY,
  description: 'number of up steps',
  source: `${COMMON} (C(n,2k)·Cat(k) paths with k of them)`,
  examples: [
    [[], 0],
    [[1, 0, -1], 1],
    [[1, 1, -1, -1, 0], 2],
  ],
  compute: (p) => p.filter((s) => s === 1).length,
};

export const motzkinLevelSteps: Statistic<MotzkinPath> = {
  id: 'motzkin-level-steps',
  family: FAMILY,
  description: 'number of level steps',
  source: COMMON,
  examples: [
    [[0, 0], 2],
    [[1, 0, -1], 1],
    [[1, -1], 0],
  ],
  compute: (p) => p.filter((s) => s === 0).length,
};

export const motzkinGroundLevels: Statistic<MotzkinPath> = {
  id: 'motzkin-ground-levels',
  family: FAMILY,
  description: 'number of level steps at height 0',
  source: `${COMMON} (none: the Riordan numbers)`,
  examples: [
    [[0, 0], 2],
    [[1, 0, -1], 0],
    [[0, 1, -1, 0], 2],
  ],
  compute: (p) => sumSteps(p, (s, b) => (s === 0 && b === 0 ? 1 : 0)),
};

export const motzkinPeaks: Statistic<MotzkinPath> = {
  id: 'motzkin-peaks',
  family: FAMILY,
  description: 'number of up steps followed directly by a down step',
  source: COMMON,
  examples: [
    [[1, -1, 1, -1], 2],
    [[1, 0, -1], 0],
    [[1, 1, -1, -1], 1],
  ],
  compute: (p) => factors(p, 1, -1),
};

export const motzkinValleys: Statistic<MotzkinPath> = {
  id: 'motzkin-valleys',
  family: FAMILY,
  description: 'number of down steps followed directly by an up step',
  source: COMMON,
  examples: [
    [[1, -1, 1, -1], 1],
    [[1, 1, -1, 1, -1, -1], 1],
    [[1, -1, 0, 1, -1], 0],
  ],
  compute: (p) => factors(p, -1, 1),
};

export const motzkinDoubleRises: Statistic<MotzkinPath> = {
  id: 'motzkin-double-rises',
  family: FAMILY,
  description: 'number of up steps followed directly by an up step',
  source: COMMON,
  examples: [
    [[1, 1, -1, -1], 1],
    [[1, 1, 1, -1, -1, -1], 2],
    [[1, 0, 1, -1, -1], 0],
  ],
  compute: (p) => factors(p, 1, 1),
};

export const motzkinReturns: Statistic<MotzkinPath> = {
  id: 'motzkin-returns',
  family: FAMILY,
  description: 'number of down steps ending at height 0',
  source: COMMON,
  examples: [
    [[0, 0], 0],
    [[1, -1, 1, -1], 2],
    [[1, 1, -1, -1, 0], 1],
  ],
  compute: (p) => sumSteps(p, (s, _b, a) => (s === -1 && a === 0 ? 1 : 0)),
};

export const motzkinHeight: Statistic<MotzkinPath> = {
  id: 'motzkin-height',
  family: FAMILY,
  description: 'largest height reached',
  source: COMMON,
  examples: [
    [[0, 0], 0],
    [[1, 0, -1], 1],
    [[1, 1, -1, 1, -1, -1], 2],
  ],
  compute(p) {
    let h = 0;
    let m = 0;
    for (const s of p) m = Math.max(m, (h += s));
    return m;
  },
};

export const motzkinArea: Statistic<MotzkinPath> = {
  id: 'motzkin-area',
  family: FAMILY,
  description: 'area between the path and the axis (Σ of the heights after each step)',
  source: COMMON,
  examples: [
    [[0, 0], 0],
    [[1, 0, -1], 2],
    [[1, 1, -1, -1], 4],
  ],
  compute: (p) => sumSteps(p, (_s, _b, a) => a),
};

export const motzkinLeadingLevels: Statistic<MotzkinPath> = {
  id: 'motzkin-leading-levels',
  family: FAMILY,
  description: 'number of level steps before the first up step',
  source: COMMON,
  examples: [
    [[0, 0], 2],
    [[0, 1, -1, 0], 1],
    [[1, 0, -1], 0],
  ],
  compute(p) {
    let i = 0;
    while (i < p.length && p[i] === 0) i++;
    return i;
  },
};

export const motzkinLevelRuns: Statistic<MotzkinPath> = {
  id: 'motzkin-level-runs',
  family: FAMILY,
  description: 'number of maximal runs of consecutive level steps',
  source: COMMON,
  examples: [
    [[0, 0], 1],
    [[0, 1, -1, 0], 2],
    [[1, -1], 0],
  ],
  compute(p) {
    let s = 0;
    for (let i = 0; i < p.length; i++) if (p[i] === 0 && p[i - 1] !== 0) s++;
    return s;
  },
};

export const motzkinFirstReturn: Statistic<MotzkinPath> = {
  id: 'motzkin-first-return',
  family: FAMILY,
  description: 'length of the shortest non-empty prefix ending at height 0 (0 for the empty path)',
  source: COMMON,
  examples: [
    [[], 0],
    [[0, 0], 1],
    [[1, 0, -1], 3],
    [[1, -1, 1, -1], 2],
  ],
  compute(p) {
    let h = 0;
    for (let i = 0; i < p.length; i++) if ((h += p[i]!) === 0) return i + 1;
    return 0;
  },
};
