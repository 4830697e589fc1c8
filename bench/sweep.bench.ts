/**
 * Sweep: every antisymmetrized monomial seed of x-degree ≤ 6 with up to two θ's, for n = 4 and
 * 5, under ∂x and ∂θ, into a fresh catalogue (everything computed), then the same sweep again
 * (everything kept). Prints the seeds listed, vanishing and merged, the distinct modules, wall
 * and processor time, peak memory, the machine's load, and the first rows of the ranking.
 * Target (issue): ≤ 10 minutes on 2 cores.
 *   npm run bench -- sweep          (SWEEP_BENCH_DEGREE=4 for a short run)
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { resourceUsage } from 'node:process';
import { stopPool } from '../src/pool/pool.js';
import { parseArgs } from '../src/requests/options.js';
import { Catalogue } from '../src/store/catalogue.js';
import { countsText, runSweep, rowKindsText, SWEEP_OPTIONS, sweepFromArgs } from '../src/sweep/index.js';

const degree = process.env['SWEEP_BENCH_DEGREE'] ?? '6';
const words = ['--family', 'monomials', '--max-degree', degree, '--thetas', '0..2', '--n', '4,5', '--ops', 'x,theta'];
const { spec, limits } = sweepFromArgs(parseArgs({ name: 'sweep', usage: '', options: SWEEP_OPTIONS }, words));
const dir = mkdtempSync(join(tmpdir(), 'gradus-sweep-bench-'));
const cat = Catalogue.open(join(dir, 'catalogue.sqlite'));
const load = () => loadavg().map((x) => x.toFixed(1)).join(' ');

console.log(`gradus sweep run ${words.join(' ')}`);
console.log(`load average before: ${load()} (2 cores)`);
for (const pass of ['first run (fresh catalogue)', 'second run (every module kept)']) {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  let last = 0;
  const doc = await runSweep(spec, limits, {
    catalogue: cat,
    progress: (_label, done, total) => {
      if (total && (done === total || performance.now() - last > 30_000)) {
        last = performance.now();
        console.log(`  ${done}/${total} modules, ${((performance.now() - t0) / 1000).toFixed(0)} s`);
      }
    },
  });
  const wall = (performance.now() - t0) / 1000;
  const cpu = process.cpuUsage(c0);
  console.log(`${pass}: ${countsText(doc)}`);
  console.log(`  wall ${wall.toFixed(1)} s (target 600 s, ratio ${(wall / 600).toFixed(3)}), main-process cpu ${((cpu.user + cpu.system) / 1e6).toFixed(1)} s, peak RSS ${(resourceUsage().maxRSS / 1024).toFixed(0)} MB, load average now ${load()}`);
  if (pass.startsWith('first')) {
    const ranked = doc.rows.filter((r) => r.places.length > 0);
    const byKind = (k: string) => ranked.filter((r) => r.findings.some((f) => f.kind === k)).length;
    console.log(`  ${ranked.length} seeds ranked: ${byKind('product')} with a product of q-integers, ${byKind('quotient')} a quotient of such products, ${byKind('q-analog')} a named q-analog, ${byKind('schur-unimodal')} Schur-unimodal, ${doc.isomorphism.length} groups of isomorphism candidates`);
    for (const r of ranked.slice(0, 5)) console.log(`  ${r.rank}. ${r.seed} [${r.ops.join(',')}] dim ${r.places[0]!.dimension}: ${rowKindsText(r)}; ${r.findings[0]?.claim ?? ''}`);
  }
}
cat.close();
await stopPool();
rmSync(dir, { recursive: true, force: true });
