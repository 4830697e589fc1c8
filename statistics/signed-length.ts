/**
 * Length and inversion-type statistics of signed permutations (window notation, natural order
 * on the integers). Björner–Brenti, Combinatorics of Coxeter Groups, GTM 231, Prop. 8.1.1:
 * ℓ_B(w) = inv(w) + neg(w) + nsp(w) = inv(w) + nsum(w).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { SignedPermutation } from '../objects/types.js';

const BB = 'Björner–Brenti, Combinatorics of Coxeter Groups, GTM 231, §8.1';

function inv(w: SignedPermutation): number {
  let s = 0;
  for (let i = 0; i < w.length; i++) for (let j = i + 1; j < w.length; j++) if (w[i]! > w[j]!) s++;
  return s;
}
function nsp(w: SignedPermutation): number {
  let s = 0;
  for (let i = 0; i < w.length; i++) for (let j = i + 1; j < w.length; j++) if (w[i]! + w[j]! < 0) s++;
  return s;
}
const neg = (w: SignedPermutation): number => w.reduce((s, x) => (x < 0 ? s + 1 : s), 0);
const nsum = (w: SignedPermutation): number => w.reduce((s, x) => (x < 0 ? s - x : s), 0);

export const signedLength: Statistic<SignedPermutation> = {
  id: 'signed-length',
  family: 'signed-permutations',
  description: 'Coxeter length in B_n: inversions + negative entries + pairs i < j with w(i) + w(j) < 0',
  source: `${BB}, Prop. 8.1.1`,
  examples: [[[], 0], [[2, 1], 1], [[-1, 2], 1], [[-2, -1], 3], [[-3, 1, 2], 3], [[2, -3, 1], 5]],
  compute: (w) => inv(w) + neg(w) + nsp(w),
};

export const signedInversions: Statistic<SignedPermutation> = {
  id: 'signed-inversions',
  family: 'signed-permutations',
  description: 'pairs i < j with w(i) > w(j) in the usual order of the integers',
  source: `${BB} (inv of the window)`,
  examples: [[[], 0], [[2, 1], 1], [[-2, -1], 0], [[-3, 1, 2], 0], [[2, -3, 1], 2]],
  compute: inv,
};

export const negativeSumPairs: Statistic<SignedPermutation> = {
  id: 'negative-sum-pairs',
  family: 'signed-permutations',
  description: 'pairs i < j with w(i) + w(j) < 0',
  source: `${BB} (nsp)`,
  examples: [[[], 0], [[-1, 2], 0], [[-2, -1], 1], [[-3, 1, 2], 2], [[2, -3, 1], 2]],
  compute: nsp,
};

export const negatives: Statistic<SignedPermutation> = {
  id: 'negatives',
  family: 'signed-permutations',
  description: 'number of negative entries',
  source: `${BB} (neg); Adin–Roichman, Europ. J. Combin. 22 (2001)`,
  examples: [[[], 0], [[2, 1], 0], [[-1, 2], 1], [[-2, -1], 2], [[2, -3, 1], 1]],
  compute: neg,
};

export const negativeSum: Statistic<SignedPermutation> = {
  id: 'negative-sum',
  family: 'signed-permutations',
  description: 'minus the sum of the negative entries (|w(i)| summed over w(i) < 0)',
  source: `${BB}, Prop. 8.1.1; Adin–Brenti–Roichman, Adv. in Appl. Math. 27 (2001)`,
  examples: [[[], 0], [[-1, 2], 1], [[-2, -1], 3], [[-3, 1, 2], 3], [[2, -3, 1], 3]],
  compute: nsum,
};

export const flagInversions: Statistic<SignedPermutation> = {
  id: 'flag-inversions',
  family: 'signed-permutations',
  description: 'twice the inversions (usual order) plus the negative entries: 2·inv + neg',
  source: 'Foata–Han, "Signed words and permutations, I: a fundamental transformation", Proc. Amer. Math. Soc. 135 (2007) (from memory)',
  examples: [[[], 0], [[2, 1], 2], [[-1, 2], 1], [[-2, -1], 2], [[2, -3, 1], 5]],
  compute: (w) => 2 * inv(w) + neg(w),
};

export const signedFixedPoints: Statistic<SignedPermutation> = {
  id: 'signed-fixed-points',
  family: 'signed-permutations',
  description: 'number of i with w(i) = i',
  source: 'common practice (fixed points of the action on ±[n])',
  examples: [[[], 0], [[1, 2], 2], [[-1, 2], 1], [[-2, -1], 0], [[2, -3, 1], 0]],
  compute: (w) => w.reduce((s, x, i) => (x === i + 1 ? s + 1 : s), 0),
};

export const negatedFixedPoints: Statistic<SignedPermutation> = {
  id: 'negated-fixed-points',
  family: 'signed-permutations',
  description: 'number of i with w(i) = −i',
  source: 'common practice (points sent to their negatives)',
  examples: [[[], 0], [[1, 2], 0], [[-1, 2], 1], [[-1, -2], 2], [[2, -3, 1], 0]],
  compute: (w) => w.reduce((s, x, i) => (x === -(i + 1) ? s + 1 : s), 0),
};
