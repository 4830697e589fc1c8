/** Sums by shape (on a small hand-made family) and errors raised inside worker threads. */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { computeDistribution } from '../../src/enumerate/distribution.js';
import type { Family, Statistic } from '../../src/enumerate/plugin.js';
import { runShard } from '../../src/enumerate/run-shard.js';

/** Three objects with shapes (2), (1,1), (1,1) and values 0, 1, 2. */
const tiny: Family<number> = {
  id: 'tiny',
  description: 'three numbered objects',
  source: 'test',
  params: [],
  validate() {},
  *generate() {
    yield* [0, 1, 2];
  },
  count: () => 3n,
  render: String,
  sample: () => 0,
  key: String,
  shape: (x) => (x === 0 ? [2] : [1, 1]),
  testParams: [{}],
};
const value: Statistic<number> = { id: 'value', family: 'tiny', description: 'the number', source: 'test', examples: [[1, 1]], compute: (x) => x };

describe('Frobenius-level sums by shape', () => {
  it('keeps Σ q^stat s_shape as a map from shapes to polynomials', () => {
    const out = runShard({ request: { family: 'tiny', params: {}, statistics: ['value'], frobenius: 'shapes' }, family: tiny as Family<unknown>, statistics: [value as Statistic<unknown>] });
    const byShape = new Map(out.frobenius!.map(([k, triples]) => [k, triples.map(([a, , c]) => [a, c])]));
    expect(byShape.get('2')).toEqual([[0, 1]]);
    expect(byShape.get('1,1')).toEqual([
      [1, 1],
      [2, 1],
    ]);
    expect(out.visited).toBe(3);
  });
});

describe('errors inside workers', () => {
  it('an InputError raised in a worker reaches the caller as an InputError (charge needs a partition content)', async () => {
    const req = { family: 'words', params: { content: [1, 2] }, statistics: ['word-charge'] };
    await expect(computeDistribution(req, { workers: 2 })).rejects.toThrow(InputError);
    await expect(computeDistribution(req, { workers: 1 })).rejects.toThrow(/partition content/);
  }, 30_000);
});
