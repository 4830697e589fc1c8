/**
 * Formula recognition for a family of q-series (a target or a matched distribution):
 * a product formula in q-factorials, recurrences with q-integer coefficients, and the
 * palindromic / unimodal flags over all entries.
 */
import { Poly } from '../core/poly.js';
import { hilbertOfSchur } from '../series/series.js';
import { isPalindromic, isUnimodal } from '../series/seriesOps.js';
import type { Target } from '../series/target.js';
import { recogniseFamily, type FamilyFormula, type FamilyPoint } from './familyFormula.js';
import { findRecurrences, type Recurrence } from './recurrence.js';

export interface Recognition {
  readonly formula?: FamilyFormula;
  readonly recurrences: readonly Recurrence[];
  /** Every entry (its graded dimension, for a Frobenius series) is palindromic / unimodal. */
  readonly palindromic: boolean;
  readonly unimodal: boolean;
}

export function pointsOf(t: Target): FamilyPoint[] {
  return t.entries.map((e) => {
    const s = e.series.kind === 'schur' ? hilbertOfSchur(e.series) : e.series;
    const poly = s.kind === 'q' || s.kind === 'qt' ? s.poly : Poly.zero;
    return { n: e.n, ...(e.k === undefined ? {} : { k: e.k }), poly };
  });
}

export function recognise(t: Target): Recognition {
  const points = pointsOf(t);
  const univariate = points.every((p) => p.poly.isUnivariate());
  const formula = univariate ? recogniseFamily(points) : undefined;
  const recurrences = univariate ? findRecurrences(points).slice(0, 3) : [];
  return {
    ...(formula ? { formula } : {}),
    recurrences,
    palindromic: points.every((p) => isPalindromic(p.poly)),
    unimodal: univariate && points.every((p) => isUnimodal(p.poly)),
  };
}
