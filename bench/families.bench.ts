/**
 * Streaming speed of the family generators (no statistic computed; one core): the
 * reusable-buffer fast path `visit` against the allocating `generate`, on the sizes the
 * distribution benchmarks use. Prints sizes, times, rates and ratios.
 */
import { familyById } from '../objects/index.js';
import type { Params } from '../src/enumerate/plugin.js';

function time(label: string, run: () => number): [number, number] {
  const t0 = performance.now();
  const count = run();
  const ms = performance.now() - t0;
  console.log(`${label.padEnd(52)} ${String(count).padStart(11)} objects  ${(ms / 1000).toFixed(2).padStart(6)} s  ${((count / ms) * 1000 / 1e6).toFixed(1).padStart(6)} M/s`);
  return [count, ms];
}

function visitCount(id: string, p: Params): number {
  let c = 0;
  let sink = 0;
  familyById(id).visit!(p, (x) => {
    c++;
    sink += (x as readonly unknown[]).length;
  });
  if (sink < 0) console.log(sink);
  return c;
}

function generateCount(id: string, p: Params, cap = Infinity): number {
  let c = 0;
  for (const _ of familyById(id).generate(p)) if (++c >= cap) break;
  return c;
}

const [, visitMs] = time('permutations n=11, visit', () => visitCount('permutations', { n: 11 }));
const [genCount, genMs] = time('permutations n=10, generate (fresh arrays)', () => generateCount('permutations', { n: 10 }));
console.log(`  generate / visit time per object: ${((genMs / genCount) / (visitMs / 39916800)).toFixed(1)}×`);

let total = 0;
let totalMs = 0;
for (let k = 1; k <= 10; k++) {
  const [c, ms] = time(`ordered-set-partitions n=10 k=${k}, visit`, () => visitCount('ordered-set-partitions', { n: 10, k }));
  total += c;
  totalMs += ms;
}
console.log(`ordered-set-partitions n=10, all k: ${total} objects in ${(totalMs / 1000).toFixed(2)} s (one core, no statistic)`);
time('parking-functions n=8, generate', () => generateCount('parking-functions', { n: 8 }));
time('parking-functions n=8, visit', () => {
  let c = 0;
  familyById('parking-functions').visit!({ n: 8 }, () => c++);
  return c;
});
time('dyck-paths n=15, generate', () => generateCount('dyck-paths', { n: 15 }));
time('set-partitions n=11, generate', () => generateCount('set-partitions', { n: 11 }));
time('standard-tableaux n=12, generate', () => generateCount('standard-tableaux', { n: 12 }));
time('standard-tableaux n=14, visit', () => {
  let c = 0;
  familyById('standard-tableaux').visit!({ n: 14 }, () => c++);
  return c;
});
