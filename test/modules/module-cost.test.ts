import { describe, expect, it } from 'vitest';
import { multisetsUpTo } from '../../src/modules/module-cost.js';

describe('cost estimate helpers', () => {
  it('counts multisets of parts with bounded sum (listed by hand)', () => {
    // {}, {1}, {2}, {1,1}, {1,2}, {1,1,1}
    expect(multisetsUpTo([1, 2], 3)).toBe(6);
    // partitions of 0..5 into parts ≤ 5: 1+1+2+3+5+7 (common practice)
    expect(multisetsUpTo([1, 2, 3, 4, 5], 5)).toBe(19);
    expect(multisetsUpTo([2, 2], 4)).toBe(3);
  });
});

describe('estimates before the seed is built', () => {
  it('Vandermonde n = 10 is refused from its typed term alone, naming --max-work (no 10! terms are built)', async () => {
    const { computeModule } = await import('../../src/modules/compute-module.js');
    const { LimitError } = await import('../../src/core/errors.js');
    const seen: number[] = [];
    const run = (): unknown => computeModule({ seed: 'vandermonde', n: 10, ops: ['x'] }, { onEstimate: (units) => seen.push(units) });
    expect(run).toThrow(LimitError);
    expect(run).toThrow(/raise it with --max-work/);
    expect(seen[0]).toBeGreaterThan(1.5e10);
  });
  it('the bound from typed terms stays below the full estimate (refusing on it is safe): Vandermonde n = 7, δ_{6,3}', async () => {
    const { preEstimateWork, estimateModuleWork } = await import('../../src/modules/module-cost.js');
    const { seedTerms } = await import('../../src/modules/seeds.js');
    const { buildSeedPolynomial } = await import('../../src/modules/seed-polynomial.js');
    const { seedSupport } = await import('../../src/modules/seed-support.js');
    const { primeCoeffs } = await import('../../src/modules/coefficients.js');
    const { parseOperatorFamilies } = await import('../../src/modules/operators.js');
    for (const spec of [{ seed: 'vandermonde' as const, n: 7 }, { seed: 'superspace-vandermonde' as const, n: 6, k: 3 }]) {
      const ops = parseOperatorFamilies(['x', 'theta']);
      const terms = seedTerms(spec);
      const sp = buildSeedPolynomial(spec.n, terms, primeCoeffs(67108859), { y: false, polar: false });
      const full = estimateModuleWork(seedSupport(sp.alg.space, 67108859, sp.f), ops, 'young', true);
      expect(preEstimateWork(terms, spec.n, ops, 'young').units).toBeLessThanOrEqual(full.units);
    }
  });
});
