/**
 * Symmetric-function engine: all modified Macdonald polynomials H̃_μ for μ ⊢ 7 and μ ⊢ 8
 * (targets 10 s and 2 min), and Δ'_{e_{k−1}} e_n for every 1 ≤ k ≤ n ≤ 7 (target 60 s in all);
 * beyond the targets, one degree more of each as a data point.
 */
import { factorial } from '../src/core/integers.js';
import { partitionList } from '../src/core/partitions.js';
import { modifiedMacdonaldSchur } from '../src/symfun/macdonald.js';
import { deltaPrimeOfEn, nabla } from '../src/symfun/operators.js';
import { SymFun } from '../src/symfun/symfun.js';

function time<T>(f: () => T): [T, number] {
  const t0 = performance.now();
  const r = f();
  return [r, performance.now() - t0];
}

for (const [n, targetS] of [[7, 10], [8, 120], [9, undefined]] as const) {
  const ps = partitionList(n);
  const [terms, ms] = time(() => ps.reduce((acc, mu) => acc + modifiedMacdonaldSchur(mu).reduce((a, p) => a + p.termCount, 0), 0));
  const fillings = Number(factorial(n)) * ps.length;
  console.log(
    `H̃_μ for all ${ps.length} μ ⊢ ${n}: ${(ms / 1000).toFixed(2)} s` +
      (targetS ? ` (target ${targetS} s, ratio ${(ms / 1000 / targetS).toFixed(3)})` : ' (no target)') +
      `; ${fillings.toLocaleString('en')} standard fillings, ${terms} q,t-terms in the Schur coefficients`,
  );
}

const e = (k: number) => SymFun.basisElement('e', k === 0 ? [] : [k]);
let total = 0;
for (let n = 1; n <= 8; n++) {
  const [, ms] = time(() => {
    for (let k = 1; k <= n; k++) deltaPrimeOfEn(e(k - 1), n);
  });
  if (n <= 7) total += ms;
  console.log(`Δ'_{e_{k−1}} e_${n} for k = 1..${n}: ${(ms / 1000).toFixed(2)} s${n === 8 ? ' (beyond the target, a data point)' : ''}`);
  if (n === 7) console.log(`  all 1 ≤ k ≤ n ≤ 7: ${(total / 1000).toFixed(2)} s (target 60 s, ratio ${(total / 1000 / 60).toFixed(3)})`);
}

// the generic route (H̃ expansion through the *-scalar product) against the closed e_n route
for (const n of [5, 6]) {
  const [, generic] = time(() => nabla(e(n)));
  const [, closed] = time(() => deltaPrimeOfEn(e(n - 1), n));
  console.log(`∇e_${n}: generic route ${generic.toFixed(0)} ms, e_n route ${closed.toFixed(0)} ms, ratio ${(generic / closed).toFixed(1)}`);
}
