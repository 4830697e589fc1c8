/** Uniform random set partitions of [n] into k blocks (by the Stirling recurrence). */
import { stirling2 } from './numbers.js';
import { randomBelow, weightedIndex } from './random.js';

/**
 * Element m is a singleton block of a partition of [m] into j blocks with probability
 * S(m−1, j−1)/S(m, j), else it joins one of the j blocks of a partition of [m−1]:
 * deciding from m = n down keeps the result uniform. Blocks come sorted by minima.
 */
export function randomSetPartition(n: number, k: number, random: () => number): number[][] {
  if (stirling2(n, k) === 0n) throw new RangeError(`no set partition of [${n}] into ${k} blocks`);
  const joins: (number | undefined)[] = new Array(n + 1); // undefined = singleton; else block slot
  let j = k;
  for (let m = n; m >= 1; m--) {
    const alone = stirling2(m - 1, j - 1);
    const join = BigInt(j) * stirling2(m - 1, j);
    if (weightedIndex(random, [alone, join]) === 0) {
      joins[m] = undefined;
      j--;
    } else joins[m] = randomBelow(random, j);
  }
  // Rebuild upward: blocks exist in order of their minima; a joining element picks one by slot.
  const blocks: number[][] = [];
  for (let m = 1; m <= n; m++) {
    const slot = joins[m];
    if (slot === undefined) blocks.push([m]);
    else blocks[slot]!.push(m);
  }
  return blocks;
}
