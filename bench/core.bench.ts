/** Core arithmetic: q-factorials and q-Stirling numbers of growing size. */
import { qFactorial, qStirling2 } from '../src/core/qanalogs.js';

function time<T>(f: () => T): [T, number] {
  const t0 = performance.now();
  const r = f();
  return [r, performance.now() - t0];
}

for (const n of [20, 40, 80]) {
  const [p, ms] = time(() => qFactorial(n));
  console.log(`[${n}]_q!: degree ${p.degQ()}, ${p.termCount} terms, ${ms.toFixed(1)} ms`);
}
const [s, ms] = time(() => qStirling2(60, 30));
console.log(`Stir_q(60,30): degree ${s.degQ()}, ${ms.toFixed(1)} ms (all Stir_q(m,j), m ≤ 60, cached)`);
