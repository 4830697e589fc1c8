/**
 * Short texts of a kept sweep shared by the command line, the app and the exports: the counts
 * line, a row's places and dimensions, and the names of finding kinds.
 */
import type { SweepRow } from './analyse.js';
import type { FindingKind } from './findings.js';
import type { SweepDocument } from './sweepDocument.js';
import { rangeText } from '../series/target.js';

export const KIND_LABEL: Readonly<Record<FindingKind, string>> = {
  expression: 'expression',
  product: 'q-product',
  quotient: 'q-quotient',
  'q-analog': 'q-analog',
  statistic: 'statistic',
  recurrence: 'recurrence',
  dimension: 'dimension',
  'schur-unimodal': 'Schur-unimodal',
  'omega-symmetry': 'ω-symmetry',
  isomorphism: 'isomorphic?',
  symmetric: 'symmetric',
  unimodal: 'unimodal',
};

export function countsText(d: SweepDocument): string {
  const c = d.counts;
  return `${c.raw} seeds listed (${c.vanishing} vanish, ${c.duplicates} equal to one listed before up to S_n and scalars${c.undefinedPlaces ? `, ${c.undefinedPlaces} not defined at their place` : ''}) → ${c.modules} distinct modules: ${c.computed} computed, ${c.kept} kept from before${c.skipped ? `, ${c.skipped} skipped` : ''}${c.failed ? `, ${c.failed} FAILED` : ''}`;
}

export function rowPlacesText(r: SweepRow): string {
  return r.places.length ? rangeText(r.places) : 'nothing computed';
}

/** "dim 12" or "dim 1, 2, 6, 24" in the order of the places. */
export function rowDimensionsText(r: SweepRow, max = 8): string {
  const dims = r.places.map((p) => p.dimension);
  return `dim ${dims.slice(0, max).join(', ')}${dims.length > max ? ', …' : ''}`;
}

export function rowKindsText(r: SweepRow): string {
  return [...new Set(r.findings.map((f) => KIND_LABEL[f.kind]))].join(', ') || 'nothing remarkable';
}

export function stateText(d: SweepDocument): string {
  return d.state === 'done' ? 'done' : 'unfinished (run the same command again to finish it)';
}
