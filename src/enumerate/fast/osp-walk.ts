/**
 * Prefix walk over the ordered set partitions of [n] into k blocks (k ≤ 30): elements
 * 1..n are placed in turn, element at+1 into block `value`, keeping only placements that
 * can still fill every block. `placed` marks the non-empty blocks (bit b−1 for block b),
 * `rank` counts the empty blocks below `value`. Shards deal the blocks of elements 1 and 2.
 */
import type { PrefixStep, Shard } from '../plugin.js';

function popcount(x: number): number {
  x -= (x >>> 1) & 0x55555555;
  x = (x & 0x33333333) + ((x >>> 2) & 0x33333333);
  return (((x + (x >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
}

export function walkOrderedSetPartitions(n: number, k: number, s1: PrefixStep, s2: PrefixStep, leaf: (a: number, b: number) => void, shard?: Shard): void {
  const count = shard?.count ?? 1;
  const index = shard?.index ?? 0;
  const rec = (at: number, placed: number, empties: number, prev: number, a1: number, a2: number): void => {
    if (at === n) {
      leaf(a1, a2);
      return;
    }
    const left = n - at - 1; // elements after this one
    for (let b = 1; b <= k; b++) {
      const bit = 1 << (b - 1);
      const wasEmpty = (placed & bit) === 0;
      const e = wasEmpty ? empties - 1 : empties;
      if (e > left) continue;
      const rank = b - 1 - popcount(placed & (bit - 1));
      rec(at + 1, placed | bit, e, b, a1 + s1(at, b, prev, rank, placed), a2 + s2(at, b, prev, rank, placed));
    }
  };
  if (n === 0 || k === 0) {
    if (index === 0 && n === 0 && k === 0) leaf(0, 0);
    return;
  }
  if (n < 2 || count === 1) {
    if (index === 0) rec(0, 0, k, 0, 0, 0);
    return;
  }
  let j = 0;
  for (let x = 1; x <= k; x++) {
    for (let y = 1; y <= k; y++) {
      const bx = 1 << (x - 1);
      const placed = bx | (1 << (y - 1));
      const empties = k - popcount(placed);
      if (empties > n - 2 || j++ % count !== index) continue;
      const ry = y - 1 - popcount(bx & ((1 << (y - 1)) - 1));
      const a1 = s1(0, x, 0, x - 1, 0) + s1(1, y, x, ry, bx);
      const a2 = s2(0, x, 0, x - 1, 0) + s2(1, y, x, ry, bx);
      rec(2, placed, empties, y, a1, a2);
    }
  }
}
