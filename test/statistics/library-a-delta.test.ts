/**
 * The Delta conjecture/theorem families of part A against the symmetric-function engine:
 * ordered multiset partitions at t = 0, and decorated Dyck paths (labelled valley version,
 * unlabelled rise and valley versions). Sources are named beside each check.
 */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { Poly } from '../../src/core/poly.js';
import { deltaPrimeOfEn } from '../../src/symfun/operators.js';
import { fundamentalToSchur } from '../../src/symfun/quasisym.js';
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

/** Σ over the family of q^{s1} t^{s2} F_{iDes(reading word)}, as a symmetric function (throws if not symmetric). */
async function frobenius(family: string, n: number, k: number, stats: [string, string]): Promise<SymFun> {
  const d = await dist(family, { n, k }, stats, { frobenius: 'descents' });
  const coeffs = new Map<number, Poly>(d.frobenius!.terms.map((t) => [t.set!.reduce((m, i) => m + 2 ** (i - 1), 0), t.series]));
  return fundamentalToSchur(n, coeffs);
}

describe('decorated Dyck paths against Δ′_{e_{k−1}} e_n', () => {
  it('labelled, decorated contractible valleys: Σ q^dinv t^area F_{iDes} = Δ′_{e_{k−1}} e_n for n ≤ 5, all k (valley version of the Delta conjecture, Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018); a conjecture, checked here)', async () => {
    for (let n = 1; n <= 5; n++) {
      for (let k = 1; k <= n; k++) {
        const side = await frobenius('valley-decorated-dyck-paths', n, k, ['valley-decorated-dinv', 'valley-decorated-area']);
        expect(side.equals(deltaPrime(n, k)), `n=${n} k=${k}`).toBe(true);
      }
    }
  });
  it('labelled valley and rise versions have equally many objects for n ≤ 7 (both count Δ′_{e_{k−1}} e_n at q = t = 1 if the valley conjecture holds)', () => {
    for (let n = 1; n <= 7; n++) {
      for (let k = 1; k <= n; k++) expect(familyById('valley-decorated-dyck-paths').count({ n, k }), `n=${n} k=${k}`).toBe(familyById('decorated-dyck-paths').count({ n, k }));
    }
  });
  it('unlabelled, decorated double rises and decorated valleys: Σ q^dinv t^area = ⟨Δ′_{e_{k−1}} e_n, e_n⟩ for n ≤ 6 (both versions, same source)', async () => {
    for (let n = 1; n <= 6; n++) {
      for (let k = 1; k <= n; k++) {
        const target = deltaPrime(n, k).hallInner(e(n)).toPoly();
        const rises = (await dist('dyck-paths-decorated-rises', { n, k }, ['decorated-rises-dinv', 'decorated-rises-area'])).series;
        const valleys = (await dist('dyck-paths-decorated-valleys', { n, k }, ['decorated-valleys-dinv', 'decorated-valleys-area'])).series;
        expect(rises.equals(target), `rises n=${n} k=${k}`).toBe(true);
        expect(valleys.equals(target), `valleys n=${n} k=${k}`).toBe(true);
      }
    }
  });
});

describe("Loehr's pmaj", () => {
  it('Σ q^area t^pmaj = Σ q^dinv t^area over parking functions, n ≤ 6 (Loehr, Adv. in Appl. Math. 34 (2005); Haglund, AMS 2008, ch. 5)', async () => {
    for (let n = 1; n <= 6; n++) {
      const ap = (await dist('parking-functions', { n }, ['parking-area', 'parking-pmaj'])).series;
      const da = (await dist('parking-functions', { n }, ['parking-dinv', 'parking-area'])).series;
      expect(ap.equals(da), `n=${n}`).toBe(true);
    }
  });
});
