/**
 * Module engine: the figures of the module issue, each with both primes (confirmation
 * included), worker threads, wall time, CPU time and peak memory. Sections run by name:
 *   npm run bench -- modules                      (all but n = 9)
 *   MODULES_BENCH=vandermonde8,delta8 npm run bench -- modules
 *   MODULES_BENCH=vandermonde9 npm run bench -- modules   (long: target 15 minutes)
 *   MODULES_BENCH=xtheta8 npm run bench -- modules        (long: target 60 minutes)
 *   MODULES_BENCH=polar7 POLAR7_K=1,2,3 npm run bench -- modules   (stretch: polarized n = 7)
 * Targets (issue): Vandermonde n = 8 ≤ 30 s; n = 9 ≤ 15 min; δ_{8,k} x-closures, all k,
 * ≤ 5 min; x/θ tables of δ_{7,k} with Frobenius, all k, ≤ 100 s; polarized δ_{6,k}, all k,
 * ≤ 10 min. Also compares polarized closures with Δ'_{e_{k−1}} e_n where that is cheap.
 */
import { resourceUsage } from 'node:process';
import { partitionKey, partitionList } from '../src/core/partitions.js';
import { Poly } from '../src/core/poly.js';
import { computeModuleAsync, type ModuleSpec } from '../src/modules/compute-module.js';
import type { ModuleResult } from '../src/modules/module-result.js';
import { deltaPrimeOfEn } from '../src/symfun/operators.js';
import { SymFun } from '../src/symfun/symfun.js';
import { majFrobenius, standardTableaux } from '../test/helpers/maj-frobenius.js';

const wanted = (process.env['MODULES_BENCH'] ?? 'vandermonde8,delta8,xtheta7,polar6').split(',');

function peakMB(): number {
  return resourceUsage().maxRSS / 1024; // the whole process, worker threads included
}

async function timed(spec: ModuleSpec, frobenius = true): Promise<[ModuleResult, number, number]> {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const r = await computeModuleAsync(spec, { frobenius, maxWork: 1e14 });
  const cpu = process.cpuUsage(c0);
  return [r, (performance.now() - t0) / 1000, (cpu.user + cpu.system) / 1e6];
}

function line(label: string, r: ModuleResult, wall: number, cpu: number): void {
  const dim = r.cells.reduce((s, c) => s + c.dim, 0);
  const maxCell = Math.max(...r.cells.map((c) => c.dim));
  const checks = r.checks.map((c) => `${c.check.split(' ')[0]}:${c.holds === null ? 'n/a' : c.holds ? 'ok' : 'FAIL'}`).join(' ');
  console.log(`${label.padEnd(28)} dim ${String(dim).padStart(7)}  largest cell ${String(maxCell).padStart(6)}  wall ${wall.toFixed(1).padStart(7)} s  process cpu ${cpu.toFixed(1).padStart(6)} s  ${r.provenance.confirmation.startsWith('confirmed') ? 'confirmed by 2 primes' : r.provenance.confirmation}  [${checks}]`);
}

function report(name: string, total: number, target: number): void {
  console.log(`  => ${name}: ${total.toFixed(1)} s (target ${target} s, ratio ${(total / target).toFixed(2)}), peak RSS ${peakMB().toFixed(0)} MB`);
}

/** The graded Frobenius series against Σ_T q^maj(T) s_shape(T) (Lusztig–Stanley; Stanley, Bull. Amer. Math. Soc. 1 (1979) — from memory). */
function majCheck(r: ModuleResult, n: number): string {
  const expected = majFrobenius(n);
  const same = partitionList(n).every((l, i) => Poly.fromTerms(r.cells.map((c) => [c.degree[0], 0, BigInt(c.multiplicities![i]!)] as const)).equals(expected.get(partitionKey(l)) ?? Poly.zero));
  return `  Frobenius ${same ? 'equals' : 'DIFFERS FROM'} Σ_T q^maj(T) s_shape(T) over the ${standardTableaux(n).length} standard tableaux`;
}

for (const n of [8, 9]) {
  if (!wanted.includes(`vandermonde${n}`)) continue;
  const [r, wall, cpu] = await timed({ seed: 'vandermonde', n, ops: ['x'] });
  line(`Vandermonde n=${n} (x)`, r, wall, cpu);
  console.log(majCheck(r, n));
  report(`Vandermonde n = ${n}, Hilbert + graded Frobenius`, wall, n === 8 ? 30 : 900);
}
if (wanted.includes('delta8')) {
  let total = 0;
  for (let k = 1; k <= 8; k++) {
    const [r, wall, cpu] = await timed({ seed: 'superspace-vandermonde', n: 8, k, ops: ['x'] });
    total += wall;
    line(`δ_{8,${k}} (x)`, r, wall, cpu);
  }
  report('δ_{8,k} x-closures, every k', total, 300);
}
if (wanted.includes('xtheta7')) {
  let total = 0;
  for (let k = 1; k <= 7; k++) {
    const [r, wall, cpu] = await timed({ seed: 'superspace-vandermonde', n: 7, k, ops: ['x', 'theta'] });
    total += wall;
    line(`δ_{7,${k}} (x, θ)`, r, wall, cpu);
  }
  report('x/θ tables of δ_{7,k} with Frobenius, every k', total, 100);
}
if (wanted.includes('xtheta8')) {
  let total = 0;
  for (let k = 1; k <= 8; k++) {
    const [r, wall, cpu] = await timed({ seed: 'superspace-vandermonde', n: 8, k, ops: ['x', 'theta'] });
    total += wall;
    line(`δ_{8,${k}} (x, θ)`, r, wall, cpu);
  }
  report('x/θ tables of δ_{8,k} with Frobenius, every k', total, 3600);
}
/** Polarized closures of δ_{n,k} (∂x, ∂y, P_1..P_{n−1}), each compared with Δ'_{e_{k−1}} e_n. */
async function polarized(n: number, ks: readonly number[]): Promise<number> {
  let total = 0;
  for (const k of ks) {
    const ops = ['x', 'y', ...Array.from({ length: n - 1 }, (_, j) => `polar${j + 1}`)];
    const [r, wall, cpu] = await timed({ seed: 'superspace-vandermonde', n, k, ops });
    total += wall;
    line(`δ_{${n},${k}} (x, y, P1..P${n - 1})`, r, wall, cpu);
    // Δ'_{e_{k−1}} e_n (Haiman, Invent. Math. 149 (2002) for k = n; a conjecture of Rhoades–Wilson,
    // Trans. Amer. Math. Soc. (2020) otherwise)
    const t0 = performance.now();
    const g = k === 1 ? SymFun.one : SymFun.basisElement('e', [k - 1]);
    const expected = new Map<string, Poly>();
    for (const [key, c] of deltaPrimeOfEn(g, n).schurTerms()) if (!c.isZero()) expected.set(key, c.toPoly());
    let same = true;
    partitionList(n).forEach((l, i) => {
      const got = Poly.fromTerms(r.cells.map((c) => [c.degree[0], c.degree[1], BigInt(c.multiplicities![i]!)] as const));
      if (!got.equals(expected.get(partitionKey(l)) ?? Poly.zero)) same = false;
    });
    console.log(`  Δ'_{e_${k - 1}} e_${n}: ${same ? 'equal' : 'DIFFERENT'} (symmetric-function side ${((performance.now() - t0) / 1000).toFixed(1)} s)`);
  }
  return total;
}
if (wanted.includes('polar6')) report('polarized δ_{6,k}, every k', await polarized(6, [1, 2, 3, 4, 5, 6]), 600);
if (wanted.includes('polar7')) {
  // stretch: POLAR7_K=1,2,3 picks the k (default all)
  const ks = (process.env['POLAR7_K'] ?? '1,2,3,4,5,6,7').split(',').map(Number);
  report(`polarized δ_{7,k}, k = ${ks.join(',')}`, await polarized(7, ks), 3600);
}
