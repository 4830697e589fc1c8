/**
 * Statistics on Tesler matrices (Haglund, "A polynomial expression for the Hilbert series of
 * the quotient ring of diagonal coinvariants", Adv. Math. 227 (2011)). Haglund's weight
 * (−M)^{pos−n} Π_{a_ij>0} [a_ij]_{q,t} is not a plain statistic; pos, the number of positive
 * entries, is (the tests check the weighted sum against the Hilbert series of ∇e_n).
 */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { TeslerMatrix } from '../objects/types.js';

const FAMILY = 'tesler-matrices';
const HAGLUND = 'Haglund, Adv. Math. 227 (2011)';
const I2: TeslerMatrix = [[1, 0], [0, 1]];
const A2: TeslerMatrix = [[0, 1], [0, 2]];
const A3: TeslerMatrix = [[0, 1, 0], [0, 0, 2], [0, 0, 3]];
const B3: TeslerMatrix = [[0, 0, 1], [0, 1, 0], [0, 0, 2]];

const entries = (m: TeslerMatrix): number[] => m.flatMap((r, i) => r.slice(i));

export const teslerPositive: Statistic<TeslerMatrix> = {
  id: 'tesler-positive-entries',
  family: FAMILY,
  description: 'number of positive entries (pos in the weight (−M)^{pos−n})',
  source: HAGLUND,
  examples: [
    [I2, 2],
    [A2, 2],
    [A3, 3],
    [B3, 3],
  ],
  compute: (m) => entries(m).filter((x) => x > 0).length,
};

export const teslerPositiveOffDiagonal: Statistic<TeslerMatrix> = {
  id: 'tesler-positive-off-diagonal',
  family: FAMILY,
  description: 'number of positive entries above the diagonal',
  source: 'common practice',
  examples: [
    [I2, 0],
    [A2, 1],
    [A3, 2],
  ],
  compute: (m) => m.reduce((s, r, i) => s + r.slice(i + 1).filter((x) => x > 0).length, 0),
};

export const teslerZeroDiagonal: Statistic<TeslerMatrix> = {
  id: 'tesler-zero-diagonal',
  family: FAMILY,
  description: 'number of zero diagonal entries',
  source: 'common practice',
  examples: [
    [I2, 0],
    [A2, 1],
    [A3, 2],
    [B3, 1],
  ],
  compute: (m) => m.filter((r, i) => r[i] === 0).length,
};

export const teslerLargestEntry: Statistic<TeslerMatrix> = {
  id: 'tesler-largest-entry',
  family: FAMILY,
  description: 'largest entry',
  source: 'common practice',
  examples: [
    [I2, 1],
    [A2, 2],
    [A3, 3],
  ],
  compute: (m) => entries(m).reduce((a, b) => Math.max(a, b), 0),
};

export const teslerLastDiagonal: Statistic<TeslerMatrix> = {
  id: 'tesler-last-diagonal',
  family: FAMILY,
  description: 'the last diagonal entry a_nn (1 plus all that flows into the last column)',
  source: 'common practice',
  examples: [
    [I2, 1],
    [A2, 2],
    [B3, 2],
  ],
  compute: (m) => m[m.length - 1]?.[m.length - 1] ?? 0,
};

export const teslerEntrySum: Statistic<TeslerMatrix> = {
  id: 'tesler-entry-sum',
  family: FAMILY,
  description: 'sum of all entries',
  source: 'common practice',
  examples: [
    [I2, 2],
    [A2, 3],
    [A3, 6],
    [B3, 4],
  ],
  compute: (m) => entries(m).reduce((a, b) => a + b, 0),
};

export const teslerDiagonalOnes: Statistic<TeslerMatrix> = {
  id: 'tesler-diagonal-ones',
  family: FAMILY,
  description: 'number of diagonal entries equal to 1',
  source: 'common practice',
  examples: [
    [I2, 2],
    [A2, 0],
    [A3, 0],
    [B3, 1],
  ],
  compute: (m) => m.filter((r, i) => r[i] === 1).length,
};

export const teslerLastColumnPositive: Statistic<TeslerMatrix> = {
  id: 'tesler-last-column-positive',
  family: FAMILY,
  description: 'number of positive entries in the last column',
  source: 'common practice',
  examples: [
    [I2, 1],
    [A2, 2],
    [A3, 2],
    [B3, 2],
  ],
  compute: (m) => m.filter((r) => r[r.length - 1]! > 0).length,
};
