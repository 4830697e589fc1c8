/**
 * Polarized closures as sums of derivative closures: P_j = Σ_i y_i ∂x_i^j commutes with every
 * ∂x_i, with ∂θ_i and with the other P's, and ∂y_i P_j = P_j ∂y_i + ∂x_i^j, so every word in
 * ∂x, ∂y, ∂θ and the P's normal-orders into Σ ∂x^α ∂y^β ∂θ_T P_J. Hence, when ∂x is among
 * the operators (or ∂y is not), the closure of f is the sum over multisets J of the derivative
 * closures of the seeds P_J f, each (anti)symmetric like f since P_J is S_n-invariant.
 */
import { EchelonModP } from './echelon-mod-p.js';
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

/**
 * Keep, in each multidegree, only seeds independent of those kept before (mod p): a seed in
 * the span of others adds nothing to the sum of derivative closures.
 */
export function independentSeeds(alg: SuperAlgebra<number>, seeds: readonly SuperPoly<number>[], p: number): SuperPoly<number>[] {
  const groups = new Map<string, { ech: EchelonModP; index: Map<number, number> }>();
  const kept: SuperPoly<number>[] = [];
  for (const g of seeds) {
    const key = alg.space.degrees(g.keys().next().value as number).join(',');
    let grp = groups.get(key);
    if (!grp) {
      grp = { ech: new EchelonModP(p), index: new Map() };
      groups.set(key, grp);
    }
    const cols: number[] = [];
    const vals: number[] = [];
    for (const [k, v] of g) {
      let c = grp.index.get(k);
      if (c === undefined) {
        c = grp.index.size;
        grp.index.set(k, c);
      }
      cols.push(c);
      vals.push(v);
    }
    if (grp.ech.insert(cols, vals, cols.length)) kept.push(g);
  }
  return kept;
}
