/**
 * Series from the JSON documents the data commands print:
 *   dist   {family, params, statistics, series, count}
 *   sym    {expression, degree, basis, terms: {"3,1": <q,t table>}}
 *   module {…, axes, hilbertSeries, schur: {"3,1": <table>}}
 * `take` picks what to read: the whole Frobenius series, its graded dimension (hilbert),
 * or the coefficient of s_(1^n) (sign, = ⟨F, e_n⟩) or of s_(n) (trivial, = ⟨F, h_n⟩).
 */
import { InputError } from '../core/errors.js';
import { Poly } from '../core/poly.js';
import { hilbertOfSchur, keyToPartition, qtSeries, schurCoefficient, schurSeries, type Series } from './series.js';
import { fundamentalToSchur } from '../symfun/quasisym.js';
import { polyFromJson, seriesFromJson } from './seriesJson.js';

export const TAKE_CHOICES = ['auto', 'frobenius', 'hilbert', 'sign', 'trivial'] as const;
export type Take = (typeof TAKE_CHOICES)[number];

export function parseTake(v: string | undefined): Take {
  if (v === undefined) return 'auto';
  if (!(TAKE_CHOICES as readonly string[]).includes(v)) {
    throw new InputError(`--take must be one of ${TAKE_CHOICES.join(', ')} (got "${v}")`, 'take');
  }
  return v as Take;
}

export function seriesFromDocument(doc: unknown, take: Take, where: string): Series {
  if (doc === null || typeof doc !== 'object') throw new InputError(`${where}: expected a JSON object`);
  const o = doc as Record<string, unknown>;
  let frob: Series | undefined;
  let graded: Series | undefined;
  if ('terms' in o && o['terms'] && typeof o['terms'] === 'object' && !Array.isArray(o['terms'])) {
    frob = seriesFromJson(o['terms'], `${where}.terms`);
  } else if ('schur' in o && o['schur'] && typeof o['schur'] === 'object') {
    const tables = frobeniusTables(o['schur'] as Record<string, unknown>, o['axes'], `${where}.schur`);
    if (tables.slices) throw new InputError(`${where}: three gradings vary in its Frobenius series; it is read as a marked union by the search (markedSlicesOfDocument)`, 'take');
    frob = tables.series;
  }
  if (o['frobenius'] && typeof o['frobenius'] === 'object') frob = frobeniusOfDist(o['frobenius'] as Record<string, unknown>, where);
  if ('hilbertSeries' in o) graded = gradedFromTable(o['hilbertSeries'], o['axes'], `${where}.hilbertSeries`);
  else if ('series' in o) {
    const s = seriesFromJson(o['series'], `${where}.series`);
    if (s.kind === 'schur') frob = s;
    else graded = s;
  }
  if (frob && frob.kind !== 'schur') frob = undefined;
  const den = o['denominator'];
  if (den !== undefined && den !== 1) {
    throw new InputError(`${where}: the coefficients are not integral (denominator ${String(den)}); search needs integer series`, 'from');
  }
  // a scalar (degree 0, e.g. an inner product) is a q,t series
  if (frob && frob.kind === 'schur' && [...frob.terms.keys()].every((key) => key === '')) {
    graded = qtSeries(frob.terms.get('') ?? Poly.zero);
    frob = undefined;
  }
  // an axis held at one degree (the θ-degree of a closure under x alone) carries no information
  if (graded) graded = dropConstantT(graded);
  if (frob) frob = dropConstantT(frob);
  switch (take) {
    case 'auto':
    case 'frobenius':
      if (frob) return frob;
      if (take === 'auto' && graded) return graded;
      throw new InputError(`${where}: the document has no Frobenius series (terms or schur)`, 'take');
    case 'hilbert':
      if (graded) return graded;
      if (frob) return hilbertOfSchur(frob);
      throw new InputError(`${where}: the document has no Hilbert series`, 'take');
    case 'sign':
    case 'trivial': {
      if (!frob) throw new InputError(`${where}: --take ${take} needs a Frobenius series in the document`, 'take');
      const n = degreeOf(frob);
      const lambda = take === 'sign' ? new Array<number>(n).fill(1) : n > 0 ? [n] : [];
      return schurCoefficient(frob, lambda);
    }
  }
}

function degreeOf(s: Series): number {
  if (s.kind !== 'schur') return 0;
  for (const k of s.terms.keys()) return keyToPartition(k).reduce((a, b) => a + b, 0);
  return 0;
}

/** Divide out t^j when every term of the series has the same t-degree j > 0. */
export function dropConstantT(s: Series): Series {
  const polys = s.kind === 'schur' ? [...s.terms.values()] : s.kind === 'q' || s.kind === 'qt' ? [s.poly] : [];
  const ts = new Set<number>();
  for (const p of polys) for (const [, j] of p.terms()) ts.add(j);
  if (ts.size !== 1) return s;
  const j = [...ts][0]!;
  if (j === 0) return s;
  const down = (p: Poly) => Poly.fromTerms([...p.terms()].map(([a, b, c]) => [a, b - j, c] as const));
  if (s.kind === 'schur') return schurSeries([...s.terms].map(([l, c]) => [l, down(c)] as const));
  if (s.kind === 'q' || s.kind === 'qt') return qtSeries(down(s.poly));
  return s;
}

/**
 * The Frobenius-level sum of a dist document: {basis: "schur", terms: [{shape, series}]} or
 * {basis: "fundamental-quasisymmetric", n, terms: [{set, series}]} (converted to Schur by
 * src/symfun/quasisym.ts; an InputError when the sum is not symmetric).
 */
function frobeniusOfDist(f: Record<string, unknown>, where: string): Series {
  const terms = Array.isArray(f['terms']) ? (f['terms'] as Record<string, unknown>[]) : [];
  if (f['basis'] === 'schur') {
    return schurSeries(terms.map((t, i) => [(t['shape'] as number[]).join(','), polyFromJson(t['series'], `${where}.frobenius.terms[${i}]`)] as const));
  }
  if (f['basis'] === 'fundamental-quasisymmetric') {
    const n = Number(f['n']);
    const byMask = new Map<number, Poly>();
    terms.forEach((t, i) => {
      const mask = (t['set'] as number[]).reduce((m, j) => m | (1 << (j - 1)), 0);
      byMask.set(mask, (byMask.get(mask) ?? Poly.zero).add(polyFromJson(t['series'], `${where}.frobenius.terms[${i}]`)));
    });
    const sf = fundamentalToSchur(n, byMask);
    return schurSeries([...sf.schurTerms()].map(([l, c]) => [l, c.toPoly()] as const));
  }
  throw new InputError(`${where}: unknown Frobenius basis ${JSON.stringify(f['basis'])}`);
}

/** Exponent vectors of a nested table (one index per axis) with their non-zero coefficients. */
function cellsOf(v: unknown, where: string): Map<string, bigint> {
  const out = new Map<string, bigint>();
  const walk = (x: unknown, at: number[]): void => {
    if (Array.isArray(x)) x.forEach((y, i) => walk(y, [...at, i]));
    else if (x !== 0 && x !== '0') {
      if (!(typeof x === 'number' && Number.isSafeInteger(x)) && !(typeof x === 'string' && /^-?\d{1,2000}$/.test(x))) throw new InputError(`${where}: expected integer coefficients`);
      out.set(at.join(','), BigInt(x));
    }
  };
  walk(v, []);
  return out;
}

/**
 * The Frobenius tables of a module document with any number of axes: axes held at one degree
 * are dropped; one or two left give a Schur series in q (and t); three give its slices by the
 * last axis (θ for superspace modules), each a Schur series in the first two.
 */
export function frobeniusTables(schur: Record<string, unknown>, axesDoc: unknown, where: string): { series?: Series; slices?: { axis: string; bySlice: Map<number, Series> } } {
  const d = Math.max(0, ...Object.values(schur).map(depth));
  if (d <= 2) return { series: seriesFromJson(schur, where) };
  const cells = new Map<string, Map<string, bigint>>();
  for (const [l, table] of Object.entries(schur)) cells.set(l, cellsOf(table, `${where}.${l}`));
  const keys = [...cells.values()].flatMap((m) => [...m.keys()].map((k) => k.split(',').map(Number)));
  const vary = Array.from({ length: d }, (_, i) => new Set(keys.map((e) => e[i])).size > 1);
  const kept = vary.flatMap((v, i) => (v ? [i] : []));
  const axes = Array.isArray(axesDoc) && axesDoc.length === d ? axesDoc.map(String) : Array.from({ length: d }, (_, i) => `axis${i + 1}`);
  const polyOf = (m: Map<string, bigint>, pick: (e: number[]) => boolean, [a, b]: number[]) =>
    Poly.fromTerms([...m].map(([k, c]) => [k.split(',').map(Number), c] as const).filter(([e]) => pick(e)).map(([e, c]) => [a === undefined ? 0 : e[a]!, b === undefined ? 0 : e[b]!, c] as const));
  if (kept.length <= 2) return { series: schurSeries([...cells].map(([l, m]) => [l, polyOf(m, () => true, kept)] as const)) };
  if (kept.length > 3) throw new InputError(`${where}: ${kept.length} gradings vary; at most three are read`, 'take');
  const last = kept[2]!;
  const bySlice = new Map<number, Series>();
  for (const j of new Set(keys.map((e) => e[last]!))) bySlice.set(j, schurSeries([...cells].map(([l, m]) => [l, polyOf(m, (e) => e[last] === j, kept.slice(0, 2))] as const)));
  return { slices: { axis: axes[last]!, bySlice } };
}

/**
 * The slices by its last axis (θ for superspace modules) of a document whose Frobenius tables
 * have three axes, each a Schur series in the first two (undefined for fewer axes).
 */
export function markedSlicesOfDocument(doc: unknown, where: string): { axis: string; bySlice: Map<number, Series> } | undefined {
  if (doc === null || typeof doc !== 'object') return undefined;
  const o = doc as Record<string, unknown>;
  const schur = o['schur'];
  if (!schur || typeof schur !== 'object' || Array.isArray(schur)) return undefined;
  const tables = schur as Record<string, unknown>;
  if (Math.max(0, ...Object.values(tables).map(depth)) !== 3) return undefined;
  const axes = Array.isArray(o['axes']) && o['axes'].length === 3 ? (o['axes'] as unknown[]).map(String) : ['axis1', 'axis2', 'axis3'];
  const bySlice = new Map<number, Series>();
  const cells = Object.entries(tables).map(([l, t]) => [l, cellsOf(t, `${where}.schur.${l}`)] as const);
  const js = new Set(cells.flatMap(([, m]) => [...m.keys()].map((k) => Number(k.split(',')[2]))));
  for (const j of js) {
    bySlice.set(j, schurSeries(cells.map(([l, m]) => [l, Poly.fromTerms([...m].map(([k, c]) => [k.split(',').map(Number), c] as const).filter(([e]) => e[2] === j).map(([e, c]) => [e[0]!, e[1]!, c] as const))] as const)));
  }
  return { axis: axes[2]!, bySlice };
}

function depth(v: unknown): number {
  return Array.isArray(v) ? 1 + (v.length ? Math.max(...v.map(depth)) : 0) : 0;
}

/**
 * A Hilbert table with any number of axes. Axes held at one degree are dropped; one or two
 * axes left give a series in q or in q,t, more give a multigraded table.
 */
export function gradedFromTable(v: unknown, axesDoc: unknown, where: string): Series {
  const d = depth(v);
  if (d <= 2) return seriesFromJson(v, where);
  const axes = Array.isArray(axesDoc) && axesDoc.length === d ? axesDoc.map(String) : Array.from({ length: d }, (_, i) => `axis${i + 1}`);
  const terms = new Map<string, bigint>();
  const walk = (x: unknown, at: number[]): void => {
    if (Array.isArray(x)) x.forEach((y, i) => walk(y, [...at, i]));
    else if (x !== 0 && x !== '0') terms.set(at.join(','), BigInt(x as number | string));
  };
  walk(v, []);
  const keep = axes.map((_, i) => new Set([...terms.keys()].map((k) => k.split(',')[i])).size > 1);
  const kept = axes.filter((_, i) => keep[i]);
  if (kept.length <= 2) {
    const poly = Poly.fromTerms([...terms].map(([k, c]) => {
      const e = k.split(',').map(Number).filter((_, i) => keep[i]);
      return [e[0] ?? 0, e[1] ?? 0, c] as const;
    }));
    return qtSeries(poly);
  }
  return { kind: 'multi', axes, terms };
}
