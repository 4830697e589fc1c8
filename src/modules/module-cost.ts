/**
 * A cost estimate before starting, in work units (pairs of seed term and operator monomial
 * the route visits), with a rough time calibrated on this code (measured in the benchmark).
 */
import type { OperatorFamily } from './operators.js';
import type { SeedSupport } from './seed-support.js';
import { groupOrder, youngPlan } from './young-plan.js';

const SECONDS_PER_UNIT = 1.5e-7;
// polarized and iterated closures: measured on δ_{6,6} with P_1..P_5 (about 400 s of CPU, both primes)
const SECONDS_PER_UNIT_POLAR = 4e-6; // measured on the derivative route (Vandermonde n = 8, one core, both primes)

export function estimateModuleWork(seed: SeedSupport, ops: readonly OperatorFamily[], route: 'young' | 'iterated'): { units: number; seconds: number } {
  const n = seed.space.n;
  let boxes = 1;
  for (let i = 0; i < n; i++) {
    boxes *= (seed.xs[i]! + 1) * (seed.ys[i]! + 1) * (((seed.masks[0] ?? 0) >> i) & 1 ? 2 : 1);
  }
  let units: number;
  if (route === 'young') {
    let shrink = 0;
    for (const t of youngPlan(n)) shrink += 1 / groupOrder(t.blocks);
    units = seed.count * boxes * shrink;
  } else {
    const polar = ops.some((o) => o.kind === 'polar');
    units = seed.count * boxes * ops.length * (polar ? 4 * n : 1);
  }
  return { units, seconds: units * (route === 'young' ? SECONDS_PER_UNIT : SECONDS_PER_UNIT_POLAR) };
}
