/** The Lehmer code by positions: e_i = #{j < i : w(j) > w(i)}, a bijection S_n → inversion sequences with Σ e_i = inv(w). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { InversionSequence, Permutation } from '../types.js';

export function lehmerCodeOf(w: Permutation): number[] {
  return w.map((x, i) => {
    let s = 0;
    for (let j = 0; j < i; j++) if (w[j]! > x) s++;
    return s;
  });
}

export const lehmerCode: Transform<Permutation, InversionSequence> = {
  id: 'lehmer-code',
  from: 'permutations',
  to: 'inversion-sequences',
  description: 'the inversion sequence e_i = number of larger entries to the left of w(i) (sum = inversions, zeros = left-to-right maxima)',
  source: 'Lehmer (1960); Stanley, EC1 §1.3 (inversion tables); Savage–Schuster, J. Combin. Theory Ser. A 119 (2012)',
  examples: [
    [[1, 2, 3], [0, 0, 0]],
    [[3, 2, 1], [0, 1, 2]],
    [[3, 1, 2], [0, 1, 1]],
    [[2, 4, 1, 3], [0, 0, 2, 1]],
  ],
  apply: lehmerCodeOf,
};
