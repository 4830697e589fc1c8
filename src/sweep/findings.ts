/**
 * What a sweep reports about a seed, most remarkable first: a closed Frobenius expression,
 * a product of q-integers (then a quotient of such products, as a q-binomial), a named q-analog, a statistic with the same distribution,
 * a recurrence, a dimension formula in n, Schur positivity that the module structure does not
 * give, the ω half-turn symmetry, another seed with the same series, a symmetric or unimodal
 * table. Every finding says what was compared and on which places.
 */
import { rangeText } from '../series/target.js';
import type { Place } from './plan.js';

export const FINDING_KINDS = ['expression', 'product', 'quotient', 'q-analog', 'statistic', 'recurrence', 'dimension', 'schur-unimodal', 'omega-symmetry', 'isomorphism', 'symmetric', 'unimodal'] as const;
export type FindingKind = (typeof FINDING_KINDS)[number];

/** The order of the ranking: a seed's findings are compared kind by kind from the heaviest. */
export const FINDING_WEIGHT: Readonly<Record<FindingKind, number>> = {
  expression: 100,
  product: 90,
  quotient: 88,
  'q-analog': 85,
  statistic: 80,
  recurrence: 70,
  dimension: 60,
  'schur-unimodal': 45,
  'omega-symmetry': 40,
  isomorphism: 35,
  symmetric: 20,
  unimodal: 10,
};

export interface SweepFinding {
  readonly kind: FindingKind;
  /** The statement, e.g. "Hilbert series by x-degree = [n]_q!". */
  readonly claim: string;
  /** How it was checked, e.g. "exact equality of every coefficient (modules confirmed by two primes)". */
  readonly verified: string;
  /** Where it was checked. */
  readonly places: readonly Place[];
}

export function finding(kind: FindingKind, claim: string, verified: string, places: readonly Place[]): SweepFinding {
  return { kind, claim, verified, places: places.map((p) => ({ n: p.n, ...(p.k !== undefined ? { k: p.k } : {}) })) };
}

/** "n = 3..5, all k" for a finding's places. */
export function placesText(places: readonly Place[]): string {
  return rangeText(places);
}

/** Heaviest first, then by kind order. */
export function sortFindings(list: readonly SweepFinding[]): SweepFinding[] {
  return [...list].sort((a, b) => FINDING_WEIGHT[b.kind] - FINDING_WEIGHT[a.kind]);
}
