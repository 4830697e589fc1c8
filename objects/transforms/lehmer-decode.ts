/** The inverse of the Lehmer code: from the right, w(i) is the (e_i + 1)-th largest value still unused. */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { InversionSequence, Permutation } from '../types.js';

export function permutationOfLehmerCode(e: InversionSequence): number[] {
  const unused = Array.from({ length: e.length }, (_, i) => i + 1);
  const w = new Array<number>(e.length);
  for (let i = e.length - 1; i >= 0; i--) w[i] = unused.splice(unused.length - 1 - e[i]!, 1)[0]!;
  return w;
}

export const lehmerDecode: Transform<InversionSequence, Permutation> = {
  id: 'lehmer-decode',
  from: 'inversion-sequences',
  to: 'permutations',
  description: 'the permutation whose Lehmer code is e (right to left, take the (e_i + 1)-th largest unused value)',
  source: 'Lehmer (1960); Stanley, EC1 §1.3 (inversion tables)',
  examples: [
    [[0, 0, 0], [1, 2, 3]],
    [[0, 1, 1], [3, 1, 2]],
    [[0, 0, 2, 1], [2, 4, 1, 3]],
  ],
  apply: permutationOfLehmerCode,
};
