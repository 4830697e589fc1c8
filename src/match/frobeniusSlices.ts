/**
 * Frobenius-level slices at 0 of stored pairs: from Σ_x q^{a(x)} t^{b(x)} G(x) (G = s_shape,
 * F_Des or F_iDes of the reading word) the objects with b = 0 give the stored series at t = 0,
 * and those with a = 0 the series at q = 0 (read back in q). So Δ′_{e_{k−1}} e_n at t = 0 is
 * found as the decorated Dyck paths of area 0, weighted by dinv, without storing anything new.
 */
import { Poly } from '../core/poly.js';
import { schurSeries, seriesEquals, type Series } from '../series/series.js';
import { rangeText, type TargetEntry } from '../series/target.js';
import type { Catalogue, StoredRow } from '../store/catalogue.js';
import { seriesHash } from '../store/seriesHash.js';
import { applyMapping, mappingCost, mappingsFor } from './parameterMapping.js';
import type { SearchMatch } from './searchTypes.js';
import { isZeroSeries } from './zeroEntries.js';

type Held = 'first' | 'second';

function sliceAtZero(s: Series, held: Held): Series | undefined {
  if (s.kind !== 'schur') return undefined;
  const f = (p: Poly) => (held === 'second' ? p.specialize({ t: 0 }) : p.specialize({ q: 0 }).swapQT());
  return schurSeries([...s.terms].map(([l, c]) => [l, f(c)] as const));
}

const SYMBOL: Readonly<Record<string, string>> = { shape: 's_{shape(x)}', fundamental: 'F_{Des(word(x))}', ifundamental: 'F_{iDes(word(x))}' };

export interface SliceIndex {
  readonly at: number;
  readonly byHash: Map<string, { row: StoredRow; held: Held }[]>;
}

/**
 * The slices at 0 of the stored Frobenius-level pairs at the anchor's size, by hash (built once
 * per search); for an anchor with k, only the rows a parameter mapping can reach (k ± 1, n − k ± 1).
 */
export function frobeniusSliceIndex(cat: Catalogue, anchor: { n: number; k?: number }): SliceIndex {
  const n = anchor.n;
  const k = anchor.k;
  const ks = k === undefined ? undefined : [...new Set([k - 1, k, k + 1, n - k - 1, n - k, n - k + 1])];
  const byHash = new Map<string, { row: StoredRow; held: Held }[]>();
  for (const row of cat.schurPairRowsAt(n, ks)) {
    for (const held of ['second', 'first'] as const) {
      const s = sliceAtZero(row.series, held);
      if (!s || isZeroSeries(s) || seriesEquals(s, row.series)) continue;
      const h = seriesHash(s);
      byHash.set(h, [...(byHash.get(h) ?? []), { row, held }]);
    }
  }
  return { at: n, byHash };
}

export function frobeniusSliceMatches(cat: Catalogue, index: SliceIndex, anchor: TargetEntry, entries: readonly TargetEntry[], variant: string): SearchMatch[] {
  if (anchor.series.kind !== 'schur' || anchor.n !== index.at) return [];
  const out: SearchMatch[] = [];
  for (const { row, held } of index.byHash.get(seriesHash(anchor.series)) ?? []) {
    if (!seriesEquals(sliceAtZero(row.series, held)!, anchor.series)) continue;
    for (const m of mappingsFor(anchor, row)) {
      const verified: { n: number; k?: number }[] = [];
      const unchecked: { n: number; k?: number }[] = [];
      let ok = true;
      for (const e of entries) {
        const place = { n: e.n, ...(e.k === undefined ? {} : { k: e.k }) };
        const params = applyMapping(m, e);
        const size = e.n + m.dn;
        const k = params?.['k'];
        const inRange = params !== undefined && size >= 1 && !(typeof k === 'number' && (k < 1 || k > size));
        const r = inRange ? cat.find(row.family, params, row.statistics.join(','), row.combine, row.transform) : undefined;
        if (!r) {
          if (!isZeroSeries(e.series)) unchecked.push(place);
          continue;
        }
        const s = sliceAtZero(r.series, held);
        if (!s || !seriesEquals(s, e.series)) {
          ok = false;
          break;
        }
        verified.push(place);
      }
      const heldEntries = entries.filter((e) => e.n <= cat.maxN() && !isZeroSeries(e.series)).length;
      if (!ok || verified.length < Math.min(2, entries.length) || 2 * verified.length < heldEntries) continue;
      const [a, b] = held === 'second' ? row.statistics : [row.statistics[1]!, row.statistics[0]!];
      let formula = `Σ_{x ∈ ${row.family}(${Object.keys(row.params).sort((a, b) => (a === 'n' ? -1 : b === 'n' ? 1 : a.localeCompare(b))).join(',')}), ${b}(x) = 0} q^{${a}(x)} ${SYMBOL[row.combine] ?? ''}`.trim();
      if (variant.includes('q-reversed')) formula = `rev_q(${formula})`;
      if (variant.startsWith('omega')) formula = `ω(${formula})`;
      out.push({
        family: row.family,
        statistics: [a!, b!],
        combine: 'slice',
        transform: row.transform,
        variant,
        mapping: `${m.text}, ${b} = 0 (${row.combine})`,
        formula,
        verified: rangeText(verified),
        verifiedEntries: verified,
        unchecked,
        complete: unchecked.length === 0,
        cost: 1.5 + (row.transform ? 1 : 0) + (variant === 'as-given' ? 0 : 1) + mappingCost(m) + unchecked.length * 0.01,
      });
    }
  }
  return out;
}
