/**
 * Dyck paths by their number of peaks: Narayana numbers and a uniform sampler among the
 * paths of semilength n with p peaks (a peak is a north step followed by an east step).
 */
import { binomial } from '../../src/core/integers.js';
import { weightedIndex } from './random.js';

/** N(n, p) = C(n,p)·C(n,p−1)/n, the Dyck paths of semilength n with p peaks (N(0,0) = 1). */
export function narayana(n: number, p: number): bigint {
  if (n === 0) return p === 0 ? 1n : 0n;
  if (p < 1 || p > n) return 0n;
  return (binomial(n, p) * binomial(n, p - 1)) / BigInt(n);
}

/** A uniform Dyck path of semilength n with p peaks (1 = north, 0 = east); assumes one exists. */
export function randomDyckPathWithPeaks(n: number, p: number, random: () => number): (0 | 1)[] {
  const memo = new Map<number, bigint>();
  // Completions of steps i..2n−1 from height h, q peaks still to make, last step north or not.
  const ways = (i: number, h: number, q: number, lastNorth: boolean): bigint => {
    if (h < 0 || q < 0 || h > 2 * n - i) return 0n;
    if (i === 2 * n) return h === 0 && q === 0 ? 1n : 0n;
    const key = ((i * (n + 2) + h) * (n + 2) + q) * 2 + (lastNorth ? 1 : 0);
    let v = memo.get(key);
    if (v === undefined) {
      v = ways(i + 1, h + 1, q, true) + ways(i + 1, h - 1, lastNorth ? q - 1 : q, false);
      memo.set(key, v);
    }
    return v;
  };
  const out: (0 | 1)[] = [];
  let h = 0;
  let q = p;
  let lastNorth = false;
  for (let i = 0; i < 2 * n; i++) {
    const up = ways(i + 1, h + 1, q, true);
    const down = ways(i + 1, h - 1, lastNorth ? q - 1 : q, false);
    if (weightedIndex(random, [up, down]) === 0) {
      out.push(1);
      h++;
      lastNorth = true;
    } else {
      out.push(0);
      if (lastNorth) q--;
      h--;
      lastNorth = false;
    }
  }
  return out;
}
