/** The maps of part A: bijectivity and the statistics they carry, each against its source. */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { schroderReverse } from '../../objects/transforms/schroder-reverse.js';
import { schroderZetaMap } from '../../objects/transforms/schroder-zeta.js';
import type { SchroderPath } from '../../objects/types.js';
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
