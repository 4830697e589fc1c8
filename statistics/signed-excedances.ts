/**
 * Excedance-type statistics of signed permutations and the natural major index. The flag
 * excedance fexc = 2·exc + neg has the law of fdes, and Brenti's type B excedances the law of
 * the type B descents (both checked in test/statistics/library-b-signed.test.ts).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { SignedPermutation } from '../objects/types.js';

/** w(x) for x ∈ ±[n], with w(−x) = −w(x). */
const at = (w: SignedPermutation, x: number): number => (x > 0 ? w[x - 1]! : -w[-x - 1]!);

export const flagExcedances: Statistic<SignedPermutation> = {
  id: 'flag-excedances',
  family: 'signed-permutations',
  description: 'fexc = 2·#{i : w(i) > i} + neg',
  source: 'Foata–Han, "Signed words and permutations, IV: fixed and pixed points", Israel J. Math. 163 (2008) (from memory); Adin–Brenti–Roichman (2001)',
  examples: [[[], 0], [[2, 1], 2], [[-1, 2], 1], [[-2, -1], 2], [[-3, 1, 2], 1], [[2, -3, 1], 3]],
  compute: (w) => w.reduce((s, x, i) => s + (x > i + 1 ? 2 : 0) + (x < 0 ? 1 : 0), 0),
};

export const typeBExcedances: Statistic<SignedPermutation> = {
  id: 'type-b-excedances',
  family: 'signed-permutations',
  description: 'Brenti\'s excedances of type B: #{i : w(|w(i)|) > w(i)} + #{i : w(i) = −i}',
  source: 'Brenti, "q-Eulerian polynomials arising from Coxeter groups", Europ. J. Combin. 15 (1994) (from memory)',
  examples: [[[], 0], [[1, 2], 0], [[2, 1], 1], [[-1, 2], 1], [[-2, -1], 1], [[-1, -2], 2], [[2, -3, 1], 2]],
  compute: (w) => w.reduce((s, x, i) => s + (at(w, Math.abs(x)) > x ? 1 : 0) + (x === -(i + 1) ? 1 : 0), 0),
};

export const signedMajorIndex: Statistic<SignedPermutation> = {
  id: 'signed-major-index',
  family: 'signed-permutations',
  description: 'sum of the positions i in 1..n−1 with w(i) > w(i+1) in the usual order (the type B descents other than 0)',
  source: 'common practice (Björner–Brenti, GTM 231, §8.1; nmaj − nsum in Adin–Brenti–Roichman 2001)',
  examples: [[[], 0], [[2, 1], 1], [[-1, 2], 0], [[1, -2], 1], [[-1, -2], 1], [[3, -1, -2], 3], [[2, -3, 1], 1]],
  compute(w) {
    let s = 0;
    for (let i = 0; i + 1 < w.length; i++) if (w[i]! > w[i + 1]!) s += i + 1;
    return s;
  },
};
