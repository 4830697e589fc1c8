/**
 * Descent statistics of skew standard tableaux: i is a descent when i + 1 lies in a lower
 * row (Stanley, EC2 §7.19: Σ_T F_{Des T} = s_{λ/μ}); the rest are common practice.
 */
import { rowsOfEntries } from '../objects/support/skew.js';
import type { Statistic } from '../src/enumerate/plugin.js';
import type { SkewTableau } from '../objects/types.js';

const FAMILY = 'skew-standard-tableaux';
const EC2 = 'Stanley, EC2 §7.19 (descents of standard tableaux)';

/** The descents i (1-based) of the tableau. */
function descents(t: SkewTableau): number[] {
  const row = rowsOfEntries(t);
  const out: number[] = [];
  for (let i = 1; i < row.length; i++) if (row[i]! > row[i - 1]!) out.push(i);
  return out;
}

const T1: SkewTableau = { outer: [2, 1], inner: [1], rows: [[1], [2]] };
const T2: SkewTableau = { outer: [2, 1], inner: [1], rows: [[2], [1]] };
const T3: SkewTableau = { outer: [3, 2], inner: [1], rows: [[1, 3], [2, 4]] };
const T4: SkewTableau = { outer: [3, 3, 1], inner: [2, 1], rows: [[2], [1, 4], [3]] };
const T5: SkewTableau = { outer: [2, 2, 1], inner: [1, 1], rows: [[1], [2], [3]] };

export const skewDescents: Statistic<SkewTableau> = {
  id: 'skew-descents',
  family: FAMILY,
  description: 'number of i with i + 1 in a lower row than i',
  source: EC2,
  examples: [
    [T1, 1],
    [T2, 0],
    [T3, 2],
    [T4, 1],
    [T5, 2],
  ],
  compute: (t) => descents(t).length,
};

export const skewMajorIndex: Statistic<SkewTableau> = {
  id: 'skew-major-index',
  family: FAMILY,
  description: 'sum of the descents i (i + 1 in a lower row)',
  source: EC2,
  examples: [
    [T1, 1],
    [T2, 0],
    [T3, 4],
    [T4, 2],
    [T5, 3],
  ],
  compute: (t) => descents(t).reduce((a, b) => a + b, 0),
};

export const skewComajor: Statistic<SkewTableau> = {
  id: 'skew-comajor',
  family: FAMILY,
  description: 'sum of n − i over the descents i',
  source: 'common practice',
  examples: [
    [T1, 1],
    [T2, 0],
    [T3, 4],
    [T4, 2],
    [T5, 3],
  ],
  compute(t) {
    const n = t.rows.reduce((s, r) => s + r.length, 0);
    return descents(t).reduce((a, i) => a + n - i, 0);
  },
};

export const skewPeaks: Statistic<SkewTableau> = {
  id: 'skew-peaks',
  family: FAMILY,
  description: 'number of descents i ≥ 2 with i − 1 not a descent',
  source: 'common practice (peaks of the descent set)',
  examples: [
    [T1, 0],
    [T3, 1],
    [T4, 1],
    [T5, 0],
  ],
  compute(t) {
    const d = new Set(descents(t));
    let s = 0;
    for (const i of d) if (i >= 2 && !d.has(i - 1)) s++;
    return s;
  },
};

export const skewDoubleDescents: Statistic<SkewTableau> = {
  id: 'skew-double-descents',
  family: FAMILY,
  description: 'number of i with i and i + 1 both descents (i, i + 1, i + 2 in strictly lower rows)',
  source: 'common practice',
  examples: [
    [T3, 0],
    [T4, 0],
    [T5, 1],
    [{ outer: [1, 1, 1], inner: [], rows: [[1], [2], [3]] }, 1],
  ],
  compute(t) {
    const d = new Set(descents(t));
    let s = 0;
    for (const i of d) if (d.has(i + 1)) s++;
    return s;
  },
};

export const skewRowOfLargest: Statistic<SkewTableau> = {
  id: 'skew-row-of-largest',
  family: FAMILY,
  description: 'the row (1 = top) holding the largest entry n; 0 for the empty tableau',
  source: 'common practice',
  examples: [
    [T1, 2],
    [T2, 1],
    [T4, 2],
  ],
  compute(t) {
    const row = rowsOfEntries(t);
    return row.length === 0 ? 0 : row[row.length - 1]! + 1;
  },
};

export const skewFirstDescent: Statistic<SkewTableau> = {
  id: 'skew-first-descent',
  family: FAMILY,
  description: 'the smallest descent (0 when there is none)',
  source: 'common practice',
  examples: [
    [T1, 1],
    [T2, 0],
    [T3, 1],
    [T4, 2],
  ],
  compute: (t) => descents(t)[0] ?? 0,
};

export const skewLastDescent: Statistic<SkewTableau> = {
  id: 'skew-last-descent',
  family: FAMILY,
  description: 'the largest descent (0 when there is none)',
  source: 'common practice',
  examples: [
    [T1, 1],
    [T2, 0],
    [T3, 3],
    [T4, 2],
  ],
  compute: (t) => descents(t).pop() ?? 0,
};
