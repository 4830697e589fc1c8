/**
 * Descent-type statistics of signed permutations. The flag statistics of Adin–Roichman
 * ("The flag major index and group actions on polynomial rings", Europ. J. Combin. 22 (2001))
 * and Adin–Brenti–Roichman ("Descent numbers and major indices for the hyperoctahedral group",
 * Adv. in Appl. Math. 27 (2001)) compare letters in the order −1 < −2 < … < −n < 1 < … < n;
 * the type B descents of Björner–Brenti §8.1 use the usual order with w(0) = 0.
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { SignedPermutation } from '../objects/types.js';

/** A key realising −1 < −2 < … < −n < 1 < … < n (any n below 2^20). */
const flagKey = (x: number): number => (x > 0 ? x : -x - (1 << 20));

/** [number of descents, major index] of the window under the key. */
function desMaj(w: SignedPermutation, key: (x: number) => number): [number, number] {
  let d = 0;
  let m = 0;
  for (let i = 0; i + 1 < w.length; i++) {
    if (key(w[i]!) > key(w[i + 1]!)) {
      d++;
      m += i + 1;
    }
  }
  return [d, m];
}
const neg = (w: SignedPermutation): number => w.reduce((s, x) => (x < 0 ? s + 1 : s), 0);
const nsum = (w: SignedPermutation): number => w.reduce((s, x) => (x < 0 ? s - x : s), 0);
const usual = (x: number): number => x;

const AR = 'Adin–Roichman, Europ. J. Combin. 22 (2001)';
const ABR = 'Adin–Brenti–Roichman, Adv. in Appl. Math. 27 (2001)';

export const flagMajorIndex: Statistic<SignedPermutation> = {
  id: 'flag-major-index',
  family: 'signed-permutations',
  description: 'fmaj = 2·maj + neg, maj taken in the order −1 < −2 < … < −n < 1 < … < n',
  source: `${AR} (definition and equidistribution with length); ${ABR}`,
  examples: [[[], 0], [[2, 1], 2], [[-1, 2], 1], [[1, -2], 3], [[-1, -2], 2], [[-2, -1], 4], [[2, -3, 1], 3]],
  compute: (w) => 2 * desMaj(w, flagKey)[1] + neg(w),
};

export const flagDescents: Statistic<SignedPermutation> = {
  id: 'flag-descents',
  family: 'signed-permutations',
  description: 'fdes = 2·des + [w(1) < 0], des taken in the order −1 < −2 < … < −n < 1 < … < n',
  source: `${ABR} (fdes; (fdes, fmaj) is an Euler–Mahonian pair)`,
  examples: [[[], 0], [[2, 1], 2], [[-1, 2], 1], [[1, -2], 2], [[-1, -2], 1], [[-2, -1], 3], [[2, -3, 1], 2]],
  compute: (w) => 2 * desMaj(w, flagKey)[0] + (w.length > 0 && w[0]! < 0 ? 1 : 0),
};

export const typeBDescents: Statistic<SignedPermutation> = {
  id: 'type-b-descents',
  family: 'signed-permutations',
  description: 'descents of type B: i in 0..n−1 with w(i) > w(i+1), where w(0) = 0 (usual order)',
  source: 'Björner–Brenti, GTM 231, Prop. 8.1.2; Brenti, Europ. J. Combin. 15 (1994) (type B Eulerian polynomials)',
  examples: [[[], 0], [[2, 1], 1], [[-1, 2], 1], [[-1, -2], 2], [[-3, 1, 2], 1], [[2, -3, 1], 1]],
  compute: (w) => desMaj([0, ...w], usual)[0],
};

export const signedDescents: Statistic<SignedPermutation> = {
  id: 'signed-descents',
  family: 'signed-permutations',
  description: 'i in 1..n−1 with w(i) > w(i+1) in the usual order (position 0 not counted)',
  source: 'common practice (descents of the window)',
  examples: [[[], 0], [[2, 1], 1], [[-1, 2], 0], [[-1, -2], 1], [[-2, -1], 0], [[2, -3, 1], 1]],
  compute: (w) => desMaj(w, usual)[0],
};

export const negativeDescents: Statistic<SignedPermutation> = {
  id: 'negative-descents',
  family: 'signed-permutations',
  description: 'ndes = des + neg (des in the usual order, positions 1..n−1)',
  source: `${ABR} (negative statistics; our convention, whose pair with nmaj has the law of (fdes, fmaj), checked in the tests)`,
  examples: [[[], 0], [[2, 1], 1], [[-1, 2], 1], [[1, -2], 2], [[-1, -2], 3], [[-2, -1], 2], [[2, -3, 1], 2]],
  compute: (w) => desMaj(w, usual)[0] + neg(w),
};

export const negativeMajorIndex: Statistic<SignedPermutation> = {
  id: 'negative-major-index',
  family: 'signed-permutations',
  description: 'nmaj = maj + nsum (maj in the usual order, nsum minus the sum of the negative entries)',
  source: `${ABR} (negative major index; equidistributed with length)`,
  examples: [[[], 0], [[2, 1], 1], [[-1, 2], 1], [[1, -2], 3], [[-1, -2], 4], [[-2, -1], 3], [[2, -3, 1], 4]],
  compute: (w) => desMaj(w, usual)[1] + nsum(w),
};
