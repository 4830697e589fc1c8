/** Excedances and weak excedances of a permutation. */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Permutation } from '../objects/types.js';

export const excedances: Statistic<Permutation> = {
  id: 'excedances',
  family: 'permutations',
  description: 'number of i with w(i) > i',
  source: 'standard (Stanley, EC1 §1.4; MacMahon): Eulerian like descents',
  examples: [
    [[1, 2, 3], 0],
    [[2, 3, 1], 2],
    [[3, 1, 4, 2], 2],
    [[4, 3, 2, 1], 2],
  ],
  step: (at, v) => (v > at + 1 ? 1 : 0),
  compute(w) {
    let s = 0;
    for (let i = 0; i < w.length; i++) if (w[i]! > i + 1) s++;
    return s;
  },
};

export const weakExcedances: Statistic<Permutation> = {
  id: 'weak-excedances',
  family: 'permutations',
  description: 'number of i with w(i) ≥ i',
  source: 'standard (Stanley, EC1 §1.4)',
  examples: [
    [[1, 2, 3], 3],
    [[2, 3, 1], 2],
    [[3, 1, 4, 2], 2],
    [[4, 3, 2, 1], 2],
  ],
  step: (at, v) => (v >= at + 1 ? 1 : 0),
  compute(w) {
    let s = 0;
    for (let i = 0; i < w.length; i++) if (w[i]! >= i + 1) s++;
    return s;
  },
};
