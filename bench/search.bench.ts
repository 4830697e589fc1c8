/**
 * Catalogue and search benchmark: build the catalogue for every family × statistic up to
 * n = 8 (target ≤ 5 min on 2 cores), then search it warm over n ≤ 7 against the whole
 * library, sums of two statistics included (target ≤ 2 s per search).
 * GRADUS_BENCH_N overrides the catalogue size (default 8); GRADUS_BENCH_CATALOGUE=PATH searches an
 * existing catalogue instead of building one.
 */
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { silentProgress } from '../src/core/progress.js';
import { Poly } from '../src/core/poly.js';
import { qBinomial, qFactorial, qOrderedStirling } from '../src/core/qanalogs.js';
import { recognise } from '../src/match/recognise.js';
import { searchCatalogue } from '../src/match/search.js';
import { qSeries, qtSeries } from '../src/series/series.js';
import { makeTarget, type Target } from '../src/series/target.js';
import { buildCatalogueParallel } from '../src/store/buildParallel.js';
import { Catalogue } from '../src/store/catalogue.js';

const nMax = Number(process.env['GRADUS_BENCH_N'] ?? 8);
const dir = mkdtempSync(join(tmpdir(), 'gradus-bench-'));

const reuse = process.env['GRADUS_BENCH_CATALOGUE'];
const path = reuse ?? join(dir, 'catalogue.sqlite');
let cat: Catalogue;
if (reuse) console.log(`searching the existing catalogue ${reuse} (no build)`);
else {
const t0 = performance.now();
const cpu0 = process.cpuUsage();
cat = Catalogue.open(path);
const report = await buildCatalogueParallel(cat, { nMax, maxObjects: 100_000_000n, progress: silentProgress, workers: 2 });
const buildSeconds = (performance.now() - t0) / 1000;
const cpu = process.cpuUsage(cpu0);
cat.close();
console.log(`build n ≤ ${nMax} on 2 worker threads: ${report.units} units, ${report.objects} objects, ${report.rows} distributions, ${buildSeconds.toFixed(1)} s wall, ${((cpu.user + cpu.system) / 1e6).toFixed(1)} s CPU (target ≤ 300 s: ${(buildSeconds / 300).toFixed(2)} of it); file ${(statSync(path).size / 1e6).toFixed(1)} MB`);
}

// targets over n ≤ 7: values from src/core/qanalogs.ts, a sum of two statistics (maj + des on
// permutations has no product formula: q-Eulerian type), and a typed series nothing explains
const range = Array.from({ length: Math.min(7, nMax) }, (_, i) => i + 1);
const targets: [string, Target][] = [
  ['[n]_q! (n ≤ 7)', makeTarget('q-factorials', range.map((n) => ({ n, series: qSeries(qFactorial(n)) })))],
  ['[k]_q! Stir_q(n,k) (n ≤ 7, all k)', makeTarget('ordered Stirling', range.flatMap((n) => range.filter((k) => k <= n).map((k) => ({ n, k, series: qSeries(qOrderedStirling(n, k)) }))))],
  ['[n choose k]_q (n ≤ 7, all k)', makeTarget('q-binomials', range.flatMap((n) => range.filter((k) => k <= n).map((k) => ({ n, k, series: qSeries(qBinomial(n, k)) }))))],
  ['a typed series nothing explains (n ≤ 7)', makeTarget('none', range.map((n) => ({ n, series: qtSeries(Poly.fromQCoeffs([1, 0, n * n + 3, 2, 1])) })))],
];
cat = Catalogue.open(path, { existing: true });
for (const [name, t] of targets) {
  searchCatalogue(cat, t); // warm the page cache and statements
  const reps = 5;
  const s0 = performance.now();
  let found = 0;
  for (let i = 0; i < reps; i++) {
    found = searchCatalogue(cat, t).matches.length;
    recognise(t);
  }
  const ms = (performance.now() - s0) / reps;
  const tried = searchCatalogue(cat, t).tried;
  console.log(`search ${name}: ${ms.toFixed(1)} ms per search incl. recognition (target ≤ 2000 ms: ${(ms / 2000).toFixed(3)} of it); ${tried.candidates} candidates at the anchor, ${found} matches`);
}
cat.close();
rmSync(dir, { recursive: true, force: true });
