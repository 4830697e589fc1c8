/** Family counts (generated and by formula) against outside references, each source named. */
import { bellNumbers, catalan, combinations, composition, factorial, multinomial, stirlingS2 } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import type { Params } from '../../src/enumerate/plugin.js';

function streamed(id: string, p: Params): number {
  let c = 0;
  for (const _ of familyById(id).generate(p)) c++;
  return c;
}
function both(id: string, p: Params): [number, number] {
  return [streamed(id, p), Number(familyById(id).count(p))];
}

/** f^λ = n!/Π hooks (Frame–Robinson–Thrall), computed here from the diagram. */
function hookFormula(shape: readonly number[]): number {
  const n = shape.reduce((a, b) => a + b, 0);
  let prod = 1;
  shape.forEach((len, i) => {
    for (let j = 0; j < len; j++) {
      const arm = len - j - 1;
      const leg = shape.filter((l, r) => r > i && l > j).length;
      prod *= arm + leg + 1;
    }
  });
  return Number(factorial(n)) / prod;
}

describe('counts against outside references', () => {
  it('set partitions: S(n,k) and Bell numbers (mathjs stirlingS2, bellNumbers)', () => {
    for (let n = 0; n <= 7; n++) {
      expect(both('set-partitions', { n })).toEqual([bellNumbers(n), bellNumbers(n)]);
      for (let k = 1; k <= n; k++) expect(both('set-partitions', { n, k })).toEqual([stirlingS2(n, k), stirlingS2(n, k)]);
    }
  });
  it('ordered set partitions: k!·S(n,k) (mathjs stirlingS2, factorial)', () => {
    for (let n = 1; n <= 7; n++) {
      for (let k = 1; k <= n; k++) {
        const ref = factorial(k) * stirlingS2(n, k);
        expect(both('ordered-set-partitions', { n, k })).toEqual([ref, ref]);
      }
    }
  });
  it('Dyck paths: Catalan numbers (mathjs catalan)', () => {
    for (let n = 0; n <= 9; n++) expect(both('dyck-paths', { n })).toEqual([catalan(n), catalan(n)]);
    expect(Number(familyById('dyck-paths').count({ n: 20 }))).toBe(catalan(20));
  });
  it('compositions into k parts (mathjs composition) and 2^(n−1) in all (Stanley EC1 §1.2)', () => {
    for (let n = 1; n <= 9; n++) {
      expect(both('compositions', { n })).toEqual([2 ** (n - 1), 2 ** (n - 1)]);
      for (let k = 1; k <= n; k++) expect(both('compositions', { n, k })).toEqual([composition(n, k), composition(n, k)]);
    }
  });
  it('subsets: 2^n and C(n,k) (mathjs combinations)', () => {
    for (let n = 0; n <= 8; n++) {
      expect(both('subsets', { n })).toEqual([2 ** n, 2 ** n]);
      for (let k = 0; k <= n; k++) expect(both('subsets', { n, k })).toEqual([combinations(n, k), combinations(n, k)]);
    }
  });
  it('words with a given content: multinomial coefficients (mathjs multinomial)', () => {
    for (const content of [[2, 1, 1], [3, 3], [1, 2, 3], [2, 2, 2], [4, 1]]) {
      expect(both('words', { content })).toEqual([multinomial(content), multinomial(content)]);
    }
  });
  it('permutations and fillings: n! (mathjs factorial)', () => {
    for (let n = 0; n <= 7; n++) expect(both('permutations', { n })).toEqual([factorial(n), factorial(n)]);
    for (const shape of [[2, 1], [2, 2], [3, 1, 1], [2, 2, 1, 1]]) {
      const n = shape.reduce((a, b) => a + b, 0);
      expect(both('fillings', { shape })).toEqual([factorial(n), factorial(n)]);
    }
  });
  it('partitions: p(n) (OEIS A000041, from memory; generation is the independent check)', () => {
    const p = [1, 1, 2, 3, 5, 7, 11, 15, 22, 30, 42, 56, 77, 101, 135, 176];
    p.forEach((v, n) => expect(both('partitions', { n })).toEqual([v, v]));
    expect(Number(familyById('partitions').count({ n: 100 }))).toBe(190569292); // p(100) (Hardy–Ramanujan's check value, from memory)
    // Σ_k p(n,k) = p(n), generated.
    for (let n = 1; n <= 12; n++) {
      let s = 0;
      for (let k = 1; k <= n; k++) s += streamed('partitions', { n, k });
      expect(s).toBe(p[n]);
    }
  });
  it('standard tableaux of a shape: the hook length formula (Frame–Robinson–Thrall)', () => {
    for (const shape of [[3, 2], [3, 2, 1], [4, 2, 1], [3, 3, 2], [2, 2, 2, 1], [5, 1, 1, 1], [4, 4]]) {
      const f = hookFormula(shape);
      expect(both('standard-tableaux', { shape })).toEqual([f, f]);
    }
  });
  it('standard tableaux of size n: the involutions of [n] (Stanley EC2 §7.13, from memory), by a(n) = a(n−1) + (n−1)a(n−2)', () => {
    const inv = [1, 1];
    for (let n = 2; n <= 9; n++) inv.push(inv[n - 1]! + (n - 1) * inv[n - 2]!);
    for (let n = 0; n <= 9; n++) expect(both('standard-tableaux', { n })).toEqual([inv[n], inv[n]]);
  });
  it('parking functions: (n+1)^(n−1) (Konheim–Weiss)', () => {
    for (let n = 1; n <= 6; n++) expect(both('parking-functions', { n })).toEqual([(n + 1) ** (n - 1), (n + 1) ** (n - 1)]);
  });
  it('semistandard tableaux: Kostka numbers (Macdonald, Symmetric Functions, I.6 table for n = 4, from memory) and Σ_λ f^λ K_λμ = multinomial(μ) (RSK, Stanley EC2 §7.11)', () => {
    // K_{λμ} for n = 4, μ = (2,1,1): λ = 4, 31, 22, 211 → 1, 2, 1, 1.
    const mu = [2, 1, 1];
    const row = [[4], [3, 1], [2, 2], [2, 1, 1], [1, 1, 1, 1]].map((shape) => both('semistandard-tableaux', { shape, content: mu }));
    expect(row).toEqual([[1, 1], [2, 2], [1, 1], [1, 1], [0, 0]]);
    expect(both('semistandard-tableaux', { shape: [3, 2], content: [2, 2, 1] })).toEqual([2, 2]);
    for (const content of [[2, 1, 1], [2, 2, 1], [3, 1, 1, 1], [2, 2, 2]]) {
      const n = content.reduce((a, b) => a + b, 0);
      let s = 0;
      for (const lam of familyById('partitions').generate({ n })) {
        s += hookFormula(lam as number[]) * streamed('semistandard-tableaux', { shape: lam as number[], content });
      }
      expect(s).toBe(multinomial(content));
    }
  });
  it('decorated labelled Dyck paths: no decoration gives the parking functions; n−1 decorations give one path (Δ′_{e_0} e_n = e_n, Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018))', () => {
    for (let n = 1; n <= 5; n++) {
      expect(both('decorated-dyck-paths', { n, d: 0 })).toEqual([(n + 1) ** (n - 1), (n + 1) ** (n - 1)]);
      expect(both('decorated-dyck-paths', { n, k: 1 })).toEqual([1, 1]);
    }
    // Σ_d over decorations = Σ over labelled paths of 2^(double rises), generated both ways.
    for (let n = 1; n <= 5; n++) {
      let total = 0;
      for (let d = 0; d < n; d++) total += streamed('decorated-dyck-paths', { n, d });
      let direct = 0;
      for (const p of familyById('parking-functions').generate({ n })) {
        const path = (p as { path: number[] }).path;
        let rises = 0;
        for (let i = 1; i < path.length; i++) if (path[i] === 1 && path[i - 1] === 1) rises++;
        direct += 2 ** rises;
      }
      expect(total).toBe(direct);
    }
  });
});
