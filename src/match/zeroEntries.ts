/** Zero entries of a target: a marked union's slices where nothing lives (they agree with an absent value). */
import type { Series } from '../series/series.js';

export function isZeroSeries(s: Series): boolean {
  if (s.kind === 'q' || s.kind === 'qt') return s.poly.isZero();
  return s.terms.size === 0;
}
