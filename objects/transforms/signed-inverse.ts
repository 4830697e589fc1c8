/** The inverse in B_n: w⁻¹(|w(i)|) = ±i, with the sign of w(i). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { SignedPermutation } from '../types.js';

export function signedInverseOf(w: SignedPermutation): number[] {
  const out = new Array<number>(w.length);
  w.forEach((x, i) => (out[Math.abs(x) - 1] = x > 0 ? i + 1 : -(i + 1)));
  return out;
}

export const signedInverse: Transform<SignedPermutation, SignedPermutation> = {
  id: 'signed-inverse',
  from: 'signed-permutations',
  to: 'signed-permutations',
  description: 'the inverse signed permutation (keeps the length and the number of negative entries)',
  source: 'Björner–Brenti, GTM 231, §8.1',
  examples: [
    [[2, 1], [2, 1]],
    [[2, -3, 1], [3, 1, -2]],
    [[-2, 3, 1], [3, -1, 2]],
  ],
  apply: signedInverseOf,
  involution: true,
};
