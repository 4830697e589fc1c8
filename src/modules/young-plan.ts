/**
 * Which Young subgroup computes which multiplicity (design note "Frobenius without full
 * bases"): partitions in an up-set T use ⟨F, h_λ⟩ = dim M^{S_λ} (blocks λ, 'sym'); the
 * complementary down-set B uses ⟨F, e_λ'⟩ = dim of the S_λ'-anti-invariants (blocks λ',
 * 'alt'). T is the up-closure of the λ with |S_λ| ≥ |S_λ'|, so each side is unitriangular in
 * Kostka numbers and the large groups do the work. Also the solve for the multiplicities.
 */
import { conjugate, dominates, partitionKey, partitionList, type Partition } from '../core/partitions.js';
import { kostkaNumber } from '../symfun/kostka.js';
import type { FoldMode } from './young-fold.js';

export interface YoungTask {
  readonly lambda: Partition;
  readonly blocks: readonly number[];
  readonly mode: FoldMode;
}

function groupOrder(l: Partition): number {
  let s = 1;
  for (const part of l) for (let i = 2; i <= part; i++) s *= i;
  return s;
}

export function youngPlan(n: number): readonly YoungTask[] {
  const all = partitionList(n);
  const prefer = all.filter((l) => {
    const a = groupOrder(l);
    const b = groupOrder(conjugate(l));
    return a > b || (a === b && dominates(l, conjugate(l)));
  });
  const up = new Set(all.filter((l) => prefer.some((m) => dominates(l, m))).map(partitionKey));
  return all.map((l) =>
    up.has(partitionKey(l)) ? { lambda: l, blocks: l, mode: 'sym' as const } : { lambda: l, blocks: conjugate(l), mode: 'alt' as const },
  );
}

/**
 * Multiplicities m_λ from the plan's dimensions (values[i] for plan[i]):
 * values = Σ_ν K_{ν,λ} m_ν ('sym') or Σ_ν K_{ν',λ'} m_ν ('alt').
 */
export function solveMultiplicities(n: number, plan: readonly YoungTask[], values: readonly number[]): number[] {
  const m = new Array<number>(plan.length).fill(0);
  const solved = new Array<boolean>(plan.length).fill(false);
  const order = plan.map((_, i) => i);
  // 'sym' from the dominance-top down (plan order), 'alt' from the bottom up
  const symIdx = order.filter((i) => plan[i]!.mode === 'sym');
  const altIdx = order.filter((i) => plan[i]!.mode === 'alt').reverse();
  for (const i of symIdx) {
    const l = plan[i]!.lambda;
    let v = values[i]!;
    for (const j of symIdx) if (solved[j] && j !== i) v -= Number(kostkaNumber(plan[j]!.lambda, l)) * m[j]!;
    m[i] = v;
    solved[i] = true;
  }
  for (const i of altIdx) {
    const lc = conjugate(plan[i]!.lambda);
    let v = values[i]!;
    for (const j of altIdx) if (solved[j] && j !== i) v -= Number(kostkaNumber(conjugate(plan[j]!.lambda), lc)) * m[j]!;
    m[i] = v;
    solved[i] = true;
  }
  void n;
  return m;
}
