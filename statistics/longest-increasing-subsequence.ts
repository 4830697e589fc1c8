/** Length of a longest increasing subsequence (patience sorting). */
import type { Statistic } from '../src/enumerate/plugin.js';
import type { Permutation } from '../objects/types.js';

export const longestIncreasingSubsequence: Statistic<Permutation> = {
  id: 'longest-increasing-subsequence',
  family: 'permutations',
  description: 'length of a longest increasing subsequence (first row of the RSK shape)',
  source: 'Schensted (1961); Stanley, EC2 §7.23',
  examples: [
    [[], 0],
    [[1, 2, 3], 3],
    [[3, 2, 1], 1],
    [[3, 1, 4, 2], 2],
    [[2, 4, 1, 3, 5], 3],
  ],
  compute(w) {
    const tops: number[] = [];
    for (const x of w) {
      let lo = 0;
      let hi = tops.length;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (tops[mid]! < x) lo = mid + 1;
        else hi = mid;
      }
      tops[lo] = x;
    }
    return tops.length;
  },
};
