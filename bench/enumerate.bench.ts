/**
 * Distribution engine: inversions over all permutations of 11 (39,916,800) and inv over all
 * ordered set partitions of [10] into k blocks, all k (102,247,563), on two worker threads
 * and on one; plus the plain per-object path for the rate ratio. Peak memory is the
 * process's maxRSS (worker threads included).
 */
import { availableParallelism, loadavg } from 'node:os';
import { computeDistribution } from '../src/enumerate/distribution.js';
import type { DistRequest } from '../src/enumerate/request.js';

const mb = (kb: number): string => `${(kb / 1024).toFixed(0)} MB`;

async function timed(label: string, requests: DistRequest[], workers: number): Promise<number> {
  const t0 = performance.now();
  let count = 0n;
  let method = '';
  for (const r of requests) {
    const d = await computeDistribution(r, { workers });
    count += d.count;
    method = d.provenance.method;
  }
  const s = (performance.now() - t0) / 1000;
  const rate = Number(count) / s / 1e6;
  console.log(`${label}: ${count} objects in ${s.toFixed(2)} s = ${rate.toFixed(1)} M/s (${method}); peak RSS so far ${mb(process.resourceUsage().maxRSS)}`);
  return s;
}

console.log(`cores: ${availableParallelism()}, load average ${loadavg().map((x) => x.toFixed(1)).join(' ')} (the machine is shared)`);
const perm11: DistRequest[] = [{ family: 'permutations', params: { n: 11 }, statistics: ['inversions'] }];
const osp10: DistRequest[] = Array.from({ length: 10 }, (_, i) => ({ family: 'ordered-set-partitions', params: { n: 10, k: i + 1 }, statistics: ['osp-inv'] }));

const cold = await timed('start-up: two workers on permutations of 3 (cold pool)', [{ ...perm11[0]!, params: { n: 3 } }], 2);
console.log(`  worker start-up ≈ ${cold.toFixed(2)} s, paid once per process (the pool is kept)`);
const p2 = await timed('inversions, permutations of 11, 2 workers', perm11, 2);
const p1 = await timed('inversions, permutations of 11, 1 thread ', perm11, 1);
console.log(`  target ≤ 10 s on 2 cores: ${p2 <= 10 ? 'met' : 'NOT met'}; 1 thread / 2 workers = ${(p1 / p2).toFixed(2)}`);
const o2 = await timed('osp-inv, ordered set partitions of [10], all k, 2 workers', osp10, 2);
const o1 = await timed('osp-inv, ordered set partitions of [10], all k, 1 thread ', osp10, 1);
console.log(`  target ≤ 60 s on 2 cores: ${o2 <= 60 ? 'met' : 'NOT met'}; 1 thread / 2 workers = ${(o1 / o2).toFixed(2)}`);
const g = await timed('plain path (visit + compute per object), inversions on permutations of 10, 1 thread', [{ ...perm11[0]!, params: { n: 10 }, generic: true }], 1);
const f = await timed('prefix walk, inversions on permutations of 10, 1 thread', [{ ...perm11[0]!, params: { n: 10 } }], 1);
console.log(`  prefix walk speed-up over the plain path: ${(g / f).toFixed(1)}×`);
const peak = process.resourceUsage().maxRSS;
console.log(`peak RSS ${mb(peak)} (target < 300 MB: ${peak < 300 * 1024 ? 'met' : 'NOT met'})`);
