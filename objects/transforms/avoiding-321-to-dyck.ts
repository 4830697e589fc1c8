/**
 * Krattenthaler's bijection, 321-avoiding permutations → Dyck paths: the left-to-right maxima
 * m_j at positions p_j give the path U^{m_1} D^{p_2 − p_1} U^{m_2 − m_1} … D^{n + 1 − p_k}
 * (U = north, D = east). Left-to-right maxima become peaks.
 */
import type { Transform } from '../../src/enumerate/plugin.js';
import { dyckOf321Avoiding } from '../support/avoiding-321.js';
import type { DyckPath, Permutation } from '../types.js';

export const avoiding321ToDyck: Transform<Permutation, DyckPath> = {
  id: '321-avoiding-to-dyck',
  from: '321-avoiding-permutations',
  to: 'dyck-paths',
  description: 'the Dyck path whose peaks sit at the left-to-right maxima: up to each maximum value, east to the next maximum position',
  source: 'Krattenthaler, "Permutations with restricted patterns and Dyck paths", Adv. in Appl. Math. 27 (2001) (from memory)',
  examples: [
    [[1, 2, 3], [1, 0, 1, 0, 1, 0]],
    [[1, 3, 2], [1, 0, 1, 1, 0, 0]],
    [[2, 3, 1], [1, 1, 0, 1, 0, 0]],
    [[3, 1, 2], [1, 1, 1, 0, 0, 0]],
  ],
  apply: dyckOf321Avoiding,
};
