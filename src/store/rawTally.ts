/**
 * The counts of one unit (or one shard of it) before they become distributions: plain data
 * that crosses worker threads and adds up across shards. Each object is visited once: each
 * transform is applied once (and its statistics reused while it gives the same object again,
 * as signed-absolute does across the 2^n signs of one permutation), every statistic computed
 * once, then counted — singles, pairs (own × own and own × transformed) and the
 * Frobenius-level sums of singles and of own pairs — in dense tables sized from a sample.
 */
import { partitionList } from '../core/partitions.js';
import type { Family, Params, Shard } from '../enumerate/plugin.js';
import { countExtra, makeCounters, mergeCounter, VALUE_LIMIT, type Counter, type CounterBlock } from './counter.js';
import { descentMask, inverseDescentMask } from './descentMasks.js';
import { groupsOf, ownCount, type TallyStat } from './statPlan.js';
import { statBounds } from './statBounds.js';
import { MemoGate } from './transformMemo.js';

/** Frobenius-level sums: Σ q^stat s_shape, Σ q^stat F_Des(word), Σ q^stat F_iDes(word), Σ q^stat m_content. */
export type SymKind = 'shape' | 'fundamental' | 'ifundamental' | 'content';

/** One parameter set the unit visits; `content` indexes the content of a unit summed over contents. */
export interface UnitPart {
  readonly params: Params;
  readonly content?: number;
}

export interface TallyInput {
  readonly family: Family<unknown>;
  readonly n: number;
  readonly parts: readonly UnitPart[];
  /** Ordered: own statistics first, then each transform's together (statPlan.orderStats). */
  readonly stats: readonly TallyStat[];
  /** Statistics left out as equal to a kept one (index into stats), re-checked on a sample. */
  readonly checks?: readonly { readonly stat: TallyStat; readonly sameAs: number }[];
  readonly shard?: Shard;
}

export interface RawTally {
  objects: number;
  readonly single: Counter[];
  readonly pair: Counter[];
  readonly sym: { readonly kind: SymKind; readonly single: Counter[]; readonly pair: Counter[] }[];
}

/** Objects counted together (see accumulate). */
const BATCH = 2048;
/** Statistic values are below this (a local copy: an imported constant is read through a getter in the hot loop). */
const LIMIT = VALUE_LIMIT;

/** Masks of words up to n = 13 fit below 2^12. */
export const MAX_WORD_N = 13;

/** Pairs tallied: own × own (i < j) first (the Frobenius-level pairs), then own × transformed. */
export function pairsOf(stats: readonly TallyStat[]): [number, number][] {
  const own = ownCount(stats);
  const out: [number, number][] = [];
  for (let i = 0; i < own; i++) for (let j = i + 1; j < own; j++) out.push([i, j]);
  for (let i = 0; i < own; i++) for (let j = own; j < stats.length; j++) out.push([i, j]);
  return out;
}

/** The Frobenius-level sums a unit has, with the size of their index. */
export function symKindsOf(family: Family<unknown>, n: number, parts: readonly UnitPart[]): { kind: SymKind; M: number }[] {
  const out: { kind: SymKind; M: number }[] = [];
  if (typeof family.shape === 'function') out.push({ kind: 'shape', M: partitionList(n).length });
  if (typeof family.readingWord === 'function' && n >= 1 && n <= MAX_WORD_N) {
    out.push({ kind: 'fundamental', M: 1 << (n - 1) }, { kind: 'ifundamental', M: 1 << (n - 1) });
  }
  if (parts.some((p) => p.content !== undefined)) out.push({ kind: 'content', M: Math.max(...parts.map((p) => (p.content ?? 0) + 1)) });
  return out;
}

function shapeIndexer(n: number): (l: readonly number[]) => number {
  const index = new Map(partitionList(n).map((l, i) => [l.join(','), i]));
  return (l) => {
    const i = index.get(l.join(','));
    if (i === undefined) throw new Error(`a shape ${l.join(',')} of the wrong size (expected a partition of ${n})`);
    return i;
  };
}

export function accumulate(input: TallyInput): RawTally {
  const { family, n, parts, stats, shard } = input;
  const S = stats.length;
  const own = ownCount(stats);
  const groups = groupsOf(stats).filter((g) => g.map);
  const pairList = pairsOf(stats);
  const P = pairList.length;
  const pa = Int32Array.from(pairList, ([i]) => i);
  const pb = Int32Array.from(pairList, ([, j]) => j);
  const expected = Number(parts.reduce((s, p) => s + family.count(p.params), 0n)) / (shard?.count ?? 1);
  const bound = statBounds(family, n, parts.map((p) => p.params), stats, expected);
  const kinds = symKindsOf(family, n, parts);
  const ownPairs = pairList.filter(([, j]) => j < own).length;
  const single = makeCounters(stats.map((_, i) => [bound[i]!, 1, 1] as const), expected);
  const pair = makeCounters(pairList.map(([i, j]) => [bound[i]!, bound[j]!, 1] as const), expected);
  const symSingle = kinds.map(({ M }) => makeCounters(stats.map((_, i) => [bound[i]!, 1, M] as const), expected));
  const symPair = kinds.map(({ M }) => makeCounters(pairList.slice(0, ownPairs).map(([i, j]) => [bound[i]!, bound[j]!, M] as const), expected));
  const raw: RawTally = {
    objects: 0,
    single: single.counters,
    pair: pair.counters,
    sym: kinds.map(({ kind }, k) => ({ kind, single: symSingle[k]!.counters, pair: symPair[k]!.counters })),
  };
  // values of a batch of objects, [statistic][object]: each table is then walked by one loop
  // over the batch, which keeps it in cache (counting object by object jumps between tables)
  const vals = new Int32Array(S);
  const batch = new Int32Array(S * BATCH);
  const symIndex = new Int32Array(Math.max(1, kinds.length) * BATCH);
  const zeros = new Int32Array(BATCH);
  let t = 0;
  const shapeOf = kinds.some((k) => k.kind === 'shape') ? shapeIndexer(n) : undefined;
  const hasWord = kinds.some((k) => k.kind === 'fundamental');
  const gates = groups.map(() => new MemoGate());
  const checks = input.checks ?? [];
  let content = 0;
  const flush = (): void => {
    countSingles(single, batch, S, t, zeros, 0);
    countPlainPairs(pair, batch, pa, pb, P, t);
    for (let k = 0; k < kinds.length; k++) {
      countSingles(symSingle[k]!, batch, S, t, symIndex, k * BATCH);
      countPairs(symPair[k]!, batch, pa, pb, ownPairs, t, symIndex, k * BATCH);
    }
    t = 0;
  };
  const visit = (x: unknown): void => {
    const seen = ++raw.objects;
    for (let i = 0; i < own; i++) vals[i] = valueOf(stats[i]!, x);
    for (let g = 0; g < groups.length; g++) {
      const { map, from, to } = groups[g]!;
      const y = map!.apply(x);
      if (gates[g]!.same(y)) continue; // same object as last time: vals[from..to) still hold
      for (let i = from; i < to; i++) vals[i] = valueOf(stats[i]!, y);
    }
    if ((seen & 4095) === 1) for (const c of checks) checkDuplicate(family, c.stat, stats[c.sameAs]!, x, vals[c.sameAs]!);
    for (let i = 0; i < S; i++) batch[i * BATCH + t] = vals[i]!;
    if (kinds.length) {
      const w = hasWord ? family.readingWord!(x) : undefined;
      for (let k = 0; k < kinds.length; k++) {
        const kind = kinds[k]!.kind;
        symIndex[k * BATCH + t] = kind === 'shape' ? shapeOf!(family.shape!(x)) : kind === 'content' ? content : kind === 'fundamental' ? descentMask(w!) : inverseDescentMask(w!);
      }
    }
    if (++t === BATCH) flush();
  };
  for (const part of parts) {
    content = part.content ?? 0;
    if (family.visit) family.visit(part.params, visit, shard);
    else if (!shard || shard.count === 1) for (const o of family.generate(part.params)) visit(o);
    else throw new Error(`${family.id} cannot be split into shards`);
  }
  flush();
  return raw;
}

/** Counts a batch of T objects: statistic i's values at batch[i·BATCH + t], index m[at + t] (flat offsets, no calls on the dense path). */
function countSingles(c: CounterBlock, batch: Int32Array, S: number, T: number, m: Int32Array, at: number): void {
  const { data, off, A, M } = c;
  for (let i = 0; i < S; i++) {
    const base = i * BATCH;
    const o = off[i]!;
    const ai = A[i]!;
    const mi = M[i]!;
    for (let t = 0; t < T; t++) {
      const v = batch[base + t]!;
      const x = m[at + t]!;
      if (v < ai && x < mi) data[o + v * mi + x]!++;
      else countExtra(c.counters[i]!, v, 0, x);
    }
  }
}

/** countPairs without an index (the joint distributions: most of the build's counting). */
function countPlainPairs(c: CounterBlock, batch: Int32Array, pa: Int32Array, pb: Int32Array, P: number, T: number): void {
  const { data, off, A, B } = c;
  for (let p = 0; p < P; p++) {
    const ba = pa[p]! * BATCH;
    const bb = pb[p]! * BATCH;
    const o = off[p]!;
    const ap = A[p]!;
    const bp = B[p]!;
    for (let t = 0; t < T; t++) {
      const a = batch[ba + t]!;
      const b = batch[bb + t]!;
      if (a < ap && b < bp) data[o + a * bp + b]!++;
      else countExtra(c.counters[p]!, a, b, 0);
    }
  }
}

function countPairs(c: CounterBlock, batch: Int32Array, pa: Int32Array, pb: Int32Array, P: number, T: number, m: Int32Array, at: number): void {
  const { data, off, A, B, M } = c;
  for (let p = 0; p < P; p++) {
    const ba = pa[p]! * BATCH;
    const bb = pb[p]! * BATCH;
    const o = off[p]!;
    const ap = A[p]!;
    const bp = B[p]!;
    const mp = M[p]!;
    for (let t = 0; t < T; t++) {
      const a = batch[ba + t]!;
      const b = batch[bb + t]!;
      const x = m[at + t]!;
      if (a < ap && b < bp && x < mp) data[o + (a * bp + b) * mp + x]!++;
      else countExtra(c.counters[p]!, a, b, x);
    }
  }
}

function valueOf(s: TallyStat, y: unknown): number {
  const v = s.statistic.compute(y);
  if (!(v >= 0 && v < LIMIT && Number.isInteger(v))) throw new Error(`${s.id} gave ${v} (expected an integer from 0 to ${LIMIT - 1})`);
  return v;
}

function checkDuplicate(family: Family<unknown>, dropped: TallyStat, kept: TallyStat, x: unknown, value: number): void {
  const v = dropped.statistic.compute(dropped.map ? dropped.map.apply(x) : x);
  if (v !== value) {
    throw new Error(`${dropped.id} was left out of the catalogue as equal to ${kept.id} on the small sizes, but they differ on ${family.key(x)} (${v} ≠ ${value}); this is a bug of the duplicate check, please report it`);
  }
}

/** Adds b into a (shards of one unit). */
export function mergeRaw(a: RawTally, b: RawTally): RawTally {
  a.objects += b.objects;
  a.single.forEach((c, i) => mergeCounter(c, b.single[i]!));
  a.pair.forEach((c, i) => mergeCounter(c, b.pair[i]!));
  a.sym.forEach((s, k) => {
    s.single.forEach((c, i) => mergeCounter(c, b.sym[k]!.single[i]!));
    s.pair.forEach((c, i) => mergeCounter(c, b.sym[k]!.pair[i]!));
  });
  return a;
}
