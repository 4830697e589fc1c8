/**
 * A q-Stirling statistic on set partitions: number the blocks 1, 2, … by their minima; every
 * element that is not the minimum of its block contributes (number of its block) − 1. On the
 * restricted growth word w this is Σ (w_i − 1) over positions that are not first occurrences.
 * Appending n to a partition of [n−1] either opens a new block (adds 0) or joins block j
 * (adds j − 1, j = 1..k), which is the recurrence Stir_q(n,k) = Stir_q(n−1,k−1) + [k]_q Stir_q(n−1,k)
 * of Carlitz's q-Stirling numbers; so over partitions with k blocks the generating function is
 * Stir_q(n,k).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { SetPartition } from '../objects/types.js';

export const blockIndexSum: Statistic<SetPartition> = {
  id: 'block-index-sum',
  family: 'set-partitions',
  description: 'sum over non-minimal elements of (index of their block by minima) − 1; Stir_q(n,k) over k blocks',
  source: 'Milne, Trans. Amer. Math. Soc. 245 (1978), q-analog of restricted growth functions (from memory); q-Stirling recurrence of Carlitz, Duke Math. J. 15 (1948) (from memory)',
  examples: [
    [[[1, 2, 3]], 0],
    [[[1], [2, 3]], 1],
    [[[1, 4], [2, 3]], 1],
    [[[1], [2], [3, 4]], 2],
    [[[1, 3], [2, 4, 5]], 2],
  ],
  compute(p) {
    let s = 0;
    // blocks are sorted by their minima, so block i (0-based) has index i + 1
    p.forEach((block, i) => (s += i * (block.length - 1)));
    return s;
  },
};
