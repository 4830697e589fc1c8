/**
 * Isomorphism candidates: different seeds (different modules, not one seed reached twice)
 * whose modules at the same n have equal Frobenius series — equal graded characters, so
 * isomorphic as graded S_n-modules — or, when S_n does not act, equal Hilbert tables.
 * Grouped by the hash of the series, then compared exactly.
 */
import { Poly } from '../core/poly.js';
import { qtSeries, seriesEquals, type Series } from '../series/series.js';
import { seriesHash } from '../store/seriesHash.js';
import { finding, type SweepFinding } from './findings.js';
import type { ModuleData } from './moduleData.js';
import type { SweepLine } from './plan.js';

export interface IsomorphismGroup {
  readonly n: number;
  /** "Frobenius series" or "Hilbert table". */
  readonly what: string;
  readonly modules: readonly string[];
  /** Lines (seeds) reaching these modules. */
  readonly lines: readonly string[];
}

function seriesOf(d: ModuleData): { what: string; series: Series } {
  if (d.frobenius) return { what: 'Frobenius series', series: d.frobenius };
  return { what: 'Hilbert table', series: qtSeries(d.table ?? d.byX ?? Poly.zero) };
}

export function isomorphismCandidates(lines: readonly SweepLine[], data: ReadonlyMap<string, ModuleData>): { groups: IsomorphismGroup[]; findings: Map<string, SweepFinding[]> } {
  const buckets = new Map<string, { d: ModuleData; series: Series; what: string }[]>();
  for (const d of data.values()) {
    const { what, series } = seriesOf(d);
    const key = `${d.n}|${d.axes.join(',')}|${what}|${seriesHash(series)}`;
    buckets.set(key, [...(buckets.get(key) ?? []), { d, series, what }]);
  }
  const linesOf = new Map<string, string[]>();
  for (const l of lines) for (const p of l.places) linesOf.set(p.key, [...(linesOf.get(p.key) ?? []), l.id]);
  const groups: IsomorphismGroup[] = [];
  const partner = new Map<string, string[]>(); // module key -> the other modules of its group
  for (const bucket of buckets.values()) {
    // the hash found them; equality decides (classes of exactly equal series)
    const classes: (typeof bucket)[] = [];
    for (const b of bucket) {
      const c = classes.find((cl) => seriesEquals(cl[0]!.series, b.series));
      if (c) c.push(b);
      else classes.push([b]);
    }
    for (const cl of classes) {
      if (cl.length < 2) continue;
      const keys = cl.map((b) => b.d.key).sort();
      const ls = [...new Set(keys.flatMap((k) => linesOf.get(k) ?? []))];
      groups.push({ n: cl[0]!.d.n, what: cl[0]!.what, modules: keys, lines: ls });
      for (const k of keys) partner.set(k, keys.filter((x) => x !== k));
    }
  }
  const findings = new Map<string, SweepFinding[]>();
  const seedOf = new Map(lines.map((l) => [l.id, l]));
  for (const l of lines) {
    const at = l.places.filter((p) => partner.has(p.key));
    if (at.length === 0) continue;
    const others = [...new Set(at.flatMap((p) => partner.get(p.key)!.flatMap((k) => linesOf.get(k) ?? [])))].filter((id) => id !== l.id);
    if (others.length === 0) continue;
    const names = others.slice(0, 3).map((id) => `${id} ${seedOf.get(id)?.seed ?? ''}`.trim());
    const what = seriesOf(data.get(at[0]!.key)!).what;
    findings.set(l.id, [
      finding(
        'isomorphism',
        `same ${what} as ${names.join('; ')}${others.length > 3 ? ` and ${others.length - 3} more` : ''} (isomorphism candidate)`,
        `exact equality of the ${what} of different seeds${at.length < l.places.length ? ` at ${at.length} of ${l.places.length} places` : ''}`,
        at,
      ),
    ]);
  }
  return { groups, findings };
}
