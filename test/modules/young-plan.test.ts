import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { conjugate, partitionKey, partitionList } from '../../src/core/partitions.js';
import { kostkaNumber } from '../../src/symfun/kostka.js';
import { groupOrder, solveMultiplicities, youngPlan } from '../../src/modules/young-plan.js';

describe('subgroup plan', () => {
  it('has one task per partition, largest groups first, h_n and e_n leading', () => {
    for (let n = 1; n <= 9; n++) {
      const plan = youngPlan(n);
      expect(plan.length).toBe(partitionList(n).length);
      const orders = plan.map((t) => groupOrder(t.blocks));
      expect(orders).toEqual([...orders].sort((a, b) => b - a));
      expect(plan[0]!.label).toBe(`h${n}`);
      for (const t of plan) expect(t.blocks.reduce((s, b) => s + b, 0)).toBe(n);
    }
  });

  it('pairs h_μ with s_λ by Kostka numbers (common practice: h_μ = Σ_λ K_{λμ} s_λ, Macdonald I.6)', () => {
    const lambdas = partitionList(7);
    for (const t of youngPlan(7)) {
      if (t.modes.some((m) => m === 'alt')) continue;
      lambdas.forEach((l, i) => expect(t.pairing[i]).toBe(Number(kostkaNumber(l, t.blocks))));
    }
  });

  it('pairs h_5 e_4 with s_611·1 and s_51111 only (Pieri rule, Macdonald I (5.16))', () => {
    const t = youngPlan(9).find((x) => x.label === 'h5 e4')!;
    const hit = partitionList(9).filter((_, i) => t.pairing[i] !== 0).map(partitionKey);
    expect(hit.sort()).toEqual(['5,1,1,1,1', '6,1,1,1'].sort());
    expect(t.pairing.filter((v) => v !== 0)).toEqual([1, 1]);
  });

  it('e_ν alone pairs by the conjugate Kostka numbers (ω h = e)', () => {
    const lambdas = partitionList(6);
    for (const t of youngPlan(6)) {
      if (t.modes.some((m) => m === 'sym')) continue;
      lambdas.forEach((l, i) => expect(t.pairing[i]).toBe(Number(kostkaNumber(conjugate(l), t.blocks))));
    }
  });

  it('recovers any multiplicities from the dimensions they give', () => {
    for (const n of [5, 8]) {
      const plan = youngPlan(n);
      const size = plan.length;
      fc.assert(
        fc.property(fc.array(fc.nat(50), { minLength: size, maxLength: size }), (m) => {
          const values = plan.map((t) => t.pairing.reduce((s, p, i) => s + p * m[i]!, 0));
          expect(solveMultiplicities(n, plan, values)).toEqual(m);
        }),
        { numRuns: 50 },
      );
    }
  });

  it('mirrored plans pair h_μ e_ν with e_μ h_ν, whose pairing is the conjugate one (ω, common practice)', () => {
    for (let n = 2; n <= 9; n++) {
      const plan = youngPlan(n, true);
      const lambdas = partitionList(n);
      const index = new Map(lambdas.map((l, i) => [partitionKey(l), i]));
      expect(plan.length).toBe(lambdas.length);
      for (const t of plan) {
        if (t.mirrorOf === undefined) continue;
        const src = plan[t.mirrorOf]!;
        expect(src.mirrorOf).toBeUndefined();
        lambdas.forEach((l, i) => expect(t.pairing[i]).toBe(src.pairing[index.get(partitionKey(conjugate(l)))!]));
      }
      // the mirrored tasks are free: at n = 9, 16 of 30 tasks are computed
      if (n === 9) expect(plan.filter((t) => t.mirrorOf === undefined)).toHaveLength(16);
    }
  });

  it('has unimodular pairing matrices up to n = 9 (every dimension vector solves in integers)', () => {
    for (let n = 2; n <= 9; n++) {
      const plan = youngPlan(n, n % 2 === 0);
      plan.forEach((_, j) => expect(() => solveMultiplicities(n, plan, plan.map((__, i) => (i === j ? 1 : 0)))).not.toThrow());
    }
  });
});
