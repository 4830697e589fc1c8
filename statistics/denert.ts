/**
 * Denert's statistic, in the form of Foata–Zeilberger, "Denert's permutation statistic
 * is indeed Euler-Mahonian", Stud. Appl. Math. 83 (1990): with E the excedance positions
 * (w(i) > i), den = Σ_{i∈E} i + inv(w restricted to E) + inv(w restricted to the rest).
 * (exc, den) has the joint distribution of (des, maj); the tests check this for n ≤ 7.
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Permutation } from '../objects/types.js';

export const denert: Statistic<Permutation> = {
  id: 'denert',
  family: 'permutations',
  description: "Denert's statistic: excedance positions plus inversions among excedance values and among the others",
  source: 'Denert (1990); Foata–Zeilberger, Stud. Appl. Math. 83 (1990)',
  examples: [
    [[1, 2, 3], 0],
    [[2, 1, 3], 1],
    [[2, 3, 1], 3],
    [[3, 1, 4, 2], 4],
    [[3, 2, 1], 2],
  ],
  compute(w) {
    const n = w.length;
    let s = 0;
    for (let i = 0; i < n; i++) {
      const x = w[i]!;
      const ex = x > i + 1;
      if (ex) s += i + 1;
      for (let j = i + 1; j < n; j++) if (w[j]! > j + 1 === ex && w[j]! < x) s++;
    }
    return s;
  },
};
