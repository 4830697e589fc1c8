/**
 * Inversion sequences and increasing trees: Eulerian, Mahonian and Stirling-cycle laws by
 * exhaustive enumeration, and the Lehmer code and increasing-tree bijections with permutations.
 */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import { Poly } from '../../src/core/poly.js';
import { qFactorial } from '../../src/core/qanalogs.js';
import { dist } from './dist-helper.js';

/** Eulerian polynomials A_n(q) = Σ_w q^des(w) by A(n,k) = (k+1)A(n−1,k) + (n−k)A(n−1,k−1) (Stanley, EC1 §1.4). */
function eulerian(n: number): Poly {
  let row = [1n];
  for (let m = 1; m <= n; m++) row = Array.from({ length: m }, (_, k) => BigInt(k + 1) * (row[k] ?? 0n) + BigInt(m - k) * (row[k - 1] ?? 0n));
  return Poly.fromQCoeffs(row);
}
/** q(q+1)…(q+n−1): unsigned Stirling numbers of the first kind (Stanley, EC1 §1.3). */
function risingQ(n: number): Poly {
  let r = Poly.one;
  for (let i = 0; i < n; i++) r = r.mul(Poly.q.add(Poly.constant(i)));
  return r;
}
const inv = (w: readonly number[]): number => w.reduce((s, x, i) => s + w.slice(i + 1).filter((y) => y < x).length, 0);

describe('inversion sequences', () => {
  it('ascents are Eulerian (Savage–Schuster, J. Combin. Theory Ser. A 119 (2012)), the sum is Mahonian, zeros and full entries give q(q+1)…(q+n−1), n ≤ 7', async () => {
    for (let n = 1; n <= 7; n++) {
      expect((await dist('inversion-sequences', { n }, ['inversion-sequence-ascents'])).series.equals(eulerian(n)), `asc n=${n}`).toBe(true);
      expect((await dist('inversion-sequences', { n }, ['inversion-sequence-sum'])).series.equals(qFactorial(n)), `sum n=${n}`).toBe(true);
      expect((await dist('inversion-sequences', { n }, ['inversion-sequence-zeros'])).series.equals(risingQ(n)), `zeros n=${n}`).toBe(true);
      expect((await dist('inversion-sequences', { n }, ['inversion-sequence-full-entries'])).series.equals(risingQ(n)), `full n=${n}`).toBe(true);
    }
  });

  it('the Lehmer code is a bijection with inverse lehmer-decode; Σ e_i = inv(w); zeros = left-to-right maxima (n ≤ 6)', () => {
    const code = transformById('lehmer-code');
    const decode = transformById('lehmer-decode');
    for (let n = 0; n <= 6; n++) {
      const seen = new Set<string>();
      for (const w of familyById('permutations').generate({ n })) {
        const e = code.apply(w) as number[];
        expect(e.every((x, i) => x >= 0 && x <= i)).toBe(true);
        expect(e.reduce((a, b) => a + b, 0)).toBe(inv(w as number[]));
        let maxima = 0;
        let m = 0;
        for (const x of w as number[]) if (x > m) (m = x), maxima++;
        expect(e.filter((x) => x === 0).length).toBe(maxima);
        expect(decode.apply(e)).toEqual(w);
        seen.add(e.join(','));
      }
      expect(BigInt(seen.size)).toBe(familyById('inversion-sequences').count({ n }));
    }
  });
});

describe('increasing trees', () => {
  it('leaves are Eulerian shifted by one and root degree gives q(q+1)…(q+n−1), n ≤ 7 (Stanley, EC1 (2nd ed.) §1.5, from memory)', async () => {
    for (let n = 1; n <= 7; n++) {
      expect((await dist('increasing-trees', { n }, ['increasing-tree-leaves'])).series.equals(eulerian(n).shift(1)), `n=${n}`).toBe(true);
      expect((await dist('increasing-trees', { n }, ['increasing-tree-root-degree'])).series.equals(risingQ(n)), `n=${n}`).toBe(true);
    }
  });

  it('the depth of vertex n follows the recurrence of a uniform choice of parent (common practice), n ≤ 7', async () => {
    // Vertex n picks a parent v < n uniformly; the depths of v over trees on 0..n−1 have law D_v, so
    // Σ_T q^depth(n) = q·Σ_{v<n} D_v·(n−1)!/v! where D_v = Σ_{T on 0..v} q^depth(v) (v! trees).
    const d: Poly[] = [Poly.one];
    for (let n = 1; n <= 7; n++) {
      let s = Poly.zero;
      for (let v = 0; v < n; v++) {
        let ratio = 1n;
        for (let i = v + 1; i <= n - 1; i++) ratio *= BigInt(i);
        s = s.add(d[v]!.scale(ratio));
      }
      d.push(s.shift(1));
      expect((await dist('increasing-trees', { n }, ['increasing-tree-depth-of-last'])).series.equals(d[n]!), `n=${n}`).toBe(true);
    }
  });

  it('permutations ↔ increasing trees: inverse maps, leaves = descents + 1, root degree = left-to-right minima (n ≤ 6)', () => {
    const toTree = transformById('increasing-tree-of-permutation');
    const toPerm = transformById('permutation-of-increasing-tree');
    for (let n = 1; n <= 6; n++) {
      const seen = new Set<string>();
      for (const w of familyById('permutations').generate({ n })) {
        const a = w as number[];
        const t = toTree.apply(a) as number[];
        expect(t.every((p, i) => p >= 0 && p <= i)).toBe(true);
        expect(toPerm.apply(t)).toEqual(a);
        const childless = new Set(Array.from({ length: n + 1 }, (_, v) => v));
        t.forEach((p) => childless.delete(p));
        let des = 0;
        for (let i = 1; i < n; i++) if (a[i - 1]! > a[i]!) des++;
        expect(childless.size).toBe(des + 1);
        let minima = 0;
        let m = Infinity;
        for (const x of a) if (x < m) (m = x), minima++;
        expect(t.filter((p) => p === 0).length).toBe(minima);
        seen.add(t.join(','));
      }
      expect(BigInt(seen.size)).toBe(familyById('increasing-trees').count({ n }));
    }
  });
});
