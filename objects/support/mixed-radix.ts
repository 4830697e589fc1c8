/**
 * Mixed-radix counters: a[i] runs over 0..radix[i]−1, stepped lexicographically in place.
 * Inversion sequences, increasing trees (parent choices), Prüfer codes and the insertion
 * codes of Stirling permutations and increasing plane trees are all such counters.
 */
import type { Shard } from '../../src/enumerate/plugin.js';
import { shardParts } from './shards.js';

/** Next value of a[from..to−1] (the other digits untouched); false (and those digits 0) after the last. */
export function nextMixedRadix(a: number[], radix: readonly number[], from = 0, to = a.length): boolean {
  for (let i = to - 1; i >= from; i--) {
    if (a[i]! + 1 < radix[i]!) {
      a[i]!++;
      return true;
    }
    a[i] = 0;
  }
  return false;
}

/** A uniformly random value (radix[i] ≥ 1 for all i). */
export function randomMixedRadix(radix: readonly number[], random: () => number): number[] {
  return radix.map((r) => Math.min(r - 1, Math.floor(random() * r)));
}

/**
 * Calls f with every value in one reused buffer, in lexicographic order. With a shard, the
 * values are split by a prefix of digits (at least four prefixes per shard when possible),
 * prefixes dealt round-robin; every shard walks the same prefixes, so the parts are disjoint.
 */
export function visitMixedRadix(radix: readonly number[], f: (a: number[]) => void, shard?: Shard): void {
  const [index, count] = shardParts(shard);
  const a = new Array<number>(radix.length).fill(0);
  if (count === 1) {
    do f(a);
    while (nextMixedRadix(a, radix));
    return;
  }
  let len = 0;
  for (let prefixes = 1; len < radix.length && prefixes < 4 * count; len++) prefixes *= radix[len]!;
  let rank = 0;
  do {
    if (rank++ % count !== index) continue;
    do f(a);
    while (nextMixedRadix(a, radix, len));
  } while (nextMixedRadix(a, radix, 0, len));
}
