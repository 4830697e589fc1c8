/** The maps of part A: bijectivity and the statistics they carry, each against its source. */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { dyckToNoncrossing, isNoncrossing, noncrossingToDyck } from '../../objects/support/noncrossing.js';
import { krewerasComplement } from '../../objects/transforms/kreweras-complement.js';
import { rotateNoncrossing } from '../../objects/transforms/nc-rotation.js';
import { evacuate } from '../../objects/transforms/evacuation.js';
import { evacuateSkew } from '../../objects/transforms/skew-evacuation.js';
import { promote } from '../../objects/transforms/skew-promotion.js';
import { transposeSkew } from '../../objects/transforms/skew-transpose.js';
import { conjugateSuperpartition } from '../../objects/transforms/superpartition-conjugate.js';
import { conjugate } from '../../src/core/partitions.js';
import { schroderReverse } from '../../objects/transforms/schroder-reverse.js';
import { schroderZetaMap } from '../../objects/transforms/schroder-zeta.js';
import type { SchroderPath, SetPartition, SkewTableau, Superpartition } from '../../objects/types.js';
import { statisticById } from '../../statistics/index.js';

const stat = (id: string) => (x: unknown): number => statisticById(id).compute(x);

describe('Schröder maps', () => {
  it('zeta: bijective, dinv(π) = area(ζπ) and area(π) = bounce(ζπ), keeps the diagonal steps, n ≤ 7 (Haglund, AMS 2008, ch. 3–4)', () => {
    const [dinv, area, bounce, diag] = ['schroder-dinv', 'schroder-area', 'schroder-bounce', 'schroder-diagonal-steps'].map(stat);
    for (let n = 0; n <= 7; n++) {
      const images = new Set<string>();
      for (const p of familyById('schroder-paths').generate({ n })) {
        const z = schroderZetaMap(p as SchroderPath);
        expect(area!(z)).toBe(dinv!(p));
        expect(bounce!(z)).toBe(area!(p));
        expect(diag!(z)).toBe(diag!(p));
        images.add(z.join(''));
      }
      expect(BigInt(images.size)).toBe(familyById('schroder-paths').count({ n }));
    }
  });
  it('reversal keeps the area and the diagonal steps, n ≤ 7 (common practice)', () => {
    const [area, diag] = ['schroder-area', 'schroder-diagonal-steps'].map(stat);
    for (let n = 0; n <= 7; n++) {
      for (const p of familyById('schroder-paths').generate({ n })) {
        const r = schroderReverse.apply(p as SchroderPath);
        expect(area!(r)).toBe(area!(p));
        expect(diag!(r)).toBe(diag!(p));
      }
    }
  });
});

describe('noncrossing partition maps', () => {
  const nc = familyById('noncrossing-partitions');
  it('Kreweras complement: noncrossing, blocks(K π) = n + 1 − blocks(π), bijective, and K² = ρ^{-1} for ρ the rotation i ↦ i + 1, n ≤ 8 (Kreweras, Discrete Math. 1 (1972): K² is a rotation)', () => {
    for (let n = 1; n <= 8; n++) {
      const images = new Set<string>();
      for (const p of nc.generate({ n })) {
        const k = krewerasComplement(p as SetPartition);
        expect(isNoncrossing(k)).toBe(true);
        expect(k.length).toBe(n + 1 - (p as SetPartition).length);
        expect(nc.key(rotateNoncrossing(krewerasComplement(k)))).toBe(nc.key(p));
        images.add(nc.key(k));
      }
      expect(BigInt(images.size)).toBe(nc.count({ n }));
    }
  });
  it('nc-to-dyck is a bijection onto Dyck paths taking blocks to peaks, with inverse dyck-to-nc, n ≤ 8 (Simion, Discrete Math. 217 (2000), from memory)', () => {
    for (let n = 0; n <= 8; n++) {
      const images = new Set<string>();
      for (const p of nc.generate({ n })) {
        const d = noncrossingToDyck(p as SetPartition);
        let peaks = 0;
        for (let i = 1; i < d.length; i++) if (d[i - 1] === 1 && d[i] === 0) peaks++;
        expect(peaks).toBe((p as SetPartition).length);
        expect(nc.key(dyckToNoncrossing(d))).toBe(nc.key(p));
        images.add(d.join(''));
      }
      expect(BigInt(images.size)).toBe(familyById('dyck-paths').count({ n }));
    }
  });
});

describe('skew tableau maps', () => {
  const skew = familyById('skew-standard-tableaux');
  const shapes: [number[], number[]][] = [[[3, 2], [1]], [[3, 3, 1], [2, 1]], [[4, 3, 2], [2, 1]], [[2, 2, 2], []], [[3, 3], []], [[4, 2, 1], [1]]];
  it('promotion is a bijection, evacuation an involution, and ε∂ = ∂^{-1}ε, i.e. (ε∂)² = id (Stanley, "Promotion and evacuation", EJC 16(2) (2009) §2, from memory)', () => {
    for (const [outer, inner] of shapes) {
      const images = new Set<string>();
      for (const t of skew.generate({ outer, inner })) {
        const x = t as SkewTableau;
        images.add(skew.key(promote(x)));
        expect(skew.key(evacuateSkew(evacuateSkew(x)))).toBe(skew.key(x));
        expect(skew.key(evacuateSkew(promote(evacuateSkew(promote(x)))))).toBe(skew.key(x));
      }
      expect(BigInt(images.size)).toBe(skew.count({ outer, inner }));
    }
  });
  it('promotion has order n on rectangles 2×3, 3×3 and 2×4 (Haiman 1992; Rhoades, JCTA 117 (2010), from memory) and not on the shape (3,1)', () => {
    const order = (outer: number[]): boolean => {
      const n = outer.reduce((a, b) => a + b, 0);
      return [...skew.generate({ outer })].every((t) => {
        let y = t as SkewTableau;
        for (let i = 0; i < n; i++) y = promote(y);
        return skew.key(y) === skew.key(t);
      });
    };
    for (const outer of [[3, 3], [3, 3, 3], [4, 4]]) expect(order(outer), `${outer}`).toBe(true);
    expect(order([3, 1])).toBe(false);
  });
  it('on straight shapes skew evacuation is the evacuation of standard Young tableaux (objects/transforms/evacuation.ts), n ≤ 6', () => {
    for (let n = 0; n <= 6; n++) {
      for (const t of familyById('standard-tableaux').generate({ n })) {
        const rows = t as number[][];
        const outer = rows.map((r) => r.length);
        expect(evacuateSkew({ outer, inner: [], rows }).rows).toEqual(evacuate(rows));
      }
    }
  });
  it('transpose: descents + descents of the transpose = n − 1 (common practice)', () => {
    const des = stat('skew-descents');
    for (const [outer, inner] of shapes) {
      const n = outer.reduce((a, b) => a + b, 0) - inner.reduce((a, b) => a + b, 0);
      for (const t of skew.generate({ outer, inner })) expect(des(t) + des(transposeSkew(t as SkewTableau))).toBe(n - 1);
    }
  });
});

describe('superpartition conjugation', () => {
  it('an involution keeping the degree n and the fermionic degree m, with Λ* and Λ⊛ conjugated, n ≤ 8 (Desrosiers–Lapointe–Mathieu, J. Algebraic Combin. 24 (2006) §2)', () => {
    const fam = familyById('superpartitions');
    const star = (s: Superpartition): number[] => [...s.fermionic.map((f) => f + 1), ...s.bosonic].filter((x) => x > 0).sort((a, b) => b - a);
    for (let n = 0; n <= 8; n++) {
      for (const x of fam.generate({ n })) {
        const s = x as Superpartition;
        const c = conjugateSuperpartition(s);
        expect(fam.key(conjugateSuperpartition(c))).toBe(fam.key(s));
        expect(c.fermionic.length).toBe(s.fermionic.length);
        expect([...c.fermionic, ...c.bosonic].reduce((a, b) => a + b, 0)).toBe(n);
        expect(star(c)).toEqual(conjugate(star(s)));
      }
    }
  });
});
