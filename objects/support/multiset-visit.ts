/** The visit fast path for rearrangements of a multiset (permutations, words), with shards. */
import type { Shard } from '../../src/enumerate/plugin.js';
import { nextPermutationFrom } from './next-permutation.js';
import { multinomial } from './numbers.js';
import { shardParts } from './shards.js';

/** Every distinct prefix of length len of the rearrangements of `sorted`, with the count of words it starts. */
function prefixes(sorted: readonly number[], len: number): { prefix: number[]; size: number }[] {
  const letters = [...new Set(sorted)];
  const mult = letters.map((x) => sorted.filter((y) => y === x).length);
  const out: { prefix: number[]; size: number }[] = [];
  const prefix: number[] = [];
  const rec = (): void => {
    if (prefix.length === len) {
      out.push({ prefix: prefix.slice(), size: Number(multinomial(mult)) });
      return;
    }
    letters.forEach((x, i) => {
      if (mult[i] === 0) return;
      mult[i]!--;
      prefix.push(x);
      rec();
      prefix.pop();
      mult[i]!++;
    });
  };
  rec();
  return out;
}

/**
 * Calls f with every rearrangement of the sorted word `sorted`, in one reused buffer. With
 * shards, the words are split by their first three letters: the prefixes, largest first,
 * each go to the least loaded shard (the same deterministic plan in every shard), and
 * each part is stepped by nextPermutationFrom after its prefix.
 */
export function visitRearrangements(sorted: readonly number[], f: (w: readonly number[]) => void, shard?: Shard): void {
  const [index, count] = shardParts(shard);
  const a = sorted.slice();
  if (a.length < 2 || count === 1) {
    if (index === 0) do f(a);
    while (nextPermutationFrom(a, 0));
    return;
  }
  const len = Math.min(a.length, 3);
  const parts = prefixes(sorted, len).sort((x, y) => y.size - x.size);
  const load = new Array<number>(count).fill(0);
  for (const { prefix, size } of parts) {
    let target = 0;
    for (let s = 1; s < count; s++) if (load[s]! < load[target]!) target = s;
    load[target]! += size;
    if (target !== index) continue;
    const rest = sorted.slice();
    for (const x of prefix) rest.splice(rest.indexOf(x), 1);
    for (let i = 0; i < len; i++) a[i] = prefix[i]!;
    for (let i = 0; i < rest.length; i++) a[i + len] = rest[i]!;
    do f(a);
    while (nextPermutationFrom(a, len));
  }
}
