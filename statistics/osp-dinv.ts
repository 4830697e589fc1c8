/**
 * dinv on ordered set partitions B_1|…|B_k of [n], as in Haglund–Remmel–Wilson, "The Delta
 * Conjecture", Trans. Amer. Math. Soc. 370 (2018) §4, and Rhoades, JCTA (2018): the dinv
 * of the labelled Dyck path of the rise version with no area left outside decorated rows.
 * Such a path is k columns stacked along the diagonal, column j holding B_j increasing
 * upwards, and its car at level r of a column is the (r+1)-th smallest of the block.
 * Haglund's dinv pairs then become: x ∈ B_i, y ∈ B_j, i < j, with x and y at the same
 * level and x < y, or x one level above y and x > y. The tests check the distribution
 * [k]_q!·Stir_q(n,k) for n ≤ 6 and agreement with the decorated-path dinv.
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { OrderedSetPartition } from '../objects/types.js';

export const ospDinv: Statistic<OrderedSetPartition> = {
  id: 'osp-dinv',
  family: 'ordered-set-partitions',
  description: 'blocks as columns (increasing upwards): same-level pairs x < y and one-level-down pairs x > y, x left of y',
  source: 'Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018) §4; Rhoades, JCTA (2018)',
  examples: [
    [[[1, 2, 3]], 0],
    [[[1, 3], [2]], 2],
    [[[2], [1, 3]], 0],
    [[[3], [2], [1]], 0],
    [[[1, 2], [3, 4]], 2],
    [[[3, 4], [1, 2]], 1],
  ],
  compute(p) {
    let s = 0;
    const k = p.length;
    for (let i = 0; i < k; i++) {
      const bi = p[i]!;
      for (let j = i + 1; j < k; j++) {
        const bj = p[j]!;
        for (let r = 0; r < bi.length; r++) {
          const x = bi[r]!;
          if (r < bj.length && x < bj[r]!) s++;
          if (r >= 1 && r - 1 < bj.length && x > bj[r - 1]!) s++;
        }
      }
    }
    return s;
  },
};
