/**
 * Counts of (a, b, m) triples — a and b statistic values (below 4096), m a descent mask, shape
 * or content index (below 8192) — dense in a Float64Array inside the bounds the build chose,
 * in a map outside them (rare values: correct, only slower). Plain data, so it crosses worker
 * threads; shards of a unit add up with mergeCounter.
 */
export interface Counter {
  readonly A: number;
  readonly B: number;
  readonly M: number;
  readonly data: Float64Array;
  readonly extra: Map<number, number>;
}

/** A dense table is allocated only below this many cells, and below a few cells per object counted. */
const DENSE_MAX = 1 << 20;
const CELLS_PER_OBJECT = 4;

export const VALUE_LIMIT = 4096;
const MASK_LIMIT = 8192;

/**
 * Counters of the given bounds for about `objects` counts each (a table larger than that would
 * mostly hold zeros), their dense tables cut from one buffer, with the flat layout the hot
 * loop of the build reads: counter c has its cell (a, b, m) at off[c] + (a·B[c] + b)·M[c] + m
 * when a < A[c], b < B[c], m < M[c].
 */
export interface CounterBlock {
  readonly counters: Counter[];
  readonly data: Float64Array;
  readonly off: Int32Array;
  readonly A: Int32Array;
  readonly B: Int32Array;
  readonly M: Int32Array;
}

export function makeCounters(dims: readonly (readonly [number, number, number])[], objects: number): CounterBlock {
  const dense = dims.map(([a, b, m]) => a * b * m <= DENSE_MAX && a * b * m <= CELLS_PER_OBJECT * objects);
  const size = dims.reduce((s, [a, b, m], i) => s + (dense[i] ? a * b * m : 0), 0);
  const data = new Float64Array(size);
  const block: CounterBlock = { counters: [], data, off: new Int32Array(dims.length), A: new Int32Array(dims.length), B: new Int32Array(dims.length), M: new Int32Array(dims.length) };
  let at = 0;
  dims.forEach(([a, b, m], i) => {
    if (!dense[i]) {
      block.counters.push({ A: 0, B: 0, M: 0, data: new Float64Array(0), extra: new Map() });
      return;
    }
    block.off[i] = at;
    block.A[i] = a;
    block.B[i] = b;
    block.M[i] = m;
    block.counters.push({ A: a, B: b, M: m, data: data.subarray(at, at + a * b * m), extra: new Map() });
    at += a * b * m;
  });
  return block;
}

/** Counts (a, b, m) outside the dense table of c. */
export function countExtra(c: Counter, a: number, b: number, m: number): void {
  const k = extraKey(a, b, m);
  c.extra.set(k, (c.extra.get(k) ?? 0) + 1);
}

export function extraKey(a: number, b: number, m: number): number {
  return (a * VALUE_LIMIT + b) * MASK_LIMIT + m;
}

export function count(c: Counter, a: number, b: number, m: number, by = 1): void {
  if (a < c.A && b < c.B && m < c.M) c.data[(a * c.B + b) * c.M + m]! += by;
  else {
    const k = extraKey(a, b, m);
    c.extra.set(k, (c.extra.get(k) ?? 0) + by);
  }
}

/** Every non-zero cell as (a, b, m, count). */
export function forEachCell(c: Counter, f: (a: number, b: number, m: number, n: number) => void): void {
  const { B, M, data } = c;
  for (let i = 0; i < data.length; i++) {
    const v = data[i]!;
    if (v === 0) continue;
    const m = i % M;
    const ab = (i - m) / M;
    const b = ab % B;
    f((ab - b) / B, b, m, v);
  }
  for (const [k, v] of c.extra) {
    if (v === 0) continue;
    const m = k % MASK_LIMIT;
    const ab = (k - m) / MASK_LIMIT;
    const b = ab % VALUE_LIMIT;
    f((ab - b) / VALUE_LIMIT, b, m, v);
  }
}

/** Adds `from` into `into` (both of one unit; bounds may differ). */
export function mergeCounter(into: Counter, from: Counter): void {
  if (into.A === from.A && into.B === from.B && into.M === from.M) {
    for (let i = 0; i < from.data.length; i++) if (from.data[i]) into.data[i]! += from.data[i]!;
    for (const [k, v] of from.extra) into.extra.set(k, (into.extra.get(k) ?? 0) + v);
    return;
  }
  forEachCell(from, (a, b, m, v) => count(into, a, b, m, v));
}
