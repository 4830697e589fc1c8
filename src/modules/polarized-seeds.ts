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
import { seedSupport, type SeedSupport } from './seed-support.js';

/** True when the normal-ordering argument applies to this operator set. */
export function polarizationReducible(ops: readonly OperatorFamily[]): boolean {
  const hasX = ops.some((o) => o.kind === 'x');
  const hasY = ops.some((o) => o.kind === 'y');
  return ops.some((o) => o.kind === 'polar') && (hasX || !hasY);
}

/**
 * The seeds P_J f (J a multiset of the given orders, f itself for J empty) that are
 * independent, mod p, of those before them in their multidegree (a seed in the span of
 * others adds nothing to the sum of derivative closures), as flat supports. Each P_J f is
 * made from its parent and dropped once its subtree is done, so only one chain of
 * polynomials is held at a time (δ_{7,4}: 147 seeds, 11 million terms).
 */
export function independentPolarizedSeeds(alg: SuperAlgebra<number>, f: SuperPoly<number>, orders: readonly number[], p: number): SeedSupport[] {
  const sorted = [...new Set(orders)].sort((a, b) => a - b);
  const groups = new Map<string, { ech: EchelonModP; index: Map<number, number> }>();
  const kept: SeedSupport[] = [];
  const independent = (g: SuperPoly<number>): boolean => {
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
    return grp.ech.insert(cols, vals, cols.length);
  };
  const walk = (g: SuperPoly<number>, from: number): void => {
    if (independent(g)) kept.push(seedSupport(alg.space, p, g));
    for (let i = from; i < sorted.length; i++) {
      const h = alg.polarization(g, sorted[i]!);
      if (h.size > 0) walk(h, i);
    }
  };
  walk(f, 0);
  return kept;
}
