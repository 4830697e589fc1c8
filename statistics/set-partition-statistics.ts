/**
 * Statistics on set partitions of [n] (blocks increasing, sorted by minima). Arcs join
 * consecutive elements of a block; crossings and nestings are those of the arc diagram
 * (Chen–Deng–Du–Stanley–Yan, "Crossings and nestings of matchings and partitions",
 * Trans. Amer. Math. Soc. 359 (2007): their joint distribution is symmetric).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { SetPartition } from '../objects/types.js';

/** Arcs (a, b), a < b consecutive in a block, as two parallel lists. */
function arcs(p: SetPartition): [number[], number[]] {
  const from: number[] = [];
  const to: number[] = [];
  for (const b of p) for (let i = 1; i < b.length; i++) from.push(b[i - 1]!), to.push(b[i]!);
  return [from, to];
}

export const blocks: Statistic<SetPartition> = {
  id: 'blocks',
  family: 'set-partitions',
  description: 'number of blocks',
  source: 'standard (Stanley, EC1 §1.9, Stirling numbers of the second kind)',
  examples: [
    [[], 0],
    [[[1, 2, 3]], 1],
    [[[1, 3], [2]], 2],
  ],
  compute: (p) => p.length,
};

export const singletons: Statistic<SetPartition> = {
  id: 'singletons',
  family: 'set-partitions',
  description: 'number of blocks of size one',
  source: 'common practice',
  examples: [
    [[[1, 2, 3]], 0],
    [[[1, 3], [2]], 1],
    [[[1], [2], [3]], 3],
  ],
  compute(p) {
    let s = 0;
    for (const b of p) if (b.length === 1) s++;
    return s;
  },
};

export const crossings: Statistic<SetPartition> = {
  id: 'crossings',
  family: 'set-partitions',
  description: 'pairs of arcs (a,b), (c,d) with a < c < b < d',
  source: 'Chen–Deng–Du–Stanley–Yan, Trans. Amer. Math. Soc. 359 (2007)',
  examples: [
    [[[1, 3], [2, 4]], 1],
    [[[1, 4], [2, 3]], 0],
    [[[1, 3, 5], [2, 4]], 2],
  ],
  compute(p) {
    const [from, to] = arcs(p);
    let s = 0;
    for (let i = 0; i < from.length; i++) {
      for (let j = 0; j < from.length; j++) {
        if (from[i]! < from[j]! && from[j]! < to[i]! && to[i]! < to[j]!) s++;
      }
    }
    return s;
  },
};

export const nestings: Statistic<SetPartition> = {
  id: 'nestings',
  family: 'set-partitions',
  description: 'pairs of arcs (a,b), (c,d) with a < c < d < b',
  source: 'Chen–Deng–Du–Stanley–Yan, Trans. Amer. Math. Soc. 359 (2007)',
  examples: [
    [[[1, 3], [2, 4]], 0],
    [[[1, 4], [2, 3]], 1],
    [[[1, 5], [2, 3, 4]], 2],
  ],
  compute(p) {
    const [from, to] = arcs(p);
    let s = 0;
    for (let i = 0; i < from.length; i++) {
      for (let j = 0; j < from.length; j++) {
        if (from[i]! < from[j]! && to[j]! < to[i]!) s++;
      }
    }
    return s;
  },
};
