/**
 * The Delta conjecture/theorem families of part A against the symmetric-function engine:
 * ordered multiset partitions at t = 0, and decorated Dyck paths (labelled valley version,
 * unlabelled rise and valley versions). Sources are named beside each check.
 */
import { describe, expect, it } from 'vitest';
import { Poly } from '../../src/core/poly.js';
import { deltaPrimeOfEn } from '../../src/symfun/operators.js';
import { SymFun } from '../../src/symfun/symfun.js';
import { dist } from './dist-helper.js';

const e = (k: number): SymFun => (k === 0 ? SymFun.one : SymFun.basisElement('e', [k]));
const deltaCache = new Map<string, SymFun>();
function deltaPrime(n: number, k: number): SymFun {
  const key = `${n},${k}`;
  let hit = deltaCache.get(key);
  if (!hit) deltaCache.set(key, (hit = deltaPrimeOfEn(e(k - 1), n)));
  return hit;
}
function compositions(n: number): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (let f = 1; f <= n; f++) for (const r of compositions(n - f)) out.push([f, ...r]);
  return out;
}

describe('ordered multiset partitions: the Delta conjecture at t = 0', () => {
  it('inv, dinv, maj and minimaj each give ⟨Δ′_{e_{k−1}} e_n |_{t=0}, h_α⟩ for every composition α of n ≤ 5 and α = (2,1,2,1) (Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018) §4; proved by Wilson, EJC 2016, Rhoades, JCTA 2018, and Haglund–Rhoades–Shimozono, Adv. Math. 329 (2018))', async () => {
    const cases: [number[], number][] = [];
    for (let n = 1; n <= 5; n++) for (const alpha of compositions(n)) for (let k = Math.max(...alpha); k <= n; k++) cases.push([alpha, k]);
    for (let k = 2; k <= 6; k++) cases.push([[2, 1, 2, 1], k]);
    for (const [alpha, k] of cases) {
      const n = alpha.reduce((a, b) => a + b, 0);
      const target = deltaPrime(n, k).specialize({ t: 0 }).hallInner(SymFun.basisElement('h', [...alpha].sort((a, b) => b - a))).toPoly();
      for (const stat of ['omp-inv', 'omp-dinv', 'omp-maj', 'omp-minimaj']) {
        const d = await dist('ordered-multiset-partitions', { content: alpha, k }, [stat]);
        expect(d.series.equals(target), `${stat} α=${alpha} k=${k}`).toBe(true);
      }
    }
  });
});
