/**
 * Targets in n and k read as slices of joint distributions: f(n,k) = Σ q^{a(x)} over the
 * objects x of a family of size n whose second statistic b(x) equals k + c (c = −1, 0, 1),
 * either statistic of a stored pair serving as the weight. The joint tables at the anchor are
 * compared as stored text (thousands of them); a table that gives the anchor is then checked
 * at every entry through rows read with their hashes.
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

/** The same slice of a stored table ([i][j] = q^i t^j), as text of its coefficients without trailing zeros. */
function sliceText(table: unknown, j: number, weightOnQ: boolean): string {
  if (!Array.isArray(table)) return '';
  const rows = table.map((r) => (Array.isArray(r) ? r : [r]));
  const out = weightOnQ ? rows.map((r) => r[j] ?? 0) : (rows[j] ?? []);
  let end = out.length;
  while (end > 0 && (out[end - 1] === 0 || out[end - 1] === '0')) end--;
  return out.slice(0, end).map(String).join(',');
}

/** The joint tables at a size, read once per search (every variant of the target looks at them). */
export type JointTables = (n: number) => readonly { family: string; statistics: string; transform: string; table: unknown }[];

export function jointTables(cat: Catalogue): JointTables {
  const memo = new Map<number, { family: string; statistics: string; transform: string; table: unknown }[]>();
  return (n) => {
    let hit = memo.get(n);
    if (!hit) {
      hit = cat.jointTextsAt(n).flatMap((t) => {
        try {
          return [{ family: t.family, statistics: t.statistics, transform: t.transform, table: JSON.parse(t.series) as unknown }];
        } catch {
          return []; // read again (and reported as damaged) only if it were used
        }
      });
      memo.set(n, hit);
    }
    return hit;
  };
}

export function sliceMatches(cat: Catalogue, anchor: TargetEntry, entries: readonly TargetEntry[], variant: string, tables: JointTables = jointTables(cat)): SearchMatch[] {
  if (anchor.k === undefined || anchor.series.kind !== 'q') return [];
  const want = anchor.series.poly.toQArray().map(String).join(',');
  const out: SearchMatch[] = [];
  for (const text of tables(anchor.n)) {
    const table = text.table;
    for (const weightOnQ of [true, false]) {
      for (const c of [0, -1, 1]) {
        if (anchor.k + c < 0 || sliceText(table, anchor.k + c, weightOnQ) !== want) continue;
        const m = verifySlice(cat, text, weightOnQ, c, entries, variant);
        if (m) out.push(m);
      }
    }
  }
  return out;
}

function verifySlice(cat: Catalogue, row: { family: string; statistics: string; transform: string }, weightOnQ: boolean, c: number, entries: readonly TargetEntry[], variant: string): SearchMatch | undefined {
  const verified: { n: number; k?: number }[] = [];
  const unchecked: { n: number; k?: number }[] = [];
  const cache = new Map<number, StoredRow | undefined>();
  for (const e of entries) {
    if (!cache.has(e.n)) cache.set(e.n, cat.find(row.family, { n: e.n }, row.statistics, 'joint', row.transform));
    const r = cache.get(e.n);
    const place = { n: e.n, ...(e.k === undefined ? {} : { k: e.k }) };
    if (!r || r.series.kind === 'schur' || r.series.kind === 'multi') {
      unchecked.push(place);
      continue;
    }
    if (!seriesEquals(qtSeries(slice(r.series.poly, (e.k ?? 0) + c, weightOnQ)), e.series)) return undefined;
    verified.push(place);
  }
  const held = entries.filter((e) => e.n <= cat.maxN()).length;
  if (verified.length < Math.min(2, entries.length) || 2 * verified.length < held) return undefined;
  const stats = row.statistics.split(',');
  const [w, s] = weightOnQ ? stats : [stats[1]!, stats[0]!];
  const kText = c === 0 ? 'k' : c > 0 ? `k+${c}` : `k${c}`;
  return {
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
  };
}
