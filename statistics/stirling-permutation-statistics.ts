/**
 * Statistics on Stirling permutations w_1 … w_{2n}. Descents are counted with w_{2n+1} = 0 and
 * ascents with w_0 = 0, as in Gessel–Stanley, "Stirling polynomials", J. Combin. Theory Ser. A
 * 24 (1978) (descents give the second-order Eulerian numbers) and Bóna, "Real zeros and normal
 * distribution for statistics on Stirling permutations defined by Gessel and Stanley",
 * SIAM J. Discrete Math. 23 (2008) (descents, ascents and plateaux are equidistributed).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { StirlingPermutation } from '../objects/types.js';

const GS = 'Gessel–Stanley, J. Combin. Theory Ser. A 24 (1978)';
const BONA = 'Bóna, SIAM J. Discrete Math. 23 (2008)';

export const stirlingDescents: Statistic<StirlingPermutation> = {
  id: 'stirling-descents',
  family: 'stirling-permutations',
  description: 'number of i in 1..2n with w_i > w_{i+1}, where w_{2n+1} = 0 (second-order Eulerian numbers)',
  source: `${GS}; ${BONA}`,
  examples: [[[], 0], [[1, 1], 1], [[1, 1, 2, 2], 1], [[1, 2, 2, 1], 2], [[2, 2, 1, 1], 2], [[1, 2, 2, 1, 3, 3], 2]],
  compute(w) {
    let s = 0;
    for (let i = 0; i < w.length; i++) if (w[i]! > (w[i + 1] ?? 0)) s++;
    return s;
  },
};

export const stirlingAscents: Statistic<StirlingPermutation> = {
  id: 'stirling-ascents',
  family: 'stirling-permutations',
  description: 'number of i in 0..2n−1 with w_i < w_{i+1}, where w_0 = 0',
  source: BONA,
  examples: [[[], 0], [[1, 1], 1], [[1, 1, 2, 2], 2], [[1, 2, 2, 1], 2], [[2, 2, 1, 1], 1], [[1, 2, 2, 1, 3, 3], 3]],
  compute(w) {
    let s = 0;
    for (let i = 0; i < w.length; i++) if ((i === 0 ? 0 : w[i - 1]!) < w[i]!) s++;
    return s;
  },
};

export const stirlingPlateaux: Statistic<StirlingPermutation> = {
  id: 'stirling-plateaux',
  family: 'stirling-permutations',
  description: 'number of i with w_i = w_{i+1} (the leaves of the increasing plane tree)',
  source: `${BONA}; Janson, DMTCS Proc. AI (2008)`,
  examples: [[[], 0], [[1, 1], 1], [[1, 1, 2, 2], 2], [[1, 2, 2, 1], 1], [[2, 2, 1, 1], 2], [[1, 2, 2, 1, 3, 3], 2]],
  compute(w) {
    let s = 0;
    for (let i = 0; i + 1 < w.length; i++) if (w[i] === w[i + 1]) s++;
    return s;
  },
};

export const stirlingInversions: Statistic<StirlingPermutation> = {
  id: 'stirling-inversions',
  family: 'stirling-permutations',
  description: 'pairs of positions i < j with w_i > w_j',
  source: 'common practice (inversions of a word; Park, "The r-multipermutations", J. Combin. Theory Ser. A 67 (1994), from memory)',
  examples: [[[], 0], [[1, 1], 0], [[1, 1, 2, 2], 0], [[1, 2, 2, 1], 2], [[2, 2, 1, 1], 4], [[1, 2, 2, 1, 3, 3], 2]],
  compute(w) {
    let s = 0;
    for (let i = 0; i < w.length; i++) for (let j = i + 1; j < w.length; j++) if (w[i]! > w[j]!) s++;
    return s;
  },
};
