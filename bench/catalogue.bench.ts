/**
 * Catalogue build benchmark: every family up to n = 8 (GRADUS_BENCH_N), family by family on
 * 2 worker threads, with per family: units, objects, rows, wall and CPU seconds (all threads),
 * peak RSS so far and the growth of the file; then the totals against the targets of the
 * issue (≤ 600 s on 2 cores, ≤ 4 GB peak, ≤ 2 GB file). GRADUS_BENCH_FAMILIES=a,b builds only
 * those; GRADUS_BENCH_KEEP=PATH keeps the catalogue there (for `npm run bench -- search` with
 * GRADUS_BENCH_CATALOGUE=PATH). The machine is shared: the load average is printed beside.
 */
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { silentProgress } from '../src/core/progress.js';
import { buildCatalogueParallel } from '../src/store/buildParallel.js';
import { Catalogue } from '../src/store/catalogue.js';
import { coverage, planUnits } from '../src/store/planUnits.js';

const nMax = Number(process.env['GRADUS_BENCH_N'] ?? 8);
const keep = process.env['GRADUS_BENCH_KEEP'];
const dir = mkdtempSync(join(tmpdir(), 'gradus-catbench-'));
const path = keep ?? join(dir, 'catalogue.sqlite');
const only = process.env['GRADUS_BENCH_FAMILIES']?.split(',');

const cpuSeconds = (since: NodeJS.CpuUsage): number => {
  const c = process.cpuUsage(since);
  return (c.user + c.system) / 1e6;
};
const rssMB = (): number => process.resourceUsage().maxRSS / 1024;
const fileMB = (): number => statSync(path).size / 1e6;

const load0 = loadavg()[0]!;
const c0 = process.cpuUsage();
const t0 = performance.now();
const planned = coverage(only).planned.map((f) => f.id);
const plan = planUnits(nMax, planned);
console.log(`plan: ${plan.units.length} units, ${plan.units.reduce((s, u) => s + u.objects, 0n)} objects, ${planned.length} families (${((performance.now() - t0) / 1000).toFixed(1)} s, duplicate checks included)`);
const cat = Catalogue.open(path);
let rows = 0;
console.log('family                          units     objects     rows   wall s    CPU s  peak RSS MB  file MB');
for (const family of planned) {
  const t1 = performance.now();
  const c1 = process.cpuUsage();
  const f0 = fileMB();
  const r = await buildCatalogueParallel(cat, { nMax, maxObjects: 10n ** 12n, families: [family], progress: silentProgress, workers: 2 });
  rows += r.rows;
  console.log(`${family.padEnd(30)} ${String(r.units).padStart(6)} ${r.objects.padStart(11)} ${String(r.rows).padStart(8)} ${((performance.now() - t1) / 1000).toFixed(1).padStart(8)} ${cpuSeconds(c1).toFixed(1).padStart(8)} ${rssMB().toFixed(0).padStart(12)} ${(fileMB() - f0).toFixed(1).padStart(8)}`);
}
cat.close();
const wall = (performance.now() - t0) / 1000;
console.log(`total n ≤ ${nMax}: ${rows} rows, ${wall.toFixed(0)} s wall (target ≤ 600: ${(wall / 600).toFixed(2)} of it), ${cpuSeconds(c0).toFixed(0)} s CPU, peak RSS ${rssMB().toFixed(0)} MB (target ≤ 4096), file ${fileMB().toFixed(0)} MB (target ≤ 2048)`);
console.log(`load average: ${load0.toFixed(1)} at the start, ${loadavg()[0]!.toFixed(1)} at the end (2 cores; above 2 the figures are those of a shared machine)`);
if (keep) console.log(`kept ${path}`);
else rmSync(dir, { recursive: true, force: true });
