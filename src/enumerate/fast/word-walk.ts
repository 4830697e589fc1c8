/**
 * Prefix walk over the words of a given content (letter v used content[v−1] times):
 * letters are placed left to right; `rank` counts the letters still to place that are
 * smaller than `value` (with multiplicity), `placed` marks the letters used at least once.
 * Shards deal the prefixes of length 2 round-robin.
 */
import type { PrefixStep, Shard } from '../plugin.js';

export function walkWords(content: readonly number[], s1: PrefixStep, s2: PrefixStep, leaf: (a: number, b: number) => void, shard?: Shard): void {
  const count = shard?.count ?? 1;
  const index = shard?.index ?? 0;
  const m = content.length;
  const left = content.slice();
  const n = left.reduce((a, b) => a + b, 0);
  const split = count > 1 && n >= 3 ? 2 : -1; // depth at which prefixes are dealt out
  let dealt = 0;
  const rec = (at: number, placed: number, prev: number, a1: number, a2: number): void => {
    if (at === split && dealt++ % count !== index) return;
    if (at === n) {
      leaf(a1, a2);
      return;
    }
    let rank = 0;
    for (let v = 1; v <= m; v++) {
      const c = left[v - 1]!;
      if (c === 0) continue;
      left[v - 1] = c - 1;
      rec(at + 1, placed | (1 << (v - 1)), v, a1 + s1(at, v, prev, rank, placed), a2 + s2(at, v, prev, rank, placed));
      left[v - 1] = c;
      rank += c;
    }
  };
  if (split < 0 && index !== 0) return;
  rec(0, 0, 0, 0, 0);
}
