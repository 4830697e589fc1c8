/** The prefix walks (fast path) agree with plain enumeration, statistic by statistic. */
import { describe, expect, it } from 'vitest';
import { Tally } from '../../src/enumerate/tally.js';
import { computeDistribution } from '../../src/enumerate/distribution.js';
import { walkOrderedSetPartitions } from '../../src/enumerate/fast/osp-walk.js';
import { walkPermutations } from '../../src/enumerate/fast/permutation-walk.js';
import { walkWords } from '../../src/enumerate/fast/word-walk.js';
import { STATISTICS } from '../../statistics/index.js';
import { inversions } from '../../statistics/inversions.js';
import { majorIndex } from '../../statistics/major-index.js';
import { ospInv } from '../../statistics/osp-inv.js';

const stepped = STATISTICS.filter((s) => s.step);

async function both(family: string, params: Record<string, number>, statistics: string[]): Promise<[string, string, string]> {
  const fast = await computeDistribution({ family, params, statistics }, { workers: 1 });
  const slow = await computeDistribution({ family, params, statistics, generic: true }, { workers: 1 });
  return [fast.series.toString(), slow.series.toString(), fast.provenance.method];
}

describe('prefix walks', () => {
  it('every statistic with a step gives the same distribution as its compute (n ≤ 7; ordered set partitions n ≤ 6, all k)', async () => {
    expect(stepped.length).toBeGreaterThanOrEqual(10);
    for (const s of stepped) {
      if (s.family === 'permutations') {
        for (let n = 0; n <= 7; n++) {
          const [a, b, method] = await both('permutations', { n }, [s.id]);
          expect(a, `${s.id} n=${n}`).toBe(b);
          expect(method).toContain('prefix walk');
        }
      } else if (s.family === 'words') {
        for (const content of [[], [2], [2, 1], [1, 2, 2], [3, 0, 2], [2, 2, 1, 1]]) {
          const fast = await computeDistribution({ family: 'words', params: { content }, statistics: [s.id] }, { workers: 1 });
          const slow = await computeDistribution({ family: 'words', params: { content }, statistics: [s.id], generic: true }, { workers: 1 });
          expect(fast.series.toString(), `${s.id} ${content.join(',')}`).toBe(slow.series.toString());
          expect(fast.provenance.method).toContain('prefix walk');
        }
      } else {
        expect(s.family).toBe('ordered-set-partitions');
        for (let n = 0; n <= 6; n++) {
          for (let k = 0; k <= n; k++) {
            const [a, b] = await both('ordered-set-partitions', { n, k }, [s.id]);
            expect(a, `${s.id} n=${n} k=${k}`).toBe(b);
          }
        }
      }
    }
  });

  it('joint distributions of two stepped statistics agree (inv, maj) and (exc, des)', async () => {
    for (let n = 1; n <= 6; n++) {
      for (const pair of [['inversions', 'major-index'], ['excedances', 'descents'], ['inverse-major-index', 'left-to-right-maxima']]) {
        const [a, b] = await both('permutations', { n }, pair);
        expect(a, `${pair.join(',')} n=${n}`).toBe(b);
      }
    }
  });

  it('shards partition the walk: the shard tallies add up to the whole, for 1 to 5 shards', () => {
    for (const count of [1, 2, 3, 5]) {
      const whole = new Tally();
      walkPermutations(6, inversions.step!, majorIndex.step!, (a, b) => whole.add(a, b));
      const parts = new Tally();
      for (let index = 0; index < count; index++) walkPermutations(6, inversions.step!, majorIndex.step!, (a, b) => parts.add(a, b), { index, count });
      expect(parts.toPoly().equals(whole.toPoly())).toBe(true);
      const ow = new Tally();
      walkOrderedSetPartitions(6, 3, ospInv.step!, () => 0, (a, b) => ow.add(a, b));
      const op = new Tally();
      for (let index = 0; index < count; index++) walkOrderedSetPartitions(6, 3, ospInv.step!, () => 0, (a, b) => op.add(a, b), { index, count });
      expect(op.toPoly().equals(ow.toPoly())).toBe(true);
      expect(op.total).toBe(540); // 3!·S(6,3) = 6·90
      const ww = new Tally();
      walkWords([2, 1, 2], inversions.step!, majorIndex.step!, (a, b) => ww.add(a, b));
      const wp = new Tally();
      for (let index = 0; index < count; index++) walkWords([2, 1, 2], inversions.step!, majorIndex.step!, (a, b) => wp.add(a, b), { index, count });
      expect(wp.toPoly().equals(ww.toPoly())).toBe(true);
      expect(wp.total).toBe(30); // 5!/(2!·1!·2!)
    }
  });
});
