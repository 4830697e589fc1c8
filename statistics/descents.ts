/** Descents, ascents and inverse descents of a permutation. */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Permutation } from '../objects/types.js';

export const descents: Statistic<Permutation> = {
  id: 'descents',
  family: 'permutations',
  description: 'number of i with w(i) > w(i+1)',
  source: 'standard (Stanley, EC1 §1.4; Eulerian numbers)',
  examples: [
    [[], 0],
    [[1, 2, 3], 0],
    [[3, 1, 4, 2], 2],
    [[4, 3, 2, 1], 3],
  ],
  step: (_at, v, prev) => (prev > v ? 1 : 0),
  compute(w) {
    let s = 0;
    for (let i = 1; i < w.length; i++) if (w[i - 1]! > w[i]!) s++;
    return s;
  },
};

export const ascents: Statistic<Permutation> = {
  id: 'ascents',
  family: 'permutations',
  description: 'number of i with w(i) < w(i+1)',
  source: 'standard (Stanley, EC1 §1.4)',
  examples: [
    [[], 0],
    [[1, 2, 3], 2],
    [[3, 1, 4, 2], 1],
    [[4, 3, 2, 1], 0],
  ],
  step: (at, v, prev) => (at > 0 && prev < v ? 1 : 0),
  compute(w) {
    let s = 0;
    for (let i = 1; i < w.length; i++) if (w[i - 1]! < w[i]!) s++;
    return s;
  },
};

export const inverseDescents: Statistic<Permutation> = {
  id: 'inverse-descents',
  family: 'permutations',
  description: 'number of values i such that i+1 stands left of i (descents of the inverse)',
  source: 'standard (Stanley, EC1 §1.4)',
  examples: [
    [[1, 2, 3], 0],
    [[2, 3, 1], 1],
    [[3, 1, 4, 2], 1],
    [[4, 3, 2, 1], 3],
  ],
  step: (_at, v, _prev, _rank, placed) => (placed >>> v) & 1,
  compute(w) {
    const n = w.length;
    const pos = new Int32Array(n + 2);
    for (let i = 0; i < n; i++) pos[w[i]!] = i;
    let s = 0;
    for (let v = 1; v < n; v++) if (pos[v + 1]! < pos[v]!) s++;
    return s;
  },
};
