/** Peaks and valleys of a permutation (interior positions). */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Permutation } from '../objects/types.js';

export const peaks: Statistic<Permutation> = {
  id: 'peaks',
  family: 'permutations',
  description: 'number of interior i with w(i−1) < w(i) > w(i+1)',
  source: 'standard (Stanley, EC1 §1.6; peak algebra literature)',
  examples: [
    [[1, 2, 3], 0],
    [[1, 3, 2], 1],
    [[3, 1, 4, 2], 1],
    [[1, 3, 2, 5, 4], 2],
  ],
  compute(w) {
    let s = 0;
    for (let i = 1; i < w.length - 1; i++) if (w[i - 1]! < w[i]! && w[i]! > w[i + 1]!) s++;
    return s;
  },
};

export const valleys: Statistic<Permutation> = {
  id: 'valleys',
  family: 'permutations',
  description: 'number of interior i with w(i−1) > w(i) < w(i+1)',
  source: 'standard (Stanley, EC1 §1.6)',
  examples: [
    [[1, 2, 3], 0],
    [[2, 1, 3], 1],
    [[3, 1, 4, 2], 1],
    [[3, 1, 4, 2, 5], 2],
  ],
  compute(w) {
    let s = 0;
    for (let i = 1; i < w.length - 1; i++) if (w[i - 1]! > w[i]! && w[i]! < w[i + 1]!) s++;
    return s;
  },
};
