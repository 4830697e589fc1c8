/**
 * A sharded run against the one-machine run: plan a module request into a work folder, compute
 * its shards (on Slurm when CLUSTER_BENCH_SLURM=1 and `sbatch` is here, else one after another
 * in this process), merge, and compare the document with `compute` of the same request.
 * Prints shards, the shards' seconds, wall times of both routes, their ratio and peak memory.
 *   npm run bench -- cluster                                   (Vandermonde n = 8)
 *   CLUSTER_BENCH="module --seed vandermonde --n 9 --ops x --frobenius" CLUSTER_BENCH_SLURM=1 npm run bench -- cluster
 */
import { mkdtempSync, readFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { resourceUsage } from 'node:process';
import { mergePlan, planRun, planStatus, runShard, submitPlan } from '../src/cluster/index.js';
import { toJsonText } from '../src/core/json-text.js';
import { stopPool } from '../src/pool/pool.js';
import { compute, requestFromWords } from '../src/requests/index.js';
import { splitWords } from '../src/requests/words.js';

const words = splitWords(process.env['CLUSTER_BENCH'] ?? 'module --seed vandermonde --n 8 --ops x --frobenius');
const slurm = process.env['CLUSTER_BENCH_SLURM'] === '1';
const dir = join(mkdtempSync(join(tmpdir(), 'gradus-cluster-bench-')), 'work');
const cwd = process.cwd();

const t0 = performance.now();
const { folder } = planRun(dir, words, { cwd, env: process.env });
console.log(`${words.join(' ')}: ${folder.manifest.shards.length} shards (${folder.manifest.route}); load average ${loadavg()[0]!.toFixed(1)}`);
if (slurm) {
  const r = submitPlan(folder, {});
  console.log(`submitted: ${JSON.stringify(r)}`);
  for (;;) {
    await new Promise((res) => setTimeout(res, 5000));
    const s = planStatus(folder);
    if (s.merge.state === 'merged') break;
    if (s.merge.state === 'not running') throw new Error(`the merge job ended without a merge: ${JSON.stringify(s.counts)}`);
  }
} else {
  for (const s of folder.manifest.shards) await runShard(folder, s.id, { cwd, threads: 2, log: () => {} });
  mergePlan(folder, { cwd });
}
const clusterWall = (performance.now() - t0) / 1000;
const text = readFileSync(folder.resultPath, 'utf8');
const got = JSON.parse(text) as { provenance: Record<string, unknown> };

const t1 = performance.now();
const one = (await compute(requestFromWords(words, cwd))).document as { provenance: Record<string, unknown> };
const oneWall = (performance.now() - t1) / 1000;
const oneSeconds = one.provenance['seconds'];
for (const k of ['time', 'seconds', 'notes']) one.provenance[k] = got.provenance[k];
const same = `${toJsonText(one)}\n` === text;
console.log(`sharded: ${clusterWall.toFixed(1)} s wall (${slurm ? 'Slurm' : 'in this process'}), ${Number(got.provenance['seconds']).toFixed(1)} s in shards and merge`);
console.log(`one machine: ${oneWall.toFixed(1)} s wall (engine ${Number(oneSeconds).toFixed(1)} s); ratio sharded/one ${(clusterWall / oneWall).toFixed(2)}`);
console.log(`documents equal up to provenance time, seconds, notes: ${same}; peak memory ${(resourceUsage().maxRSS / 1024).toFixed(0)} MB`);
await stopPool();
if (!same) process.exitCode = 1;
