/**
 * A raw tally (the counts of one catalogue unit or shard of it, before they become
 * distributions) as plain JSON and back: each counter keeps its dense bounds, its non-zero
 * dense cells as a flat [index, count, …] list and its cells outside the bounds as a flat
 * [key, count, …] list. Counts stay below 2^53, so JSON numbers carry them exactly.
 */
import { z } from 'zod';
import type { Counter } from '../store/counter.js';
import type { RawTally, SymKind } from '../store/rawTally.js';

const COUNT = z.number().int().min(0).max(2 ** 53);
const FLAT = z.array(COUNT).refine((a) => a.length % 2 === 0, 'a flat list of pairs has an even length');
const BOUND = z.number().int().min(0).max(2 ** 20);
const COUNTER = z.object({ A: BOUND, B: BOUND, M: BOUND, cells: FLAT, extra: FLAT }).refine((c) => c.A * c.B * c.M <= 2 ** 22, 'a dense table larger than the build makes');

export const RAW_TALLY_JSON = z.object({
  objects: COUNT,
  single: z.array(COUNTER).max(10_000),
  pair: z.array(COUNTER).max(1_000_000),
  sym: z.array(z.object({ kind: z.enum(['shape', 'fundamental', 'ifundamental', 'content']), single: z.array(COUNTER).max(10_000), pair: z.array(COUNTER).max(1_000_000) })).max(8),
});
export type RawTallyJson = z.infer<typeof RAW_TALLY_JSON>;
type CounterJson = z.infer<typeof COUNTER>;

function counterToJson(c: Counter): CounterJson {
  const cells: number[] = [];
  for (let i = 0; i < c.data.length; i++) if (c.data[i]) cells.push(i, c.data[i]!);
  const extra: number[] = [];
  for (const [k, v] of c.extra) if (v) extra.push(k, v);
  return { A: c.A, B: c.B, M: c.M, cells, extra };
}

function counterFromJson(j: CounterJson): Counter {
  const data = new Float64Array(j.A * j.B * j.M);
  for (let i = 0; i < j.cells.length; i += 2) {
    const at = j.cells[i]!;
    if (at >= data.length) throw new RangeError(`a counter index ${at} beyond the length ${data.length}`);
    data[at] = j.cells[i + 1]!;
  }
  const extra = new Map<number, number>();
  for (let i = 0; i < j.extra.length; i += 2) extra.set(j.extra[i]!, j.extra[i + 1]!);
  return { A: j.A, B: j.B, M: j.M, data, extra };
}

export function rawTallyToJson(raw: RawTally): RawTallyJson {
  return {
    objects: raw.objects,
    single: raw.single.map(counterToJson),
    pair: raw.pair.map(counterToJson),
    sym: raw.sym.map((s) => ({ kind: s.kind, single: s.single.map(counterToJson), pair: s.pair.map(counterToJson) })),
  };
}

/** Back to a RawTally (the JSON was checked against RAW_TALLY_JSON); RangeError on an index out of bounds. */
export function rawTallyFromJson(j: RawTallyJson): RawTally {
  return {
    objects: j.objects,
    single: j.single.map(counterFromJson),
    pair: j.pair.map(counterFromJson),
    sym: j.sym.map((s) => ({ kind: s.kind as SymKind, single: s.single.map(counterFromJson), pair: s.pair.map(counterFromJson) })),
  };
}
