/**
 * Polarized closures as sums of derivative closures: P_j = Σ_i y_i ∂x_i^j commutes with every
 * ∂x_i, with ∂θ_i and with the other P's, and ∂y_i P_j = P_j ∂y_i + ∂x_i^j, so every word in
 * ∂x, ∂y, ∂θ and the P's normal-orders into Σ ∂x^α ∂y^β ∂θ_T P_J. Hence, when ∂x is among
 * the operators (or ∂y is not), the closure of f is the sum over multisets J of the derivative
 * closures of the seeds P_J f, each (anti)symmetric like f since P_J is S_n-invariant.
 */
import type { OperatorFamily } from './operators.js';
import type { SuperAlgebra, SuperPoly } from './super-algebra.js';

/** True when the normal-ordering argument applies to this operator set. */
export function polarizationReducible(ops: readonly OperatorFamily[]): boolean {
  const hasX = ops.some((o) => o.kind === 'x');
  const hasY = ops.some((o) => o.kind === 'y');
  return ops.some((o) => o.kind === 'polar') && (hasX || !hasY);
}

/** Every nonzero P_J f for multisets J of the given orders (f itself for J empty). */
export function polarizedSeeds<T>(alg: SuperAlgebra<T>, f: SuperPoly<T>, orders: readonly number[]): SuperPoly<T>[] {
  const sorted = [...new Set(orders)].sort((a, b) => a - b);
  const out: SuperPoly<T>[] = [];
  const walk = (g: SuperPoly<T>, from: number): void => {
    out.push(g);
    for (let i = from; i < sorted.length; i++) {
      const h = alg.polarization(g, sorted[i]!);
      if (h.size > 0) walk(h, i);
    }
  };
  walk(f, 0);
  return out;
}
