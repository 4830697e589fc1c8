/**
 * Binary trees, plane trees and 321-avoiding permutations: Narayana, ballot and Touchard
 * distributions by exhaustive enumeration, and the Catalan bijections between the families.
 */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import type { BinaryTree, DyckPath, PlaneTree } from '../../objects/types.js';
import { binaryTreeLeftBranch, binaryTreeRightBranch } from '../../statistics/binary-tree-statistics.js';
import { planeTreeHeight } from '../../statistics/plane-tree-statistics.js';
import { dist } from './dist-helper.js';

const fact = (m: number): bigint => (m <= 1 ? 1n : BigInt(m) * fact(m - 1));
const binom = (a: number, b: number): bigint => (b < 0 || b > a || a < 0 ? 0n : fact(a) / (fact(b) * fact(a - b)));
const catalanN = (m: number): bigint => binom(2 * m, m) / BigInt(m + 1);
/** Narayana N(n, k) = C(n,k)·C(n,k−1)/n. */
const narayana = (n: number, k: number): bigint => (binom(n, k) * binom(n, k - 1)) / BigInt(n);
/** Dyck paths of semilength n with k returns: k/(2n−k)·C(2n−k, n) (Deutsch, Discrete Math. 204 (1999), from memory). */
const ballot = (n: number, k: number): bigint => (k === 0 ? 0n : (BigInt(k) * binom(2 * n - k, n)) / BigInt(2 * n - k));

describe('binary and plane tree statistics', () => {
  it('Narayana: binary trees by left edges N(n, k+1), plane trees by leaves N(n, k), n ≤ 8 (Stanley, EC2 ex. 6.36, from memory)', async () => {
    for (let n = 1; n <= 8; n++) {
      expect((await dist('binary-trees', { n }, ['binary-tree-left-edges'])).series.toQArray()).toEqual(Array.from({ length: n }, (_, k) => narayana(n, k + 1)));
      expect((await dist('plane-trees', { n }, ['plane-tree-leaves'])).series.toQArray()).toEqual(Array.from({ length: n + 1 }, (_, k) => (k === 0 ? 0n : narayana(n, k))));
    }
  });

  it('ballot numbers: plane trees by root degree and binary trees by right branch, n ≤ 8 (Deutsch 1999, returns of Dyck paths)', async () => {
    for (let n = 1; n <= 8; n++) {
      const expected = Array.from({ length: n + 1 }, (_, k) => ballot(n, k));
      expect((await dist('plane-trees', { n }, ['plane-tree-root-degree'])).series.toQArray()).toEqual(expected);
      expect((await dist('binary-trees', { n }, ['binary-tree-right-branch'])).series.toQArray()).toEqual(expected);
    }
  });

  it("Touchard: binary trees with n nodes and k leaves number C(n−1, 2k−2)·C_{k−1}·2^{n−2k+1}, n ≤ 8 (Touchard's identity; Riordan, Combinatorial Identities, from memory)", async () => {
    for (let n = 1; n <= 8; n++) {
      const s = (await dist('binary-trees', { n }, ['binary-tree-leaves'])).series;
      for (let k = 1; 2 * k - 2 <= n - 1; k++) expect(s.coeff(k), `n=${n} k=${k}`).toBe(binom(n - 1, 2 * k - 2) * catalanN(k - 1) * 2n ** BigInt(n - 2 * k + 1));
      expect(s.sumCoefficients()).toBe(catalanN(n));
    }
  });

  it('the rotation correspondence commutes with the two Dyck codings; the codings and their inverses are bijections (n ≤ 7)', () => {
    const rot = transformById('plane-to-binary-tree');
    const unrot = transformById('binary-to-plane-tree');
    const b2d = transformById('binary-tree-to-dyck');
    const p2d = transformById('plane-tree-to-dyck');
    const d2b = transformById('dyck-to-binary-tree');
    const d2p = transformById('dyck-to-plane-tree');
    const bt = familyById('binary-trees');
    const pt = familyById('plane-trees');
    for (let n = 0; n <= 7; n++) {
      const codes = new Set<string>();
      for (const t of pt.generate({ n })) {
        const b = rot.apply(t) as BinaryTree;
        const d = p2d.apply(t) as DyckPath;
        expect(b2d.apply(b)).toEqual(d);
        expect(pt.key(unrot.apply(b))).toBe(pt.key(t));
        expect(pt.key(d2p.apply(d))).toBe(pt.key(t));
        expect(bt.key(d2b.apply(d))).toBe(bt.key(b));
        // The depth-first walk's height is the tree's height.
        let h = 0;
        let top = 0;
        for (const s of d) top = Math.max(top, (h += s === 1 ? 1 : -1));
        expect(planeTreeHeight.compute(t as PlaneTree)).toBe(top);
        codes.add(d.join(''));
      }
      expect(BigInt(codes.size)).toBe(catalanN(n));
    }
  });

  it('the mirror exchanges the left and right branches of binary trees (n ≤ 7)', () => {
    const mirror = transformById('binary-tree-mirror');
    for (let n = 0; n <= 7; n++) {
      for (const t of familyById('binary-trees').generate({ n })) {
        const m = mirror.apply(t) as BinaryTree;
        expect(binaryTreeLeftBranch.compute(m)).toBe(binaryTreeRightBranch.compute(t as BinaryTree));
      }
    }
  });
});

describe('321-avoiding permutations', () => {
  it('are exactly the permutations without a decreasing subsequence of length 3 (checked by brute force), n ≤ 7', () => {
    for (let n = 0; n <= 7; n++) {
      const brute = new Set<string>();
      for (const w of familyById('permutations').generate({ n })) {
        const a = w as number[];
        let bad = false;
        for (let i = 0; i < n && !bad; i++) for (let j = i + 1; j < n && !bad; j++) for (let k = j + 1; k < n && !bad; k++) bad = a[i]! > a[j]! && a[j]! > a[k]!;
        if (!bad) brute.add(a.join(','));
      }
      expect(new Set([...familyById('321-avoiding-permutations').generate({ n })].map((w) => (w as number[]).join(',')))).toEqual(brute);
    }
  });

  it("Krattenthaler's bijection: onto Dyck paths, inverse holds, left-to-right maxima become peaks (Narayana), n ≤ 8", async () => {
    const to = transformById('321-avoiding-to-dyck');
    const from = transformById('dyck-to-321-avoiding');
    for (let n = 1; n <= 8; n++) {
      const images = new Set<string>();
      for (const w of familyById('321-avoiding-permutations').generate({ n })) {
        const p = to.apply(w) as DyckPath;
        images.add(p.join(''));
        expect(from.apply(p)).toEqual(w);
        let maxima = 0;
        let m = 0;
        for (const x of w as number[]) if (x > m) (m = x), maxima++;
        let peaks = 0;
        for (let i = 1; i < p.length; i++) if (p[i - 1] === 1 && p[i] === 0) peaks++;
        expect(peaks).toBe(maxima);
      }
      expect(BigInt(images.size)).toBe(catalanN(n));
      const viaInclusion = (await dist('321-avoiding-permutations', { n }, ['left-to-right-maxima'], { transform: '321-avoiding-inclusion' })).series;
      expect(viaInclusion.toQArray()).toEqual(Array.from({ length: n + 1 }, (_, k) => (k === 0 ? 0n : narayana(n, k))));
    }
  });
});
