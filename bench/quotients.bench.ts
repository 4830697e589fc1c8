/**
 * Quotient route: the figures of the quotient issue, Hilbert and Frobenius series with both
 * primes, wall and CPU time (in-thread: both primes and every functional on one core), peak
 * memory, estimate against measurement, and the ratio to the issue's targets.
 *   npm run bench -- quotients                      (xy5, xyt5, xy6)
 *   QUOTIENTS_BENCH=xyt6 npm run bench -- quotients  (long)
 *   QUOTIENTS_BENCH=xyt7 npm run bench -- quotients  (no published computation; very long)
 *   QUOTIENTS_BENCH=haiman5 npm run bench -- quotients  (x,y quotient n = 5 against the polarized Vandermonde closure)
 * The issue's table (2 cores, a general commutative-algebra system, Hilbert series only,
 * mod 32003): x,y n = 5: 0.03 s; n = 6: 6.0 s; x,y,θ n = 5: 0.67 s; n = 6: 338 s. Targets for
 * gradus with Frobenius series: x,y n = 6 ≤ 6 s; x,y,θ n = 5 ≤ 1 s, n = 6 ≤ 180 s.
 */
import { resourceUsage } from 'node:process';
import { loadavg } from 'node:os';
import { computeModule } from '../src/modules/compute-module.js';
import { computeQuotient } from '../src/modules/compute-quotient.js';
import type { ModuleResult } from '../src/modules/module-result.js';

const wanted = (process.env['QUOTIENTS_BENCH'] ?? 'xy5,xyt5,xy6').split(',');

const peakMB = (): number => resourceUsage().maxRSS / 1024;

function run(label: string, n: number, y: boolean, theta: boolean, target: number | undefined, general: number | undefined): ModuleResult {
  let estimate = 0;
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const r = computeQuotient({ ideal: 'coinvariant', n, y, theta }, { frobenius: true, maxWork: 1e15, onEstimate: (_, s) => (estimate = s) });
  const wall = (performance.now() - t0) / 1000;
  const cpuU = process.cpuUsage(c0);
  const cpu = (cpuU.user + cpuU.system) / 1e6;
  const dim = r.cells.reduce((s, c) => s + c.dim, 0);
  const delta = r.checks.find((c) => c.check.startsWith('Frobenius series equals'));
  console.log(
    `${label.padEnd(12)} dim ${String(dim).padStart(7)}  cells ${String(r.cells.length).padStart(4)}  wall ${wall.toFixed(1).padStart(7)} s  cpu ${cpu.toFixed(1).padStart(7)} s  estimate ${estimate.toFixed(0)} s  peak RSS ${peakMB().toFixed(0)} MB  load ${loadavg()[0]!.toFixed(1)}`,
  );
  console.log(`  ${r.provenance.confirmation}; ${delta ? `${delta.check}: ${delta.holds === null ? 'n/a' : delta.holds ? 'holds' : `FAILS (${delta.detail})`}` : ''}`);
  if (target !== undefined) console.log(`  => target ${target} s: ratio ${(wall / target).toFixed(2)}${general !== undefined ? `; the general system's Hilbert series ${general} s: ratio ${(wall / general).toFixed(1)}` : ''}`);
  return r;
}

if (wanted.includes('xy5')) run('x,y n=5', 5, true, false, undefined, 0.03);
if (wanted.includes('xyt5')) run('x,y,θ n=5', 5, true, true, 1, 0.67);
if (wanted.includes('xy6')) run('x,y n=6', 6, true, false, 6, 6.0);
if (wanted.includes('xyt6')) run('x,y,θ n=6', 6, true, true, 180, 338);
if (wanted.includes('xyt7')) run('x,y,θ n=7', 7, true, true, undefined, undefined);
if (wanted.includes('haiman5')) {
  // Haiman's theorem: the quotient's dual, the diagonal harmonics, is the polarized closure of the Vandermonde
  const q = run('x,y n=5', 5, true, false, undefined, undefined);
  const t0 = performance.now();
  const m = computeModule({ seed: 'vandermonde', n: 5, ops: ['x', 'y', 'polar1', 'polar2', 'polar3', 'polar4'] }, { frobenius: true, maxWork: 1e15 });
  const key = (r: ModuleResult) => r.cells.map((c) => `${c.degree[0]},${c.degree[1]}:${c.multiplicities!.join(' ')}`).sort().join('|');
  console.log(`  polarized Vandermonde closure n=5 ${((performance.now() - t0) / 1000).toFixed(1)} s: ${key(q) === key(m) ? 'equal to the quotient in every cell' : 'DIFFERENT from the quotient'}`);
}
