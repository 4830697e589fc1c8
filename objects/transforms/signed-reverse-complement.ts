/**
 * Reverse-complement keeping signs: w ↦ w₀ᴬ w w₀ᴬ with w₀ᴬ = n … 1 (the longest element of
 * S_n ⊂ B_n), i.e. v(i) = ±(n + 1 − |w(n + 1 − i)|) with the sign of w(n + 1 − i).
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { SignedPermutation } from '../types.js';

export const signedReverseComplement: Transform<SignedPermutation, SignedPermutation> = {
  id: 'signed-reverse-complement',
  from: 'signed-permutations',
  to: 'signed-permutations',
  description: 'conjugation by n … 1: positions and absolute values both turned around, signs travel with their letters',
  source: 'common practice (conjugation by the longest element of the parabolic subgroup S_n, Björner–Brenti §8.1)',
  examples: [
    [[1, 2], [1, 2]],
    [[2, -3, 1], [3, -1, 2]],
    [[-1, 2], [1, -2]],
  ],
  apply: (w) => w.map((_, i) => {
    const x = w[w.length - 1 - i]!;
    return Math.sign(x) * (w.length + 1 - Math.abs(x));
  }),
  involution: true,
};
