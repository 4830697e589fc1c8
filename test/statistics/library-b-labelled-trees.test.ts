/**
 * Trees on 0..n: Kreweras' theorem (tree inversions ~ parking-function area), the
 * Mallows–Riordan connected-graph identity, Rényi's leaf count, root degrees, and the Prüfer
 * and breadth-first bijections, by exhaustive enumeration.
 */
import { factorial, stirlingS2 } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import type { LabelledDyckPath } from '../../objects/types.js';
import { Poly } from '../../src/core/poly.js';
import { dist } from './dist-helper.js';

const fact = (m: number): bigint => (m <= 1 ? 1n : BigInt(m) * fact(m - 1));
const binom = (a: number, b: number): bigint => (b < 0 || b > a ? 0n : fact(a) / (fact(b) * fact(a - b)));

/** Σ over connected graphs on [m] of y^edges, from all graphs (1+y)^C(m,2) by rooting at vertex 1 (common practice). */
function connectedByEdges(mMax: number): Poly[] {
  const all = (m: number): Poly => Poly.one.add(Poly.q).pow((m * (m - 1)) / 2);
  const c: Poly[] = [Poly.zero];
  for (let m = 1; m <= mMax; m++) {
    let rest = Poly.zero;
    for (let k = 1; k < m; k++) rest = rest.add(c[k]!.mul(all(m - k)).scale(binom(m - 1, k - 1)));
    c.push(all(m).sub(rest));
  }
  return c;
}

describe('labelled trees on 0..n', () => {
  it('Kreweras: Σ_T q^inv(T) = Σ_PF q^area(PF) over parking functions of size n, n ≤ 6 (Kreweras, Period. Math. Hungar. 11 (1980))', async () => {
    for (let n = 0; n <= 6; n++) {
      const trees = (await dist('labelled-trees', { n }, ['tree-inversions'])).series;
      const pfs = (await dist('parking-functions', { n }, ['parking-area'])).series;
      expect(trees.equals(pfs), `n=${n}`).toBe(true);
    }
  });

  it('Mallows–Riordan: y^(m−1)·I_m(1 + y) = Σ over connected graphs on [m] of y^edges, m = n + 1 ≤ 7 (Bull. Amer. Math. Soc. 74 (1968))', async () => {
    const connected = connectedByEdges(7);
    for (let n = 0; n <= 6; n++) {
      const inv = (await dist('labelled-trees', { n }, ['tree-inversions'])).series;
      let sub = Poly.zero;
      for (const [k, , c] of inv.sortedTerms()) sub = sub.add(Poly.one.add(Poly.q).pow(k).scale(c));
      expect(sub.shift(n).equals(connected[n + 1]!), `m=${n + 1}`).toBe(true);
    }
  });

  it('leaves: (m!/k!)·S(m−2, m−k) trees on m = n + 1 vertices have k leaves, 2 ≤ m ≤ 7 (Rényi 1959, from memory; mathjs factorial, stirlingS2)', async () => {
    for (let n = 1; n <= 6; n++) {
      const m = n + 1;
      const s = (await dist('labelled-trees', { n }, ['tree-leaves'])).series;
      for (let k = 2; k <= m; k++) expect(Number(s.coeff(k)), `m=${m} k=${k}`).toBe(factorial(m) / factorial(k) * stirlingS2(m - 2, m - k));
    }
  });

  it('root degree d: C(m−2, d−1)·(m−1)^(m−1−d) trees, from the Prüfer code (Stanley EC2 §5.3, from memory), n ≤ 6', async () => {
    for (let n = 1; n <= 6; n++) {
      const m = n + 1;
      const s = (await dist('labelled-trees', { n }, ['tree-root-degree'])).series;
      for (let d = 1; d <= n; d++) expect(s.coeff(d)).toBe(binom(m - 2, d - 1) * BigInt(m - 1) ** BigInt(m - 1 - d));
      // Read through the Prüfer code, the zeros are the root degree minus one.
      const z = (await dist('labelled-trees', { n }, ['prufer-zeros'], { transform: 'prufer-code' })).series;
      expect(z.shift(1).equals(s)).toBe(true);
    }
  });

  it('Prüfer code and decoding are inverse bijections, n ≤ 5', () => {
    const enc = transformById('prufer-code');
    const dec = transformById('prufer-decode');
    for (let n = 1; n <= 5; n++) {
      const codes = new Set<string>();
      for (const t of familyById('labelled-trees').generate({ n })) {
        const c = enc.apply(t) as number[];
        expect(dec.apply(c)).toEqual(t);
        codes.add(c.join(','));
      }
      expect(BigInt(codes.size)).toBe(familyById('prufer-codes').count({ n }));
      for (const c of familyById('prufer-codes').generate({ n })) expect(enc.apply(dec.apply(c))).toEqual(c);
    }
  });

  it('breadth-first search: a bijection onto the parking functions; root degree = cars preferring spot 0, n ≤ 5 (Foata–Riordan 1974)', () => {
    const toPf = transformById('tree-to-parking');
    const toTree = transformById('parking-to-tree');
    const pfs = familyById('parking-functions');
    for (let n = 0; n <= 5; n++) {
      const all = new Set([...pfs.generate({ n })].map((p) => pfs.key(p)));
      const images = new Set<string>();
      for (const t of familyById('labelled-trees').generate({ n })) {
        const p = toPf.apply(t) as LabelledDyckPath;
        images.add(pfs.key(p));
        expect(toTree.apply(p)).toEqual(t);
        const firstRun = p.path.indexOf(0);
        expect((t as number[]).filter((x) => x === 0).length).toBe(firstRun === -1 ? 0 : firstRun);
      }
      expect(images).toEqual(all);
    }
  });
});
