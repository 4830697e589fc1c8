/**
 * Sizes of the dense counters of a unit, one per statistic: for a large unit, a little above
 * the largest value seen on a fixed sample of its objects (seeded, so every shard of a unit
 * chooses the same), at least n + 2; for a small one, where sampling would cost more than it
 * saves, C(n+1, 2) + 2. Values above the bound are still counted exactly, in a map.
 */
import type { Family, Params } from '../enumerate/plugin.js';
import { VALUE_LIMIT } from './counter.js';
import type { TallyStat } from './statPlan.js';

const SAMPLES = 384;
/** Units with fewer objects are not sampled. */
const SAMPLED_FROM = 50_000;

/** A small seeded generator (mulberry32, common practice). */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function statBounds(family: Family<unknown>, n: number, parts: readonly Params[], stats: readonly TallyStat[], objects: number): number[] {
  if (objects < SAMPLED_FROM) return stats.map(() => Math.min(VALUE_LIMIT, (n * (n + 1)) / 2 + 2));
  const max = stats.map(() => 0);
  const random = seeded(0x9e3779b9);
  const per = Math.max(8, Math.ceil(SAMPLES / Math.max(1, parts.length)));
  for (const p of parts) {
    if (family.count(p) === 0n) continue;
    for (let s = 0; s < per; s++) {
      let x: unknown;
      try {
        x = family.sample(p, random);
      } catch {
        break; // a family that cannot sample this part: the floor below serves
      }
      const cache = new Map<string, unknown>();
      stats.forEach((st, i) => {
        let y = x;
        if (st.map) {
          if (!cache.has(st.transform)) cache.set(st.transform, st.map.apply(x));
          y = cache.get(st.transform);
        }
        const v = st.statistic.compute(y);
        if (Number.isInteger(v) && v > max[i]!) max[i] = v;
      });
    }
  }
  return max.map((m) => Math.min(VALUE_LIMIT, Math.max(n + 2, Math.ceil(m * 1.25) + 3)));
}
