/** The inverse of 321-avoiding-to-dyck: peaks give the left-to-right maxima, the other values fill in increasingly. */
import type { Transform } from '../../src/enumerate/plugin.js';
import { avoiding321OfDyck } from '../support/avoiding-321.js';
import type { DyckPath, Permutation } from '../types.js';

export const dyckTo321Avoiding: Transform<DyckPath, Permutation> = {
  id: 'dyck-to-321-avoiding',
  from: 'dyck-paths',
  to: '321-avoiding-permutations',
  description: 'a peak after i east steps and v north steps puts the left-to-right maximum v at position i + 1; other values fill in increasingly',
  source: 'Krattenthaler, "Permutations with restricted patterns and Dyck paths", Adv. in Appl. Math. 27 (2001) (from memory)',
  examples: [
    [[1, 0, 1, 0], [1, 2]],
    [[1, 1, 0, 0, 1, 0], [2, 1, 3]],
    [[1, 1, 0, 1, 0, 0], [2, 3, 1]],
  ],
  apply: avoiding321OfDyck,
};
