/** The visit fast path for permutations of a multiset (permutations, words), with shards. */
import type { Shard } from '../../src/enumerate/plugin.js';
import { nextPermutationFrom } from './next-permutation.js';
import { shardParts } from './shards.js';

/**
 * Calls f with every rearrangement of the sorted word `sorted`, in one reused buffer. With
 * shards, the words are split by their first two letters (each distinct pair is one part,
 * dealt round-robin), so each part is stepped by nextPermutationFrom from position 2.
 */
export function visitRearrangements(sorted: readonly number[], f: (w: readonly number[]) => void, shard?: Shard): void {
  const [index, count] = shardParts(shard);
  const a = sorted.slice();
  if (a.length < 2 || count === 1) {
    if (index === 0) do f(a);
    while (nextPermutationFrom(a, 0));
    return;
  }
  const letters = [...new Set(sorted)];
  let part = 0;
  for (const x of letters) {
    for (const y of letters) {
      const rest = sorted.slice();
      rest.splice(rest.indexOf(x), 1);
      const at = rest.indexOf(y);
      if (at < 0) continue; // y was only there once and is taken by x
      if (part++ % count !== index) continue;
      rest.splice(at, 1);
      a[0] = x;
      a[1] = y;
      for (let i = 0; i < rest.length; i++) a[i + 2] = rest[i]!;
      do f(a);
      while (nextPermutationFrom(a, 2));
    }
  }
}
