/** Statistics on compositions of n. */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { CompositionObj } from '../objects/types.js';

export const compositionParts: Statistic<CompositionObj> = {
  id: 'composition-parts',
  family: 'compositions',
  description: 'number of parts',
  source: 'standard (Stanley, EC1 §1.2: binomial(n−1, k−1) with k parts)',
  examples: [
    [[], 0],
    [[3], 1],
    [[1, 2, 1], 3],
  ],
  compute: (c) => c.length,
};

export const compositionLargestPart: Statistic<CompositionObj> = {
  id: 'composition-largest-part',
  family: 'compositions',
  description: 'largest part (0 for the empty composition)',
  source: 'common practice',
  examples: [
    [[], 0],
    [[1, 3, 2], 3],
    [[1, 1], 1],
  ],
  compute(c) {
    let m = 0;
    for (const x of c) if (x > m) m = x;
    return m;
  },
};

export const compositionMajorIndex: Statistic<CompositionObj> = {
  id: 'composition-major-index',
  family: 'compositions',
  description: 'sum of the partial sums c1, c1+c2, … before the last part (major index of its descent set)',
  source: 'standard (Stanley, EC1 §1.2: compositions ↔ subsets of [n−1])',
  examples: [
    [[3], 0],
    [[1, 2], 1],
    [[1, 2, 1], 4],
    [[2, 1, 1], 5],
  ],
  compute(c) {
    let s = 0;
    let partial = 0;
    for (let i = 0; i < c.length - 1; i++) {
      partial += c[i]!;
      s += partial;
    }
    return s;
  },
};
