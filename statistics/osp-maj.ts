/**
 * maj and minimaj on ordered set partitions B_1|…|B_k of [n], as in Haglund–Remmel–Wilson,
 * "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018), §4, and Rhoades, "Ordered set
 * partition statistics and the Delta Conjecture", JCTA (2018).
 *
 * maj: write each block in decreasing order and concatenate (word σ); every descent
 * σ_i > σ_{i+1} contributes the number of blocks that end before position i+1.
 * minimaj: the least major index of a word obtained by ordering each block in any way
 * (blocks stay in place). It is attained by the arrangement of Benkart–Colmenarejo–Harris–
 * Orellana–Panova–Schilling–Yip (2018): the last block increasing; each earlier block, with r
 * the first letter of the next one, as its letters > r increasing followed by its letters ≤ r
 * increasing. The tests check this against the minimum over all arrangements (n ≤ 5) and
 * both distributions against [k]_q!·Stir_q(n,k) (n ≤ 6).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { OrderedSetPartition } from '../objects/types.js';

export const ospMaj: Statistic<OrderedSetPartition> = {
  id: 'osp-maj',
  family: 'ordered-set-partitions',
  description: 'blocks written decreasing; each descent weighted by the number of blocks ended before it',
  source: 'Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018) §4; Rhoades, JCTA (2018)',
  examples: [
    [[[1, 2, 3]], 0],
    [[[1, 3], [2]], 0],
    [[[2], [1, 3]], 1],
    [[[3], [2], [1]], 3],
    [[[1, 2], [3, 4]], 1],
    [[[3, 4], [1, 2]], 2],
  ],
  compute(p) {
    let s = 0;
    let prev = -1; // last letter written so far (the minimum of the previous block)
    for (let j = 0; j < p.length; j++) {
      const b = p[j]!;
      const top = b[b.length - 1]!;
      if (prev > top) s += j; // boundary descent: j blocks ended before it
      s += j * (b.length - 1); // a decreasing block of size m has m − 1 inner descents
      prev = b[0]!;
    }
    return s;
  },
};

export const ospMinimaj: Statistic<OrderedSetPartition> = {
  id: 'osp-minimaj',
  family: 'ordered-set-partitions',
  description: 'least major index over all orderings of the letters inside each block',
  source: 'Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018) §4; Rhoades, JCTA (2018)',
  examples: [
    [[[1, 2, 3]], 0],
    [[[1, 3], [2]], 1],
    [[[2], [1, 3]], 1],
    [[[3], [2], [1]], 3],
    [[[1, 2], [3, 4]], 0],
    [[[3, 4], [1, 2]], 2],
  ],
  compute(p) {
    const k = p.length;
    if (k === 0) return 0;
    // Build the word from the right; position counts from 1 at the left.
    let end = 0;
    for (const b of p) end += b.length;
    let s = 0;
    let r = p[k - 1]![0]!; // first letter of the arranged next block
    end -= p[k - 1]!.length; // the last block is increasing: no descents inside
    for (let j = k - 2; j >= 0; j--) {
      const b = p[j]!;
      const m = b.length;
      const start = end - m; // letters occupy positions start+1 .. end
      let small = 0; // letters ≤ r (a prefix of the increasing block)
      while (small < m && b[small]! <= r) small++;
      const big = m - small;
      if (big > 0 && small > 0) s += start + big; // descent between the big and small runs
      if (small === 0) s += end; // block ends with a letter > r: descent at the boundary
      r = big > 0 ? b[small]! : b[0]!;
      end = start;
    }
    return s;
  },
};
