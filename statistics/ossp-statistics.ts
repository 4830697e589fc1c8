/**
 * Statistics on ordered set superpartitions (Rhoades–Wilson, "Set superpartitions and
 * superspace duality modules", Forum Math. Sigma 10 (2022)): the number of bars (the
 * θ-degree of the superspace module of δ_{n,k}, checked in the tests) and inv-type counts.
 * inv pairs: (b, j) with b in a block before B_j and b > min B_j (Remmel–Wilson, J. Combin. Theory Ser. A (2015)).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { OrderedSetSuperpartition } from '../objects/types.js';
import { ospInv } from './osp-inv.js';
import { ospMinimaj } from './osp-maj.js';

const FAMILY = 'ordered-set-superpartitions';
const RW = 'Rhoades–Wilson, Forum Math. Sigma 10 (2022)';
const P1: OrderedSetSuperpartition = { blocks: [[1, 3], [2]], barred: [3] };
const P2: OrderedSetSuperpartition = { blocks: [[2, 3], [1]], barred: [] };
const P3: OrderedSetSuperpartition = { blocks: [[2, 4], [1, 3]], barred: [3, 4] };

export const osspBars: Statistic<OrderedSetSuperpartition> = {
  id: 'ossp-bars',
  family: FAMILY,
  description: 'number of barred elements',
  source: `${RW} (bars as anticommuting variables)`,
  examples: [
    [P1, 1],
    [P2, 0],
    [P3, 2],
  ],
  compute: (p) => p.barred.length,
};

export const osspUnbarred: Statistic<OrderedSetSuperpartition> = {
  id: 'ossp-unbarred',
  family: FAMILY,
  description: 'number of non-minimal elements without a bar (n − k − bars)',
  source: RW,
  examples: [
    [P1, 0],
    [P2, 1],
    [P3, 0],
  ],
  compute: (p) => p.blocks.reduce((s, b) => s + b.length - 1, 0) - p.barred.length,
};

export const osspInv: Statistic<OrderedSetSuperpartition> = {
  id: 'ossp-inv',
  family: FAMILY,
  description: 'inv of the underlying ordered set partition (bars ignored)',
  source: 'Remmel–Wilson, J. Combin. Theory Ser. A (2015); Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018)',
  examples: [
    [P1, 1],
    [P2, 2],
    [P3, 2],
  ],
  compute: (p) => ospInv.compute(p.blocks),
};

export const osspBarredInv: Statistic<OrderedSetSuperpartition> = {
  id: 'ossp-barred-inv',
  family: FAMILY,
  description: 'inv pairs (b, j) whose letter b is barred',
  source: 'common practice',
  examples: [
    [P1, 1],
    [P2, 0],
    [P3, 1],
  ],
  compute(p) {
    const bar = new Set(p.barred);
    let s = 0;
    p.blocks.forEach((b, i) => {
      for (let j = i + 1; j < p.blocks.length; j++) for (const x of b) if (bar.has(x) && x > p.blocks[j]![0]!) s++;
    });
    return s;
  },
};

export const osspMinimaj: Statistic<OrderedSetSuperpartition> = {
  id: 'ossp-minimaj',
  family: FAMILY,
  description: 'minimaj of the underlying ordered set partition (bars ignored)',
  source: 'Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018) §4',
  examples: [
    [P1, 1],
    [P2, 2],
    [P3, 2],
  ],
  compute: (p) => ospMinimaj.compute(p.blocks),
};

export const osspBarredBlocks: Statistic<OrderedSetSuperpartition> = {
  id: 'ossp-barred-blocks',
  family: FAMILY,
  description: 'number of blocks holding at least one barred element',
  source: 'common practice',
  examples: [
    [P1, 1],
    [P2, 0],
    [P3, 2],
  ],
  compute(p) {
    const bar = new Set(p.barred);
    return p.blocks.filter((b) => b.some((x) => bar.has(x))).length;
  },
};

export const osspBarredSum: Statistic<OrderedSetSuperpartition> = {
  id: 'ossp-barred-sum',
  family: FAMILY,
  description: 'sum of the barred elements',
  source: 'common practice',
  examples: [
    [P1, 3],
    [P2, 0],
    [P3, 7],
  ],
  compute: (p) => p.barred.reduce((a, b) => a + b, 0),
};
