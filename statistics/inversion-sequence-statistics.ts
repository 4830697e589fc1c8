/**
 * Statistics on inversion sequences e_1 … e_n (0 ≤ e_i ≤ i − 1). Ascents are Eulerian
 * (Savage–Schuster, "Ehrhart series of lecture hall polytopes and Eulerian polynomials for
 * inversion sequences", J. Combin. Theory Ser. A 119 (2012)); the sum is Mahonian (it is the
 * number of inversions under the Lehmer code); distinct entries, zeros and right-to-left minima
 * as in Corteel–Martinez–Savage–Weselcouch, "Patterns in inversion sequences I",
 * Discrete Math. Theor. Comput. Sci. 18 (2016) (from memory).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { InversionSequence } from '../objects/types.js';

const SS = 'Savage–Schuster, J. Combin. Theory Ser. A 119 (2012)';
const CMSW = 'Corteel–Martinez–Savage–Weselcouch, Discrete Math. Theor. Comput. Sci. 18 (2016) (from memory)';

function adjacent(e: InversionSequence, test: (a: number, b: number) => boolean): number {
  let s = 0;
  for (let i = 0; i + 1 < e.length; i++) if (test(e[i]!, e[i + 1]!)) s++;
  return s;
}

export const inversionSequenceAscents: Statistic<InversionSequence> = {
  id: 'inversion-sequence-ascents',
  family: 'inversion-sequences',
  description: 'number of i with e_i < e_{i+1} (Eulerian distributed)',
  source: SS,
  examples: [[[], 0], [[0, 1, 2], 2], [[0, 0, 0], 0], [[0, 1, 0, 2], 2], [[0, 0, 2, 1], 1]],
  compute: (e) => adjacent(e, (a, b) => a < b),
};

export const inversionSequenceDescents: Statistic<InversionSequence> = {
  id: 'inversion-sequence-descents',
  family: 'inversion-sequences',
  description: 'number of i with e_i > e_{i+1}',
  source: CMSW,
  examples: [[[], 0], [[0, 1, 2], 0], [[0, 0, 0], 0], [[0, 1, 0, 2], 1], [[0, 0, 2, 1], 1]],
  compute: (e) => adjacent(e, (a, b) => a > b),
};

export const inversionSequencePlateaux: Statistic<InversionSequence> = {
  id: 'inversion-sequence-plateaux',
  family: 'inversion-sequences',
  description: 'number of i with e_i = e_{i+1}',
  source: CMSW,
  examples: [[[], 0], [[0, 1, 2], 0], [[0, 0, 0], 2], [[0, 1, 0, 2], 0], [[0, 0, 2, 1], 1]],
  compute: (e) => adjacent(e, (a, b) => a === b),
};

export const inversionSequenceDistinct: Statistic<InversionSequence> = {
  id: 'inversion-sequence-distinct',
  family: 'inversion-sequences',
  description: 'number of distinct values among the entries',
  source: CMSW,
  examples: [[[], 0], [[0, 1, 2], 3], [[0, 0, 0], 1], [[0, 1, 0, 2], 3], [[0, 1, 1, 0], 2]],
  compute: (e) => new Set(e).size,
};

export const inversionSequenceZeros: Statistic<InversionSequence> = {
  id: 'inversion-sequence-zeros',
  family: 'inversion-sequences',
  description: 'number of entries equal to 0 (left-to-right maxima under the Lehmer code)',
  source: CMSW,
  examples: [[[], 0], [[0, 1, 2], 1], [[0, 0, 0], 3], [[0, 1, 0, 2], 2], [[0, 0, 2, 1], 2]],
  compute: (e) => e.reduce((s, x) => (x === 0 ? s + 1 : s), 0),
};

export const inversionSequenceMax: Statistic<InversionSequence> = {
  id: 'inversion-sequence-max',
  family: 'inversion-sequences',
  description: 'the largest entry (0 for the empty sequence)',
  source: 'common practice (sequences with all e_i < k number k!·k^(n−k), Stanley EC1 §1.3 exercises, from memory)',
  examples: [[[], 0], [[0, 1, 2], 2], [[0, 0, 0], 0], [[0, 1, 1, 0], 1], [[0, 0, 2, 1], 2]],
  compute: (e) => e.reduce((m, x) => Math.max(m, x), 0),
};

export const inversionSequenceSum: Statistic<InversionSequence> = {
  id: 'inversion-sequence-sum',
  family: 'inversion-sequences',
  description: 'the sum of the entries (Mahonian: inversions of the permutation with this Lehmer code)',
  source: 'Stanley, EC1 §1.3 (inversion tables)',
  examples: [[[], 0], [[0, 1, 2], 3], [[0, 0, 0], 0], [[0, 1, 1, 0], 2], [[0, 0, 2, 1], 3]],
  compute: (e) => e.reduce((a, b) => a + b, 0),
};

export const inversionSequenceLast: Statistic<InversionSequence> = {
  id: 'inversion-sequence-last',
  family: 'inversion-sequences',
  description: 'the last entry e_n (0 for the empty sequence); uniform on 0..n−1',
  source: 'common practice',
  examples: [[[], 0], [[0, 1, 2], 2], [[0, 0, 0], 0], [[0, 1, 0, 2], 2], [[0, 0, 2, 1], 1]],
  compute: (e) => (e.length === 0 ? 0 : e[e.length - 1]!),
};

export const inversionSequenceRightMinima: Statistic<InversionSequence> = {
  id: 'inversion-sequence-right-minima',
  family: 'inversion-sequences',
  description: 'number of i with e_i < e_j for every j > i (strict right-to-left minima)',
  source: CMSW,
  examples: [[[], 0], [[0, 1, 2], 3], [[0, 0, 0], 1], [[0, 1, 0, 2], 2], [[0, 0, 2, 1], 2]],
  compute(e) {
    let s = 0;
    let min = Infinity;
    for (let i = e.length - 1; i >= 0; i--) {
      if (e[i]! < min) s++;
      min = Math.min(min, e[i]!);
    }
    return s;
  },
};

export const inversionSequenceFullEntries: Statistic<InversionSequence> = {
  id: 'inversion-sequence-full-entries',
  family: 'inversion-sequences',
  description: 'number of i with e_i = i − 1, the largest value allowed (left-to-right minima under the Lehmer code)',
  source: 'common practice (Stanley, EC1 §1.3: q(q+1)…(q+n−1) law, through the Lehmer code)',
  examples: [[[], 0], [[0, 1, 2], 3], [[0, 0, 0], 1], [[0, 1, 0, 2], 2], [[0, 0, 2, 1], 2]],
  compute: (e) => e.reduce((s, x, i) => (x === i ? s + 1 : s), 0),
};
