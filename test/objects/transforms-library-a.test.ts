/** The maps of part A: bijectivity and the statistics they carry, each against its source. */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { dyckToNoncrossing, isNoncrossing, noncrossingToDyck } from '../../objects/support/noncrossing.js';
import { krewerasComplement } from '../../objects/transforms/kreweras-complement.js';
import { rotateNoncrossing } from '../../objects/transforms/nc-rotation.js';
import { schroderReverse } from '../../objects/transforms/schroder-reverse.js';
import { schroderZetaMap } from '../../objects/transforms/schroder-zeta.js';
import type { SchroderPath, SetPartition } from '../../objects/types.js';
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
