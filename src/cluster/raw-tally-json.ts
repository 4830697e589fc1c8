/**
 * A raw tally (the counts of one catalogue unit or shard of it, before they become
 * distributions) as plain JSON and back: dense counters as flat [index, count, …] lists of
 * their non-zero entries, maps as flat [key, count, …] lists. Counts stay below 2^53, so JSON
 * numbers carry them exactly.
 */
import { z } from 'zod';
import type { RawTally, Tally } from '../store/rawTally.js';

const FLAT = z.array(z.number().int().min(0).max(2 ** 53)).refine((a) => a.length % 2 === 0, 'a flat list of pairs has an even length');
const NESTED = z.record(z.string().max(200), FLAT);

export const RAW_TALLY_JSON = z.object({
  objects: z.number().int().min(0).max(2 ** 53),
  V: z.number().int().min(1).max(1_000_000),
  singleLength: z.number().int().min(0).max(2 ** 31),
  pairLength: z.number().int().min(0).max(2 ** 31),
  single: FLAT,
  pair: FLAT,
  overflow: NESTED,
  shapeSingle: z.array(NESTED),
  shapePair: z.record(z.string().max(40), NESTED),
  wordSingle: z.array(z.array(FLAT)),
  wordPair: z.array(NESTED),
});
export type RawTallyJson = z.infer<typeof RAW_TALLY_JSON>;

function denseToFlat(a: Float64Array): number[] {
  const out: number[] = [];
  for (let i = 0; i < a.length; i++) if (a[i]) out.push(i, a[i]!);
  return out;
}

function flatToDense(flat: readonly number[], length: number): Float64Array {
  const a = new Float64Array(length);
  for (let i = 0; i < flat.length; i += 2) {
    const at = flat[i]!;
    if (at >= length) throw new RangeError(`a counter index ${at} beyond the length ${length}`);
    a[at] = flat[i + 1]!;
  }
  return a;
}

function tallyToFlat(t: Tally): number[] {
  const out: number[] = [];
  for (const [k, c] of t) out.push(k, c);
  return out;
}

function flatToTally(flat: readonly number[]): Tally {
  const t: Tally = new Map();
  for (let i = 0; i < flat.length; i += 2) t.set(flat[i]!, flat[i + 1]!);
  return t;
}

const nestedToJson = (m: Map<string, Tally>): Record<string, number[]> => Object.fromEntries([...m].map(([k, t]) => [k, tallyToFlat(t)]));
const nestedFromJson = (o: Record<string, number[]>): Map<string, Tally> => new Map(Object.entries(o).map(([k, f]) => [k, flatToTally(f)]));

export function rawTallyToJson(raw: RawTally): RawTallyJson {
  return {
    objects: raw.objects,
    V: raw.V,
    singleLength: raw.singleDense.length,
    pairLength: raw.pairDense.length,
    single: denseToFlat(raw.singleDense),
    pair: denseToFlat(raw.pairDense),
    overflow: nestedToJson(raw.overflow),
    shapeSingle: raw.shapeSingle.map(nestedToJson),
    shapePair: Object.fromEntries([...raw.shapePair].map(([k, m]) => [k, nestedToJson(m)])),
    wordSingle: raw.wordSingle.map((per) => per.map(tallyToFlat)),
    wordPair: raw.wordPair.map(nestedToJson),
  };
}

/** Back to a RawTally (the JSON was checked against RAW_TALLY_JSON); RangeError on an index out of bounds. */
export function rawTallyFromJson(j: RawTallyJson): RawTally {
  return {
    objects: j.objects,
    V: j.V,
    singleDense: flatToDense(j.single, j.singleLength),
    pairDense: flatToDense(j.pair, j.pairLength),
    overflow: nestedFromJson(j.overflow),
    shapeSingle: j.shapeSingle.map(nestedFromJson),
    shapePair: new Map(Object.entries(j.shapePair).map(([k, o]) => [k, nestedFromJson(o)])),
    wordSingle: j.wordSingle.map((per) => per.map(flatToTally)),
    wordPair: j.wordPair.map(nestedFromJson),
  };
}
