/** The distribution engine: limits, errors, Frobenius-level sums, workers. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, LimitError } from '../../src/core/errors.js';
import { Poly } from '../../src/core/poly.js';
import { qFactorial, qOrderedStirling } from '../../src/core/qanalogs.js';
import { descentSetOfKey, inverseDescentKey } from '../../src/enumerate/descent-key.js';
import { computeDistribution } from '../../src/enumerate/distribution.js';
import { Tally } from '../../src/enumerate/tally.js';

describe('distribution engine', () => {
  it('refuses past the limit with a LimitError naming the count and --max-objects', async () => {
    const run = computeDistribution({ family: 'permutations', params: { n: 13 }, statistics: ['inversions'] });
    await expect(run).rejects.toThrow(LimitError);
    await expect(run).rejects.toThrow(/6227020800 objects.*--max-objects/);
    await expect(computeDistribution({ family: 'permutations', params: { n: 5 }, statistics: ['inversions'] }, { maxObjects: 100n })).rejects.toThrow(/120 objects/);
  });

  it('names the nearest ids for unknown families, statistics and transforms, and mismatches', async () => {
    const bad = (family: string, statistics: string[], transform?: string): Promise<unknown> =>
      computeDistribution({ family, params: { n: 3 }, statistics, ...(transform ? { transform } : {}) });
    await expect(bad('permutaions', ['inversions'])).rejects.toThrow(/nearest: permutations/);
    await expect(bad('permutations', ['inversion'])).rejects.toThrow(/nearest: inversions/);
    await expect(bad('permutations', ['dyck-area'])).rejects.toThrow(/defined on dyck-paths/);
    await expect(bad('permutations', ['inversions'], 'fota')).rejects.toThrow(/nearest: foata/);
    await expect(bad('permutations', ['inversions'], 'dyck-reverse')).rejects.toThrow(InputError);
    await expect(bad('permutations', [])).rejects.toThrow(InputError);
  });

  it('two statistics give a q,t-polynomial; a transform is applied first', async () => {
    const d = await computeDistribution({ family: 'permutations', params: { n: 3 }, statistics: ['descents', 'inversions'] }, { workers: 1 });
    expect(d.series.sumCoefficients()).toBe(6n);
    expect(d.series.coeff(2, 3)).toBe(1n); // 321: two descents, three inversions
    const inv = await computeDistribution({ family: 'permutations', params: { n: 4 }, statistics: ['major-index'], transform: 'inverse' }, { workers: 1 });
    expect(inv.series.equals(qFactorial(4))).toBe(true);
  });

  it('the Frobenius-level sum over permutations by inverse descent set: F_∅ only from the identity, totals [n]_q!', async () => {
    const d = await computeDistribution({ family: 'permutations', params: { n: 4 }, statistics: ['inversions'], frobenius: 'descents' }, { workers: 1 });
    const terms = d.frobenius!.terms;
    expect(terms[0]!.set).toEqual([]);
    expect(terms[0]!.series.equals(Poly.one)).toBe(true);
    expect(terms.reduce((s, t) => s.add(t.series), Poly.zero).equals(qFactorial(4))).toBe(true);
    // Σ_w F_{iDes w} = h_1^4 has 2^3 descent sets, each with β_4(S) permutations (Stanley, EC1 §1.4)
    expect(terms.length).toBe(8);
  });

  it('the sum by shape needs a family with shapes; an informative InputError otherwise', async () => {
    await expect(computeDistribution({ family: 'permutations', params: { n: 3 }, statistics: ['inversions'], frobenius: 'shapes' })).rejects.toThrow(/no shape/);
  });

  it('two worker threads give the same series as one thread (permutations, ordered set partitions)', async () => {
    const cases = [
      { family: 'permutations', params: { n: 7 }, statistics: ['inversions', 'major-index'] },
      { family: 'ordered-set-partitions', params: { n: 6, k: 3 }, statistics: ['osp-inv'] },
      { family: 'parking-functions', params: { n: 4 }, statistics: ['parking-dinv', 'parking-area'], frobenius: 'descents' as const },
    ];
    for (const req of cases) {
      const one = await computeDistribution(req, { workers: 1 });
      const two = await computeDistribution(req, { workers: 2 });
      expect(two.provenance.method).toContain('2 worker threads');
      expect(two.series.equals(one.series)).toBe(true);
      expect(two.count).toBe(one.count);
      expect(JSON.stringify(two.frobenius?.terms.map((t) => [t.set, t.series.toString()]))).toBe(JSON.stringify(one.frobenius?.terms.map((t) => [t.set, t.series.toString()])));
    }
    const osp = await computeDistribution(cases[1]!, { workers: 2 });
    expect(osp.series.equals(qOrderedStirling(6, 3))).toBe(true); // Remmel–Wilson, JCTA (2015)
  }, 60_000);

  it('reports progress with the total', async () => {
    const seen: [number, number][] = [];
    await computeDistribution({ family: 'permutations', params: { n: 9 }, statistics: ['inversions'] }, { workers: 1, onProgress: (d, t) => seen.push([d, t]) });
    expect(seen.length).toBeGreaterThan(0);
    expect(seen.every(([d, t]) => d <= t && t === 362880)).toBe(true);
  });
});

describe('inverse descent keys', () => {
  it('iDes of a permutation is {i : i+1 left of i}; words are standardized first', () => {
    expect(descentSetOfKey(inverseDescentKey([3, 1, 4, 2]), 4)).toEqual([2]);
    expect(descentSetOfKey(inverseDescentKey([2, 1, 1]), 3)).toEqual([2]);
    expect(descentSetOfKey(inverseDescentKey([1, 1, 1]), 3)).toEqual([]);
  });
  it('agrees with the definition on random permutations (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.nat(), { minLength: 1, maxLength: 12 }), (xs) => {
        const w = xs.map((x, i) => [x, i] as const).sort((a, b) => a[0] - b[0] || a[1] - b[1]).map(([, i]) => i + 1);
        const pos = new Map(w.map((x, i) => [x, i]));
        const expected = [];
        for (let i = 1; i < w.length; i++) if (pos.get(i + 1)! < pos.get(i)!) expected.push(i);
        expect(descentSetOfKey(inverseDescentKey(w), w.length)).toEqual(expected);
      }),
    );
  });
});

describe('Tally', () => {
  it('merges triples and builds the polynomial', () => {
    const a = new Tally();
    a.add(2, 1);
    a.add(0, 0);
    a.add(2, 1);
    const b = new Tally();
    b.merge(a.triples());
    b.add(5, 0);
    expect(b.total).toBe(4);
    expect(b.toPoly().equals(Poly.fromTerms([[2, 1, 2n], [0, 0, 1n], [5, 0, 1n]]))).toBe(true);
    expect(() => a.add(-1, 0)).toThrow();
  });
});
