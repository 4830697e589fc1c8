/**
 * Per-task profile of the subgroup route (one prime): for every task of the plan, the time to
 * build its matrices and to eliminate them, entries, largest matrix and rank, and memory.
 * Not a benchmark (run by hand when tuning):
 *   npx tsx bench/module-tasks.ts vandermonde 9 [task label]
 *   npx tsx bench/module-tasks.ts superspace-vandermonde 8 5 x,theta [task label]
 *   npx tsx bench/module-tasks.ts superspace-vandermonde 6 5 polar [task label]
 */
import { DEFAULT_PRIME } from '../src/core/modp.js';
import { primeCoeffs } from '../src/modules/coefficients.js';
import { closurePlan, degreeBox, derivativeRanks, matrixRank } from '../src/modules/derivative-closure.js';
import { DerivativeMatrixBuilder } from '../src/modules/derivative-matrices.js';
import { independentPolarizedSeeds } from '../src/modules/polarized-seeds.js';
import type { SuperAlgebra, SuperPoly } from '../src/modules/super-algebra.js';
import { buildSeedPolynomial } from '../src/modules/seed-polynomial.js';
import { seedSupport, type SeedSupport } from '../src/modules/seed-support.js';
import { seedTerms, type SeedSpec } from '../src/modules/seeds.js';

const [seed = 'vandermonde', nText = '8', ...rest] = process.argv.slice(2);
const n = Number(nText);
const k = seed === 'vandermonde' ? undefined : Number(rest.shift());
const opsText = seed === 'vandermonde' ? 'x' : rest.shift() ?? 'x';
const only = rest.shift();
const polar = opsText === 'polar';
const p = DEFAULT_PRIME;
const spec = { seed, n, ...(k === undefined ? {} : { k }) } as SeedSpec;
const sp = buildSeedPolynomial(n, seedTerms(spec), primeCoeffs(p), { y: polar, polar });
const ops = { x: true, y: polar, theta: opsText.includes('theta') };
let seeds: SeedSupport[];
const t0 = performance.now();
if (polar) {
  const orders = Array.from({ length: n - 1 }, (_, j) => j + 1);
  seeds = independentPolarizedSeeds(sp.alg as SuperAlgebra<number>, sp.f as SuperPoly<number>, orders, p);
} else seeds = [seedSupport(sp.alg.space, p, sp.f)];
console.log(`${seeds.length} seed(s), ${seeds.reduce((s, x) => s + x.count, 0)} terms, ${((performance.now() - t0) / 1000).toFixed(1)} s`);
const chi = sp.character === 'sign' ? -1 : sp.character === 'trivial' ? 1 : 0;
const plan = closurePlan(n, chi);
const box = degreeBox(seeds);
const mb = (): string => `${(process.memoryUsage().rss / 1e9).toFixed(2)} GB`;
for (const [ti, task] of plan.entries()) {
  if (only && task.label !== only) continue;
  const t1 = performance.now();
  if (seeds.length > 1) {
    derivativeRanks(seeds, ops, chi, [p], p, {}, [ti]);
    console.log(`${task.label.padEnd(12)} ${((performance.now() - t1) / 1000).toFixed(1)} s (build and elimination interleaved)  rss ${mb()}`);
    continue;
  }
  const b = new DerivativeMatrixBuilder(sp.alg.space, box, task, chi, p, true);
  b.addSeed(seeds[0]!, ops);
  const t2 = performance.now();
  let entries = 0;
  let largest = '';
  let size = 0;
  let maxRank = 0;
  for (const m of b.cells) {
    entries += m.len;
    const r = matrixRank(m, p);
    maxRank = Math.max(maxRank, r);
    if (m.rows * m.cols > size) [size, largest] = [m.rows * m.cols, `${m.rows}×${m.cols}`];
  }
  const t3 = performance.now();
  console.log(`${task.label.padEnd(12)} build ${((t2 - t1) / 1000).toFixed(1)} s  eliminate ${((t3 - t2) / 1000).toFixed(1)} s  entries ${entries}  largest ${largest}  max rank ${maxRank}  rss ${mb()}`);
}
