/**
 * inv, dinv, maj and minimaj on ordered multiset partitions π = B_1|…|B_k (blocks are sets),
 * the four statistics of the Delta conjecture at t = 0 (Haglund–Remmel–Wilson, "The Delta
 * Conjecture", Trans. Amer. Math. Soc. 370 (2018) §4; Wilson, Electron. J. Combin. 23 (2016) for
 * inv, dinv and maj; Rhoades, "Ordered set partition statistics and the Delta Conjecture",
 * J. Combin. Theory Ser. A 154 (2018) for minimaj). The definitions are those of the ordered
 * set partition statistics (osp-*.ts), read with strict comparisons, so a letter repeated in
 * different blocks never counts against itself.
 * The tests check all four against ⟨Δ′_{e_{k−1}} e_n |_{t=0}, h_α⟩ from the symmetric-function engine.
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { OrderedMultisetPartition } from '../objects/types.js';
import { ospDinv } from './osp-dinv.js';
import { ospInv } from './osp-inv.js';
import { ospMaj, ospMinimaj } from './osp-maj.js';

const FAMILY = 'ordered-multiset-partitions';
const HRW = 'Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018) §4';

export const ompInv: Statistic<OrderedMultisetPartition> = {
  id: 'omp-inv',
  family: FAMILY,
  description: 'pairs (b, j): a letter b in a block before B_j with b greater than the minimum of B_j',
  source: `${HRW}; Wilson, Electron. J. Combin. 23 (2016)`,
  examples: [
    [[[1, 2], [1]], 1],
    [[[1], [1, 2]], 0],
    [[[1, 3], [2], [1]], 3],
    [[[2], [1, 2], [1]], 3],
  ],
  compute: (p) => ospInv.compute(p),
};

export const ompDinv: Statistic<OrderedMultisetPartition> = {
  id: 'omp-dinv',
  family: FAMILY,
  description: 'blocks as increasing columns: x left of y on one level with x < y, or x one level above y with x > y',
  source: `${HRW}; Wilson, Electron. J. Combin. 23 (2016)`,
  examples: [
    [[[1, 2], [1]], 1],
    [[[1], [1, 2]], 0],
    [[[1, 3], [2], [1]], 3],
    [[[2], [1, 2], [1]], 1],
  ],
  compute: (p) => ospDinv.compute(p),
};

export const ompMaj: Statistic<OrderedMultisetPartition> = {
  id: 'omp-maj',
  family: FAMILY,
  description: 'blocks written decreasing and concatenated; each strict descent weighted by the number of blocks ended before it',
  source: HRW,
  examples: [
    [[[1, 2], [1]], 0],
    [[[1], [1, 2]], 1],
    [[[1, 3], [2], [1]], 2],
    [[[2], [1, 2], [1]], 1],
  ],
  compute: (p) => ospMaj.compute(p),
};

export const ompMinimaj: Statistic<OrderedMultisetPartition> = {
  id: 'omp-minimaj',
  family: FAMILY,
  description: 'least major index of the concatenated word over all orders of the letters inside each block',
  source: `${HRW}; Rhoades, J. Combin. Theory Ser. A 154 (2018)`,
  examples: [
    [[[1, 2], [1]], 1],
    [[[1], [1, 2]], 0],
    [[[1, 3], [2], [1]], 4],
    [[[2], [1, 2], [1]], 2],
  ],
  compute: (p) => ospMinimaj.compute(p),
};
