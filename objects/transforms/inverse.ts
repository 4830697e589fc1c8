/** The inverse of a permutation. */
import { inverse as inversePermutation } from '../../src/core/permutations.js';
import type { Transform } from '../../src/enumerate/plugin.js';
import type { Permutation } from '../types.js';

export const inverse: Transform<Permutation, Permutation> = {
  id: 'inverse',
  from: 'permutations',
  to: 'permutations',
  description: 'the inverse permutation w⁻¹ (w⁻¹(w(i)) = i)',
  source: 'standard (Stanley, EC1 §1.3)',
  examples: [
    [[2, 3, 1], [3, 1, 2]],
    [[3, 1, 4, 2], [2, 4, 1, 3]],
  ],
  apply: (w) => inversePermutation(w),
  involution: true,
};
