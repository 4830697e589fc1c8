/**
 * Stirling permutations and increasing plane trees: second-order Eulerian numbers, Bóna's
 * equidistribution and Janson's bijection, by exhaustive enumeration.
 */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import type { IncreasingPlaneTree, StirlingPermutation } from '../../objects/types.js';
import { isStirlingPermutation } from '../../objects/support/stirling.js';
import { Poly } from '../../src/core/poly.js';
import { increasingPlaneTreeLeaves } from '../../statistics/increasing-plane-tree-statistics.js';
import { stirlingPlateaux } from '../../statistics/stirling-permutation-statistics.js';
import { dist } from './dist-helper.js';

/** Second-order Eulerian numbers ⟨⟨n,k⟩⟩ = (k+1)⟨⟨n−1,k⟩⟩ + (2n−1−k)⟨⟨n−1,k−1⟩⟩ (Graham–Knuth–Patashnik, Concrete Mathematics §6.2, from memory). */
function secondOrderEulerian(n: number): bigint[] {
  let row = [1n];
  for (let m = 1; m <= n; m++) row = Array.from({ length: m }, (_, k) => BigInt(k + 1) * (row[k] ?? 0n) + BigInt(2 * m - 1 - k) * (row[k - 1] ?? 0n));
  return row;
}

describe('Stirling permutations', () => {
  it('descents (with w_{2n+1} = 0) give q·Σ_k ⟨⟨n,k⟩⟩ q^k, n ≤ 6 (Gessel–Stanley, J. Combin. Theory Ser. A 24 (1978)); rows 1, 8, 6 and 1, 22, 58, 24 (from memory)', async () => {
    expect(secondOrderEulerian(3)).toEqual([1n, 8n, 6n]);
    expect(secondOrderEulerian(4)).toEqual([1n, 22n, 58n, 24n]);
    for (let n = 1; n <= 6; n++) {
      const s = (await dist('stirling-permutations', { n }, ['stirling-descents'])).series;
      expect(s.equals(Poly.fromQCoeffs(secondOrderEulerian(n)).shift(1)), `n=${n}`).toBe(true);
    }
  });

  it('descents, ascents and plateaux are equidistributed, n ≤ 6 (Bóna, SIAM J. Discrete Math. 23 (2008))', async () => {
    for (let n = 1; n <= 6; n++) {
      const d = (await dist('stirling-permutations', { n }, ['stirling-descents'])).series;
      expect((await dist('stirling-permutations', { n }, ['stirling-ascents'])).series.equals(d)).toBe(true);
      expect((await dist('stirling-permutations', { n }, ['stirling-plateaux'])).series.equals(d)).toBe(true);
    }
  });

  it('the generated words are Stirling permutations and reversal keeps the family (n ≤ 5)', () => {
    const rev = transformById('stirling-reverse');
    for (let n = 0; n <= 5; n++) {
      for (const w of familyById('stirling-permutations').generate({ n })) {
        expect(isStirlingPermutation(w as number[])).toBe(true);
        expect(isStirlingPermutation(rev.apply(w) as number[])).toBe(true);
      }
    }
    expect(isStirlingPermutation([1, 2, 1, 2])).toBe(false);
  });

  it("Janson's bijection onto increasing plane trees: inverse holds, plateaux = leaves (n ≤ 5; Janson, DMTCS Proc. AI (2008))", () => {
    const toTree = transformById('stirling-to-plane-tree');
    const toWord = transformById('plane-tree-to-stirling');
    const trees = familyById('increasing-plane-trees');
    for (let n = 0; n <= 5; n++) {
      const all = new Set([...trees.generate({ n })].map((t) => trees.key(t)));
      const images = new Set<string>();
      for (const w of familyById('stirling-permutations').generate({ n })) {
        const t = toTree.apply(w) as IncreasingPlaneTree;
        images.add(trees.key(t));
        expect(toWord.apply(t)).toEqual(w);
        expect(increasingPlaneTreeLeaves.compute(t)).toBe(n === 0 ? 1 : stirlingPlateaux.compute(w as StirlingPermutation));
        // increasing: every child exceeds its parent
        t.forEach((cs, v) => cs.forEach((c) => expect(c).toBeGreaterThan(v)));
      }
      expect(images).toEqual(all);
    }
  });
});
