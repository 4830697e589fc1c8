/**
 * inv on ordered set partitions B_1|…|B_k of [n]: pairs (b, j) with b ∈ B_i,
 * i < j and b > min B_j. Its distribution over OP(n,k) is [k]_q!·Stir_q(n,k)
 * (Remmel–Wilson, "An extension of MacMahon's equidistribution theorem to ordered set
 * partitions", JCTA (2015)); the tests check this for n ≤ 6.
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { OrderedSetPartition } from '../objects/types.js';

function popcount(x: number): number {
  let c = 0;
  for (; x; x &= x - 1) c++;
  return c;
}

export const ospInv: Statistic<OrderedSetPartition> = {
  id: 'osp-inv',
  family: 'ordered-set-partitions',
  description: 'pairs (b, j): b in an earlier block than B_j and b > min B_j',
  source: 'Remmel–Wilson, JCTA (2015); Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018)',
  examples: [
    [[[1, 2, 3]], 0],
    [[[1, 3], [2]], 1],
    [[[2], [1, 3]], 1],
    [[[3], [2], [1]], 3],
    [[[1, 2], [3, 4]], 0],
    [[[3, 4], [1, 2]], 2],
  ],
  step: (_at, b, _prev, _rank, placed) => popcount(placed >>> b), // later blocks already opened by smaller elements
  compute(p) {
    // For each later block B_j, count the letters of earlier blocks above its minimum.
    let s = 0;
    const k = p.length;
    for (let j = 1; j < k; j++) {
      const m = p[j]![0]!; // blocks are increasing, so the first entry is the minimum
      for (let i = 0; i < j; i++) {
        const b = p[i]!;
        for (let t = b.length - 1; t >= 0 && b[t]! > m; t--) s++;
      }
    }
    return s;
  },
};
