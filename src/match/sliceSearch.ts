/**
 * Targets in n and k read as slices of joint distributions: f(n,k) = Σ q^{a(x)} over the
 * objects x of a family of size n whose second statistic b(x) equals k + c (c = −1, 0, 1),
 * either statistic of a stored pair serving as the weight.
 */
import { Poly } from '../core/poly.js';
import type { Catalogue, StoredRow } from '../store/catalogue.js';
import { qtSeries, seriesEquals } from '../series/series.js';
import { rangeText, type TargetEntry } from '../series/target.js';
import type { SearchMatch } from './searchTypes.js';

/** The coefficient of t^j (weight on q) or of q^j (weight on t, read back in q). */
function slice(p: Poly, j: number, weightOnQ: boolean): Poly {
  const terms: [number, number, bigint][] = [];
  for (const [a, b, c] of p.terms()) {
    if (weightOnQ && b === j) terms.push([a, 0, c]);
    if (!weightOnQ && a === j) terms.push([b, 0, c]);
  }
  return Poly.fromTerms(terms);
}

export function sliceMatches(cat: Catalogue, anchor: TargetEntry, entries: readonly TargetEntry[], variant: string): SearchMatch[] {
  if (anchor.k === undefined || (anchor.series.kind !== 'q' && anchor.series.kind !== 'qt')) return [];
  const out: SearchMatch[] = [];
  const rows = cat.jointRowsAt(anchor.n);
  for (const row of rows) {
    if (row.series.kind !== 'qt') continue;
    for (const weightOnQ of [true, false]) {
      for (const c of [0, -1, 1]) {
        if (!seriesEquals(qtSeries(slice(row.series.poly, anchor.k + c, weightOnQ)), anchor.series)) continue;
        const verified: { n: number; k?: number }[] = [];
        const unchecked: { n: number; k?: number }[] = [];
        let ok = true;
        const cache = new Map<number, StoredRow | undefined>();
        for (const e of entries) {
          if (!cache.has(e.n)) cache.set(e.n, cat.find(row.family, { n: e.n }, row.statistics.join(','), 'joint', row.transform));
          const r = cache.get(e.n);
          const place = { n: e.n, ...(e.k === undefined ? {} : { k: e.k }) };
          if (!r || r.series.kind === 'schur' || r.series.kind === 'multi') {
            unchecked.push(place);
            continue;
          }
          if (!seriesEquals(qtSeries(slice(r.series.poly, (e.k ?? 0) + c, weightOnQ)), e.series)) {
            ok = false;
            break;
          }
          verified.push(place);
        }
        const held = entries.filter((e) => e.n <= cat.maxN()).length;
        if (!ok || verified.length < Math.min(2, entries.length) || 2 * verified.length < held) continue;
        const [w, s] = weightOnQ ? row.statistics : [row.statistics[1]!, row.statistics[0]!];
        const kText = c === 0 ? 'k' : c > 0 ? `k+${c}` : `k${c}`;
        out.push({
          family: row.family,
          statistics: [w!, s!],
          combine: 'slice',
          transform: row.transform,
          variant,
          mapping: `n ↦ n, k ↦ ${s}(x) = ${kText}`,
          formula: `Σ_{x ∈ ${row.family}(n), ${s}(x) = ${kText}} q^{${w}(x)}`,
          verified: rangeText(verified),
          verifiedEntries: verified,
          unchecked,
          complete: unchecked.length === 0,
          cost: 1.5 + (row.transform ? 1 : 0) + (variant === 'as-given' ? 0 : 1) + (c === 0 ? 0 : 0.5),
        });
      }
    }
  }
  return out;
}
