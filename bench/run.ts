/**
 * Benchmark runner: `npm run bench -- [name…]` runs bench/<name>.bench.ts (all when no
 * name is given). Each benchmark prints its own sizes, times and ratios.
 */
import { readdirSync } from 'node:fs';

const dir = new URL('.', import.meta.url);
const all = readdirSync(dir).filter((f) => f.endsWith('.bench.ts')).sort();
const wanted = process.argv.slice(2);
const chosen = wanted.length ? all.filter((f) => wanted.some((w) => f.startsWith(w))) : all;
if (chosen.length === 0) {
  console.error(`no benchmark matches ${wanted.join(' ')}; available: ${all.join(', ') || '(none)'}`);
  process.exit(2);
}
for (const f of chosen) {
  console.log(`== ${f}`);
  await import(new URL(f, dir).href);
}
