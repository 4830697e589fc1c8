/**
 * Search the catalogue for distributions (and expressions of the library) equal to a target.
 * For each variant of the target, the anchor entry (largest n held in the catalogue) is looked
 * up by its exact hash; every row found gives candidates (group × parameter mapping) that are
 * then checked on every entry of the target. A target over n with a second grading is also
 * read as a marked union Σ_k t^{n−k} F(n, k) and searched again as a family over (n, k).
 */
import type { Catalogue, MatchCombine, StoredRow } from '../store/catalogue.js';
import { seriesHash } from '../store/seriesHash.js';
import { seriesAtOne, seriesEquals, type SeriesKind } from '../series/series.js';
import { rangeText, type Target, type TargetEntry } from '../series/target.js';
import { candidateFormula } from './candidateFormula.js';
import { chooseAnchor as expressionAnchor, searchExpressions } from './expressionSearch.js';
import { frobeniusSliceIndex, frobeniusSliceMatches } from './frobeniusSlices.js';
import { markedReading } from './markedReading.js';
import { applyMapping, mappingCost, mappingsFor, type Mapping } from './parameterMapping.js';
import { jointTables, sliceMatches } from './sliceSearch.js';
import type { ExpressionMatch, SearchMatch, SearchOutcome, SearchTried } from './searchTypes.js';
import { variantsOf } from './variants.js';
import { isZeroSeries } from './zeroEntries.js';

export type { ExpressionMatch, SearchMatch, SearchOutcome, SearchTried } from './searchTypes.js';

const COMBINE_COST: Record<MatchCombine, number> = {
  single: 0, shape: 0, joint: 1, fundamental: 1, ifundamental: 1.5, content: 1, sum: 2, slice: 1.5,
  'shape-t0': 1.5, 'fundamental-t0': 1.5, 'ifundamental-t0': 2, 'content-t0': 1.5,
};
/** A match of the marked reading costs this much more than one of the target as it is. */
const MARKED_COST = 1;

function kindsFor(kind: SeriesKind): SeriesKind[] {
  return kind === 'schur' ? ['schur'] : kind === 'multi' ? ['multi'] : ['q', 'qt'];
}

function chooseAnchor(entries: readonly TargetEntry[], maxN: number): TargetEntry | undefined {
  const held = entries.filter((e) => e.n <= maxN);
  if (held.length === 0) return undefined;
  const n = Math.max(...held.map((e) => e.n));
  // the richest entry there (largest count at q = 1), then k nearest n/2
  const atN = held.filter((e) => e.n === n).map((e) => ({ e, c: seriesAtOne(e.series) }));
  atN.sort((a, b) => (b.c > a.c ? 1 : b.c < a.c ? -1 : 0) || Math.abs((a.e.k ?? 0) - n / 2) - Math.abs((b.e.k ?? 0) - n / 2));
  return atN[0]?.e;
}

const byQuality = <M extends { complete: boolean; verifiedEntries: readonly unknown[]; cost: number; family: string }>(a: M, b: M): number =>
  Number(b.complete) - Number(a.complete) || b.verifiedEntries.length - a.verifiedEntries.length || a.cost - b.cost || a.family.localeCompare(b.family);

export function searchCatalogue(cat: Catalogue, target: Target): SearchOutcome {
  const main = searchOnce(cat, target);
  const reading = markedReading(target);
  if (!reading) return main;
  const marked = searchOnce(cat, reading.target);
  const mark = <M extends { cost: number }>(m: M): M & { marker: string } => ({ ...m, cost: m.cost + MARKED_COST, marker: reading.marker });
  return {
    matches: [...main.matches, ...marked.matches.map(mark)].sort((a, b) => byQuality(a, b) || a.statistics.join().localeCompare(b.statistics.join())),
    expressions: [...main.expressions, ...marked.expressions.map(mark)].sort(byQuality),
    tried: { ...main.tried, readings: [`as a marked union Σ_k ${reading.marker}·F(n, k) (entries k = 0..n, zero ones included)`] },
  };
}

function searchOnce(cat: Catalogue, target: Target): SearchOutcome {
  const maxN = cat.maxN();
  const variants = variantsOf(target);
  const anchor0 = chooseAnchor(target.entries, maxN);
  const kinds = kindsFor(target.kind);
  const counts = anchor0 ? cat.candidateCounts(kinds, anchor0.n, seriesAtOne(anchor0.series)) : { groups: 0, sameCount: 0, families: [], statistics: [] };
  const matches = new Map<string, SearchMatch>();
  const exactGroups = new Set<string>();
  const slices = anchor0 && target.kind === 'schur' ? frobeniusSliceIndex(cat, anchor0) : undefined;
  const keep = (m: SearchMatch) => {
    const key = [m.family, m.statistics.join(','), m.combine, m.transform, m.mapping].join('|');
    if (!matches.has(key)) matches.set(key, target.marked ? { ...m, marker: target.marked } : m);
  };
  const tables = jointTables(cat);
  for (const v of variants) {
    const anchor = anchor0 && v.target.entries.find((e) => e.n === anchor0.n && e.k === anchor0.k);
    if (!anchor) continue;
    for (const m of sliceMatches(cat, anchor, v.target.entries, v.id, tables)) keep(m);
    if (slices) for (const m of frobeniusSliceMatches(cat, slices, anchor, v.target.entries, v.id)) keep(m);
    const rows = cat.byHash(seriesHash(anchor.series)).filter((r) => seriesEquals(r.series, anchor.series));
    for (const r of rows) exactGroups.add([r.family, r.statistics.join(','), r.combine, r.transform].join('|'));
    for (const row of rows) {
      for (const m of mappingsFor(anchor, row)) {
        const key = [row.family, row.statistics.join(','), row.combine, row.transform, m.text].join('|');
        if (matches.has(key)) continue;
        const found = verify(cat, row, m, v.target.entries);
        if (!found) continue;
        const cost = COMBINE_COST[row.combine] + (row.transform ? 1 : 0) + (v.id === 'as-given' ? 0 : 1) + mappingCost(m) + found.unchecked.length * 0.01;
        keep({
          family: row.family,
          statistics: row.statistics,
          combine: row.combine,
          transform: row.transform,
          variant: v.id,
          mapping: m.text,
          formula: candidateFormula(row.family, m.lists ? [...m.lists.map((l) => `${l.name} ${l.id}`), ...(m.k ? ['k'] : [])].join(', ') : Object.keys(row.params).sort((a, b) => (a === 'n' ? -1 : b === 'n' ? 1 : a.localeCompare(b))).join(','), row.statistics, row.combine, v.id),
          verified: rangeText(found.verified),
          verifiedEntries: found.verified,
          unchecked: found.unchecked,
          complete: found.unchecked.length === 0,
          cost,
        });
      }
    }
  }
  const sorted = [...matches.values()].sort((a, b) => byQuality(a, b) || a.statistics.join().localeCompare(b.statistics.join()));
  const expr = searchExpressions(cat, variants, (libMaxN) => expressionAnchor(target.entries, libMaxN));
  const expressions: ExpressionMatch[] = target.marked ? expr.matches.map((m) => ({ ...m, marker: target.marked! })) : expr.matches;
  return {
    matches: sorted,
    expressions,
    tried: {
      anchor: anchor0 ? { n: anchor0.n, ...(anchor0.k === undefined ? {} : { k: anchor0.k }) } : null,
      catalogueMaxN: maxN,
      candidates: counts.groups,
      sameCount: counts.sameCount,
      exactAtAnchor: exactGroups.size,
      families: counts.families,
      statistics: counts.statistics,
      variants: variants.map((v) => v.id),
      combines: target.kind === 'schur' ? ['shape', 'fundamental', 'ifundamental', 'content', 'shape-t0', 'fundamental-t0', 'ifundamental-t0', 'content-t0', 'slice at 0'] : ['single', 'sum', 'joint', ...(target.entries.some((e) => e.k !== undefined) ? ['slice'] : [])],
      expressions: { families: expr.families, maxN: expr.maxN },
    },
  };
}

type Place = { n: number; k?: number };

function verify(cat: Catalogue, row: StoredRow, m: Mapping, entries: readonly TargetEntry[]): { verified: Place[]; unchecked: Place[] } | undefined {
  const verified: Place[] = [];
  const unchecked: Place[] = [];
  for (const e of entries) {
    const place: Place = { n: e.n, ...(e.k === undefined ? {} : { k: e.k }) };
    const params = applyMapping(m, e);
    const size = e.n + m.dn;
    const k = params?.['k'];
    const inRange = params !== undefined && size >= 1 && !(typeof k === 'number' && (k < 1 || k > size));
    const r = inRange ? cat.find(row.family, params, row.statistics.join(','), row.combine, row.transform) : undefined;
    if (!r) {
      // a zero entry (a slice of a marked union where nothing lives) agrees with an absent row
      if (!isZeroSeries(e.series)) unchecked.push(place);
      continue;
    }
    if (!seriesEquals(r.series, e.series)) return undefined;
    verified.push(place);
  }
  // at least two entries (or the only one), and at least half of those the catalogue could hold
  const held = entries.filter((e) => e.n <= cat.maxN() && !isZeroSeries(e.series)).length;
  const enough = verified.length >= Math.min(2, entries.length) && 2 * verified.length >= held;
  return enough ? { verified, unchecked } : undefined;
}
