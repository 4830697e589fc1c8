/** Reflection of a matching of [2n]: every point i becomes 2n + 1 − i (keeps crossings and nestings). */
import type { Transform } from '../../src/enumerate/plugin.js';
import type { PerfectMatching } from '../types.js';

export const matchingReverse: Transform<PerfectMatching, PerfectMatching> = {
  id: 'matching-reverse',
  from: 'perfect-matchings',
  to: 'perfect-matchings',
  description: 'the mirror image i ↦ 2n + 1 − i of the arc diagram',
  source: 'common practice',
  examples: [
    [[2, 1], [2, 1]],
    [[3, 4, 1, 2], [3, 4, 1, 2]],
    [[4, 3, 2, 1, 6, 5], [2, 1, 6, 5, 4, 3]],
  ],
  apply: (m) => m.map((_, i) => m.length + 1 - m[m.length - 1 - i]!),
  involution: true,
};
