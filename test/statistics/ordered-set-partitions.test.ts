/** The four Delta-conjecture statistics on ordered set partitions (Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018)). */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import type { OrderedSetPartition } from '../../objects/types.js';
import { Poly } from '../../src/core/poly.js';
import { qOrderedStirling } from '../../src/core/qanalogs.js';
import { ospMinimaj } from '../../statistics/osp-maj.js';
import { dist } from './dist-helper.js';

function majOfWord(w: readonly number[]): number {
  let s = 0;
  for (let i = 1; i < w.length; i++) if (w[i - 1]! > w[i]!) s += i;
  return s;
}

function arrangements(b: readonly number[]): number[][] {
  if (b.length <= 1) return [b.slice()];
  return b.flatMap((x, i) => arrangements([...b.slice(0, i), ...b.slice(i + 1)]).map((r) => [x, ...r]));
}

/** minimaj by definition: the least maj over every ordering inside every block. */
function minimajBrute(p: OrderedSetPartition): number {
  let best = Infinity;
  const rec = (i: number, acc: number[]): void => {
    if (i === p.length) best = Math.min(best, majOfWord(acc));
    else for (const a of arrangements(p[i]!)) rec(i + 1, [...acc, ...a]);
  };
  rec(0, []);
  return best;
}

describe('ordered set partition statistics', () => {
  it('inv, maj, minimaj and dinv each have distribution [k]_q!·Stir_q(n,k) for n ≤ 6, all k (Haglund–Remmel–Wilson 2018; Rhoades 2018)', async () => {
    for (let n = 0; n <= 6; n++) {
      for (let k = 0; k <= n; k++) {
        const target = qOrderedStirling(n, k);
        for (const s of ['osp-inv', 'osp-maj', 'osp-minimaj', 'osp-dinv']) {
          expect((await dist('ordered-set-partitions', { n, k }, [s])).series.equals(target), `${s} n=${n} k=${k}`).toBe(true);
        }
      }
    }
  });

  it('minimaj equals the least major index over all orderings inside the blocks (definition, n ≤ 5)', () => {
    for (let n = 1; n <= 5; n++) {
      for (let k = 1; k <= n; k++) {
        for (const p of familyById('ordered-set-partitions').generate({ n, k })) {
          expect(ospMinimaj.compute(p as OrderedSetPartition), JSON.stringify(p)).toBe(minimajBrute(p as OrderedSetPartition));
        }
      }
    }
  });

  it('osp-dinv equals the dinv of decorated labelled paths with no area outside decorated rows (rise version at t = 0)', async () => {
    for (let n = 1; n <= 5; n++) {
      for (let k = 1; k <= n; k++) {
        const deco = await dist('decorated-dyck-paths', { n, k }, ['decorated-dinv', 'decorated-area']);
        const atT0 = Poly.fromTerms([...deco.series.terms()].filter(([, j]) => j === 0));
        expect(atT0.equals((await dist('ordered-set-partitions', { n, k }, ['osp-dinv'])).series), `n=${n} k=${k}`).toBe(true);
      }
    }
  });
});
