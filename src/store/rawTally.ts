/**
 * The counts of one unit (or one shard of it) before they become distributions: plain data
 * (typed arrays and maps) that crosses worker threads and adds up across shards.
 * Pairs tallied: own × own and own × transformed; Frobenius-level pairs only own × own.
 * Singles and pairs use dense counters below a value bound V, with a map above it.
 */
import { partitionKey } from '../core/partitions.js';
import { packExponents } from '../core/poly.js';
import type { Family, Shard } from '../enumerate/plugin.js';
import { descentMask, inverseDescentMask } from './descentMasks.js';

export type Tally = Map<number, number>;

/** Masks of words up to n = 13 fit below 2^12; packed pair keys below 2^33; products stay below 2^53. */
export const WORD_BASE = 4096;

export interface StatLike {
  readonly transform: string;
  readonly compute: (obj: unknown) => number;
}

export interface RawTally {
  objects: number;
  readonly V: number;
  readonly singleDense: Float64Array;
  readonly pairDense: Float64Array;
  /** "s<i>" or "p<p>" -> counts of values at or above V. */
  readonly overflow: Map<string, Tally>;
  /** per statistic: shape key -> (packed value -> count); pairs keyed "i,j". */
  readonly shapeSingle: Map<string, Tally>[];
  readonly shapePair: Map<string, Map<string, Tally>>;
  /** [Des, iDes] -> per statistic: (value * WORD_BASE + mask) -> count; pairs keyed "i,j". */
  readonly wordSingle: Tally[][];
  readonly wordPair: Map<string, Tally>[];
}

export function pairsOf(stats: readonly StatLike[]): [number, number][] {
  const own = stats.filter((s) => s.transform === '').length;
  const out: [number, number][] = [];
  for (let i = 0; i < own; i++) for (let j = i + 1; j < stats.length; j++) out.push([i, j]);
  return out;
}

function bump(m: Tally, key: number, by = 1): void {
  m.set(key, (m.get(key) ?? 0) + by);
}

function sub<K, V>(m: Map<K, V>, k: K, make: () => V): V {
  let v = m.get(k);
  if (v === undefined) m.set(k, (v = make()));
  return v;
}

export function accumulate(family: Family<unknown>, params: Readonly<Record<string, number>>, stats: readonly StatLike[], shard?: Shard): RawTally {
  const n = params['n'] ?? 0;
  const S = stats.length;
  const own = stats.filter((s) => s.transform === '').length;
  // most statistics stay below C(n+1,2); larger values go to the overflow maps
  const V = (n * (n + 1)) / 2 + 2;
  const pairList = pairsOf(stats);
  const P = pairList.length;
  const raw: RawTally = {
    objects: 0, V, singleDense: new Float64Array(S * V), pairDense: new Float64Array(P * V * V), overflow: new Map(),
    shapeSingle: stats.map(() => new Map()), shapePair: new Map(), wordSingle: [0, 1].map(() => stats.map(() => new Map())), wordPair: [new Map(), new Map()],
  };
  const hasShape = typeof family.shape === 'function';
  const hasWord = typeof family.readingWord === 'function' && n >= 1 && n <= 13;
  const vals = new Array<number>(S).fill(0);
  const visit = (obj: unknown): void => {
    raw.objects++;
    for (let i = 0; i < S; i++) {
      const v = stats[i]!.compute(obj);
      if (!Number.isInteger(v) || v < 0 || v >= 4096) throw new Error(`a statistic gave ${v} (expected an integer from 0 to 4095)`);
      vals[i] = v;
      if (v < V) raw.singleDense[i * V + v]!++;
      else bump(sub(raw.overflow, `s${i}`, () => new Map()), packExponents(v, 0));
    }
    for (let p = 0; p < P; p++) {
      const [i, j] = pairList[p]!;
      const a = vals[i]!;
      const b = vals[j]!;
      if (a < V && b < V) raw.pairDense[(p * V + a) * V + b]!++;
      else bump(sub(raw.overflow, `p${p}`, () => new Map()), packExponents(a, b));
    }
    if (hasShape) {
      const key = partitionKey(family.shape!(obj));
      for (let i = 0; i < S; i++) {
        bump(sub(raw.shapeSingle[i]!, key, () => new Map()), packExponents(vals[i]!, 0));
        if (i < own) for (let j = i + 1; j < own; j++) bump(sub(sub(raw.shapePair, `${i},${j}`, () => new Map()), key, () => new Map()), packExponents(vals[i]!, vals[j]!));
      }
    }
    if (hasWord) {
      const w = family.readingWord!(obj);
      const masks = [descentMask(w), inverseDescentMask(w)];
      for (let d = 0; d < 2; d++) {
        const m = masks[d]!;
        for (let i = 0; i < S; i++) {
          bump(raw.wordSingle[d]![i]!, vals[i]! * WORD_BASE + m);
          if (i < own) for (let j = i + 1; j < own; j++) bump(sub(raw.wordPair[d]!, `${i},${j}`, () => new Map()), packExponents(vals[i]!, vals[j]!) * WORD_BASE + m);
        }
      }
    }
  };
  if (family.visit) family.visit(params, visit, shard);
  else if (!shard || shard.count === 1) for (const o of family.generate(params)) visit(o);
  else throw new Error(`${family.id} cannot be split into shards`);
  return raw;
}

function mergeTally(into: Tally, from: Tally): void {
  for (const [k, v] of from) bump(into, k, v);
}

function mergeNested(into: Map<string, Tally>, from: Map<string, Tally>): void {
  for (const [k, t] of from) mergeTally(sub(into, k, () => new Map()), t);
}

/** Adds b into a (shards of one unit). */
export function mergeRaw(a: RawTally, b: RawTally): RawTally {
  a.objects += b.objects;
  for (let i = 0; i < a.singleDense.length; i++) a.singleDense[i]! += b.singleDense[i]!;
  for (let i = 0; i < a.pairDense.length; i++) if (b.pairDense[i]) a.pairDense[i]! += b.pairDense[i]!;
  mergeNested(a.overflow, b.overflow);
  a.shapeSingle.forEach((m, i) => mergeNested(m, b.shapeSingle[i]!));
  for (const [k, m] of b.shapePair) mergeNested(sub(a.shapePair, k, () => new Map()), m);
  a.wordSingle.forEach((per, d) => per.forEach((t, i) => mergeTally(t, b.wordSingle[d]![i]!)));
  a.wordPair.forEach((m, d) => mergeNested(m, b.wordPair[d]!));
  return a;
}
