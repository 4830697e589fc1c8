/**
 * Derivative closures (operators ∂x, ∂y, ∂θ only): every graded piece is the image of the
 * map g ↦ g(∂)f; its Frobenius multiplicities come from Young-subgroup ranks (young-plan),
 * its dimension as Σ_λ f^λ m_λ. For a seed that is neither symmetric nor antisymmetric only
 * the plain rank (no symmetry reduction, no Frobenius series) is computed.
 */
import { fLambda, partitionList } from '../core/partitions.js';
import { derivativeCellRank, type SeedChi } from './derivative-rank.js';
import type { ModuleCell } from './module-cell.js';
import type { SeedSupport } from './seed-support.js';
import { solveMultiplicities, youngPlan } from './young-plan.js';

export interface DerivativeOps {
  readonly x: boolean;
  readonly y: boolean;
  readonly theta: boolean;
}

export interface ClosureHooks {
  readonly onProgress?: (done: number, total: number, label: string) => void;
  readonly signal?: AbortSignal;
}

export function derivativeClosure(seed: SeedSupport, ops: DerivativeOps, chi: SeedChi, hooks: ClosureHooks = {}): ModuleCell[] {
  const n = seed.space.n;
  const [Dx, Dy, Dt] = seed.degree;
  const aMax = ops.x ? Dx : 0;
  const bMax = ops.y ? Dy : 0;
  const cMax = ops.theta ? Dt : 0;
  const plan = chi === 0 ? [{ lambda: [] as number[], blocks: new Array<number>(n).fill(1), mode: 'sym' as const }] : youngPlan(n);
  const shapes = partitionList(n);
  const fl = shapes.map((l) => Number(fLambda(l)));
  const total = (aMax + 1) * (bMax + 1) * (cMax + 1) * plan.length;
  let done = 0;
  const cells: ModuleCell[] = [];
  for (let a = 0; a <= aMax; a++) {
    for (let b = 0; b <= bMax; b++) {
      for (let c = 0; c <= cMax; c++) {
        const values: number[] = [];
        for (const task of plan) {
          hooks.signal?.throwIfAborted();
          values.push(derivativeCellRank(seed, [a, b, c], task, chi).rank);
          done++;
          hooks.onProgress?.(done, total, `degree ${Dx - a}/${Dy - b}/${Dt - c}`);
        }
        const degree: [number, number, number] = [Dx - a, Dy - b, Dt - c];
        if (chi === 0) {
          cells.push({ degree, dim: values[0]! });
          continue;
        }
        const mult = solveMultiplicities(n, plan, values);
        const dim = mult.reduce((s, m, i) => s + m * fl[i]!, 0);
        cells.push({ degree, dim, multiplicities: mult });
      }
    }
  }
  return cells;
}
