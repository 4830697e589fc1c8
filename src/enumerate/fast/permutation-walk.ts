/**
 * Prefix walk over the permutations of [n] (n ≤ 30): values are placed left to right,
 * each step adding the statistics' increments (PrefixStep), so a statistic that is a sum
 * of per-step increments costs O(1) per step instead of a pass over each permutation.
 * Shards deal the prefixes of length 2 round-robin, as the family's own visit does.
 */
import type { PrefixStep, Shard } from '../plugin.js';

export function walkPermutations(n: number, s1: PrefixStep, s2: PrefixStep, leaf: (a: number, b: number) => void, shard?: Shard): void {
  const count = shard?.count ?? 1;
  const index = shard?.index ?? 0;
  const rec = (at: number, placed: number, prev: number, a1: number, a2: number): void => {
    let rank = 0;
    if (at === n - 1) {
      // one value left: the leaf
      let v = 1;
      while (placed & (1 << (v - 1))) v++;
      leaf(a1 + s1(at, v, prev, 0, placed), a2 + s2(at, v, prev, 0, placed));
      return;
    }
    for (let v = 1; v <= n; v++) {
      const bit = 1 << (v - 1);
      if (placed & bit) continue;
      rec(at + 1, placed | bit, v, a1 + s1(at, v, prev, rank, placed), a2 + s2(at, v, prev, rank, placed));
      rank++;
    }
  };
  if (n === 0) {
    if (index === 0) leaf(0, 0);
    return;
  }
  if (n < 3 || count === 1) {
    if (index === 0) rec(0, 0, 0, 0, 0);
    return;
  }
  let j = 0;
  for (let x = 1; x <= n; x++) {
    for (let y = 1; y <= n; y++) {
      if (y === x || j++ % count !== index) continue;
      // the steps of the prefix x, y
      const bx = 1 << (x - 1);
      const a1 = s1(0, x, 0, x - 1, 0) + s1(1, y, x, y < x ? y - 1 : y - 2, bx);
      const a2 = s2(0, x, 0, x - 1, 0) + s2(1, y, x, y < x ? y - 1 : y - 2, bx);
      rec(2, bx | (1 << (y - 1)), y, a1, a2);
    }
  }
}
