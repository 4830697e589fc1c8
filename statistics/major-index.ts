/** Major index of a permutation and of its inverse. */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Permutation } from '../objects/types.js';

export const majorIndex: Statistic<Permutation> = {
  id: 'major-index',
  family: 'permutations',
  description: 'sum of the descents i (w(i) > w(i+1))',
  source: 'MacMahon (1915); Stanley, EC1 §1.4',
  examples: [
    [[1, 2, 3], 0],
    [[2, 1, 3], 1],
    [[3, 1, 4, 2], 4],
    [[4, 3, 2, 1], 6],
  ],
  step: (at, v, prev) => (prev > v ? at : 0),
  compute(w) {
    let s = 0;
    for (let i = 1; i < w.length; i++) if (w[i - 1]! > w[i]!) s += i;
    return s;
  },
};

export const inverseMajorIndex: Statistic<Permutation> = {
  id: 'inverse-major-index',
  family: 'permutations',
  description: 'major index of the inverse: sum of the i such that i+1 stands left of i',
  source: 'standard (Stanley, EC1 §1.4; Foata–Schützenberger 1978)',
  examples: [
    [[1, 2, 3], 0],
    [[2, 3, 1], 1],
    [[3, 1, 4, 2], 2],
    [[4, 3, 2, 1], 6],
  ],
  step: (_at, v, _prev, _rank, placed) => ((placed >>> v) & 1 ? v : 0), // v+1 placed before v
  compute(w) {
    const n = w.length;
    const pos = new Int32Array(n + 2);
    for (let i = 0; i < n; i++) pos[w[i]!] = i;
    let s = 0;
    for (let v = 1; v < n; v++) if (pos[v + 1]! < pos[v]!) s += v;
    return s;
  },
};
