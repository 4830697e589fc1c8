import { describe, expect, it } from 'vitest';
import { stirlingS2 } from 'mathjs';
import { familyById } from '../../objects/index.js';
import type { SetPartition } from '../../objects/types.js';
import { Poly } from '../../src/core/poly.js';
import { qStirling2 } from '../../src/core/qanalogs.js';
import { blockIndexSum } from '../../statistics/block-index-sum.js';

describe('block-index-sum on set partitions', () => {
  it('has generating function Stir_q(n,k) over partitions with k blocks, n ≤ 7 (the q-Stirling recurrence of Carlitz, Duke Math. J. 15 (1948) — from memory; S(n,k) from mathjs stirlingS2)', () => {
    const family = familyById('set-partitions');
    for (let n = 1; n <= 7; n++) {
      for (let k = 1; k <= n; k++) {
        const terms: [number, number, bigint][] = [];
        for (const p of family.generate({ n, k }) as Iterable<SetPartition>) terms.push([blockIndexSum.compute(p), 0, 1n]);
        const dist = Poly.fromTerms(terms);
        expect(dist.equals(qStirling2(n, k)), `n=${n} k=${k}`).toBe(true);
        expect(Number(dist.sumCoefficients())).toBe(Number(stirlingS2(n, k)));
      }
    }
  });
});
