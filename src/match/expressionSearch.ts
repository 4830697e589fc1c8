/**
 * The expression library searched like the distributions: each variant of the target is looked
 * up by the hash of its anchor entry; every stored value found there gives candidates (family ×
 * specialisation × projection × parameter mapping) checked on every entry of the target. A
 * match is written back as an expression `gradus sym` evaluates again: the family's template
 * under the mapping, its specialisation, projection and the twist of the variant.
 */
import type { Partition } from '../core/partitions.js';
import { substituteTemplate } from '../requests/template.js';
import { seriesAtOne, seriesEquals } from '../series/series.js';
import { rangeText, type TargetEntry } from '../series/target.js';
import type { Catalogue } from '../store/catalogue.js';
import { expressionAt, expressionFamilies, expressionSizes, expressionsByHash, placeKey, type ExpressionFamily, type ExpressionValue } from '../store/expressionStore.js';
import { seriesHash } from '../store/seriesHash.js';
import { SPECIALISATIONS, twistExpression } from './expressionFamilies.js';
import { applyMapping, mappingCost, mappingsFor, type Mapping } from './parameterMapping.js';
import type { ExpressionMatch } from './searchTypes.js';
import { shapeRulesFor, type ShapeRule } from './shapeRules.js';
import { isZeroSeries } from './zeroEntries.js';
import type { Variant } from './variants.js';

type Place = { n: number; k?: number };

/** One way of reading the target's (n, k) as the family's place. */
interface PlaceMap {
  readonly text: string;
  readonly cost: number;
  readonly placeOf: (e: Place) => { n: number; k?: number; partition?: Partition } | undefined;
  readonly mapping?: Mapping;
}

function placeMaps(f: ExpressionFamily, anchor: Place, v: ExpressionValue, oneSize: boolean): PlaceMap[] {
  if (f.index === 'partition') {
    return shapeRulesFor(anchor, v.partition ?? [], oneSize).map((r: ShapeRule) => ({
      text: r.text,
      cost: r.text.includes('k') ? 1 : 0.5,
      placeOf: (e) => {
        const p = r.apply(e.n, e.k);
        return p ? { n: e.n, partition: p } : undefined;
      },
    }));
  }
  return mappingsFor(anchor, v).map((m) => ({
    text: m.text,
    cost: mappingCost(m),
    mapping: m,
    placeOf: (e) => {
      const p = applyMapping(m, e);
      const n = p?.['n'];
      const k = p?.['k'];
      // expression families are indexed by numbers; a mapping to a partition does not apply
      if (typeof n !== 'number' || (k !== undefined && typeof k !== 'number')) return undefined;
      if (n < 1 || (f.index === 'n,k' && (k === undefined || k < f.kMin || k > n))) return undefined;
      return { n, ...(k === undefined ? {} : { k }) };
    },
  }));
}

/** The template under the mapping, in the family's own placeholders. */
function mappedTemplate(f: ExpressionFamily, pm: PlaceMap): string {
  const m = pm.mapping;
  if (!m) return f.template;
  const n = { n: 1, k: 0, c: m.dn };
  if (!m.k) return substituteTemplate(f.template, { n });
  const k = m.k.from === 'k' ? { n: 0, k: 1, c: m.k.d } : m.k.from === 'n-k' ? { n: 1, k: -1, c: m.k.d } : m.k.from === 'n' ? { n: 1, k: 0, c: m.k.d } : { n: 0, k: 0, c: m.k.d };
  return substituteTemplate(f.template, { n, k });
}

function wrap(f: ExpressionFamily, base: string, v: ExpressionValue, variant: string): string {
  const spec = SPECIALISATIONS.find((s) => s.id === v.specialisation)?.wrap(base) ?? base;
  const signed = f.sign === 'positive' ? `±${spec}` : spec;
  return twistExpression(variant, v.projection === 'hilbert' ? `hilbert(${signed})` : signed);
}

export function chooseAnchor(entries: readonly TargetEntry[], maxN: number): TargetEntry | undefined {
  const held = entries.filter((e) => e.n <= maxN && !isZeroSeries(e.series));
  if (held.length === 0) return undefined;
  const n = Math.max(...held.map((e) => e.n));
  // the richest entry there (largest count at q = 1), then k nearest n/2
  const atN = held.filter((e) => e.n === n).map((e) => ({ e, c: seriesAtOne(e.series) }));
  atN.sort((a, b) => (b.c > a.c ? 1 : b.c < a.c ? -1 : 0) || Math.abs((a.e.k ?? 0) - n / 2) - Math.abs((b.e.k ?? 0) - n / 2));
  return atN[0]?.e;
}

export function searchExpressions(cat: Catalogue, variants: readonly Variant[], anchorAt: (maxN: number) => TargetEntry | undefined): { matches: ExpressionMatch[]; families: number; maxN: number } {
  const sizes = expressionSizes(cat);
  const maxN = Math.max(0, ...sizes.values());
  const families = new Map(expressionFamilies(cat).map((f) => [f.id, f]));
  const anchor0 = anchorAt(maxN);
  const out = new Map<string, ExpressionMatch>();
  if (!anchor0) return { matches: [], families: families.size, maxN };
  const given = variants[0]?.target.entries ?? [];
  for (const variant of variants) {
    const entries = variant.target.entries;
    // a variant equal to the target (a function symmetric in q and t) adds only a twisted copy of each match
    if (variant.id !== 'as-given' && entries.every((e, i) => seriesEquals(e.series, given[i]!.series))) continue;
    const oneSize = new Set(entries.map((e) => e.n)).size === 1;
    const anchor = entries.find((e) => e.n === anchor0.n && e.k === anchor0.k);
    if (!anchor) continue;
    for (const v of expressionsByHash(cat, seriesHash(anchor.series))) {
      const f = families.get(v.family);
      if (!f || !seriesEquals(v.series, anchor.series)) continue;
      for (const pm of placeMaps(f, anchor, v, oneSize)) {
        const key = [f.id, v.specialisation, v.projection, variant.id, pm.text].join('|');
        if (out.has(key)) continue;
        const found = verify(cat, f, v, pm, entries, sizes.get(f.id) ?? 0);
        if (!found) continue;
        const at = pm.placeOf(anchor)!;
        const cost = 0.5 * (v.specialisation === 'none' ? 0 : 1) + (v.projection === 'hilbert' ? 1 : 0) + (variant.id === 'as-given' ? 0 : 1) + pm.cost + found.unchecked.length * 0.01;
        out.set(key, {
          family: f.id,
          title: f.title,
          source: f.source,
          origin: f.origin,
          expression: wrap(f, mappedTemplate(f, pm), v, variant.id),
          example: twistExpression(variant.id, v.expression),
          exampleAt: placeKey(at.n, at.k, at.partition),
          specialisation: v.specialisation,
          projection: v.projection,
          variant: variant.id,
          mapping: pm.text,
          verified: rangeText(found.verified),
          verifiedEntries: found.verified,
          unchecked: found.unchecked,
          complete: found.unchecked.length === 0,
          cost,
        });
      }
    }
  }
  // equal specialisations (t = 0 and t = 1 of a series in q alone) give the same match: keep the simplest
  const simplest = new Map<string, ExpressionMatch>();
  for (const m of out.values()) {
    const key = [m.family, m.projection, m.variant, m.mapping, m.verified, m.unchecked.map((p) => `${p.n},${p.k}`).join(' ')].join('|');
    const prev = simplest.get(key);
    if (!prev || m.cost < prev.cost) simplest.set(key, m);
  }
  const matches = [...simplest.values()].sort((a, b) => Number(b.complete) - Number(a.complete) || b.verifiedEntries.length - a.verifiedEntries.length || a.cost - b.cost || a.family.localeCompare(b.family));
  return { matches, families: families.size, maxN };
}

function verify(cat: Catalogue, f: ExpressionFamily, v: ExpressionValue, pm: PlaceMap, entries: readonly TargetEntry[], familyMaxN: number): { verified: Place[]; unchecked: Place[] } | undefined {
  const verified: Place[] = [];
  const unchecked: Place[] = [];
  for (const e of entries) {
    const place: Place = { n: e.n, ...(e.k === undefined ? {} : { k: e.k }) };
    const at = pm.placeOf(e);
    // a zero entry outside the family's range agrees with it (no value there)
    if (!at && isZeroSeries(e.series)) continue;
    const stored = at && at.n <= familyMaxN ? expressionAt(cat, f.id, placeKey(at.n, at.k, at.partition), v.specialisation, v.projection) : undefined;
    if (!stored) {
      unchecked.push(place);
      continue;
    }
    if (!seriesEquals(stored.series, e.series)) return undefined;
    verified.push(place);
  }
  const held = entries.filter((e) => e.n <= familyMaxN && !isZeroSeries(e.series)).length;
  return verified.length >= Math.min(2, entries.length) && 2 * verified.length >= held ? { verified, unchecked } : undefined;
}
