import { describe, expect, it } from 'vitest';
import { permutations } from '../../src/core/permutations.js';
import { packExponents, Poly } from '../../src/core/poly.js';
import { descentMask, inverseDescentMask } from '../../src/store/descentMasks.js';
import { fundamentalToSchurFast, type CountMap } from '../../src/store/fundamentalToSchurFast.js';
import { fundamentalToSchur } from '../../src/symfun/quasisym.js';

function maj(w: readonly number[]): number {
  let s = 0;
  for (let i = 0; i + 1 < w.length; i++) if (w[i]! > w[i + 1]!) s += i + 1;
  return s;
}
function des(w: readonly number[]): number {
  let s = 0;
  for (let i = 0; i + 1 < w.length; i++) if (w[i]! > w[i + 1]!) s++;
  return s;
}

describe('fast F -> Schur', () => {
  it('agrees with the symfun converter on Σ q^maj t^des F_iDes over S_n, n ≤ 5 (symmetric: by RSK maj and des are read on the recording tableau; reference: src/symfun/quasisym.ts)', () => {
    for (let n = 1; n <= 5; n++) {
      const fast = new Map<number, CountMap>();
      const slow = new Map<number, Poly>();
      for (const w of permutations(n)) {
        const m = inverseDescentMask(w);
        const key = packExponents(maj(w), des(w));
        const c = fast.get(m) ?? new Map<number, number>();
        c.set(key, (c.get(key) ?? 0) + 1);
        fast.set(m, c);
        slow.set(m, (slow.get(m) ?? Poly.zero).add(Poly.monomial(1n, maj(w), des(w))));
      }
      const a = fundamentalToSchurFast(n, fast)!;
      const b = fundamentalToSchur(n, slow);
      const bTerms: [string, string][] = [...b.schurTerms()].map(([l, c]) => [l, c.toPoly().toString()]);
      const aTerms: [string, string][] = [...a].map(([l, c]) => [l, Poly.fromPackedMap(new Map([...c].map(([k, v]) => [k, BigInt(v)]))).toString()]);
      expect(new Map(aTerms)).toEqual(new Map(bTerms));
    }
  });
  it('Σ_w F_iDes(w) over S_3 is h_1^3 = s_3 + 2 s_21 + s_111 (common practice)', () => {
    const fast = new Map<number, CountMap>();
    for (const w of permutations(3)) {
      const m = inverseDescentMask(w);
      const c = fast.get(m) ?? new Map<number, number>();
      c.set(0, (c.get(0) ?? 0) + 1);
      fast.set(m, c);
    }
    const a = fundamentalToSchurFast(3, fast)!;
    expect([...a].map(([l, c]) => [l, c.get(0)])).toEqual([['3', 1], ['2,1', 2], ['1,1,1', 1]]);
  });
  it('a sum that is not symmetric gives undefined: F_{1} alone at n = 3', () => {
    expect(fundamentalToSchurFast(3, new Map([[1, new Map([[0, 1]])]]))).toBeUndefined();
  });
  it('descent masks: Des(3,1,2) = {1}, iDes(3,1,2) = {2} (common practice)', () => {
    expect(descentMask([3, 1, 2])).toBe(1);
    expect(inverseDescentMask([3, 1, 2])).toBe(2);
    expect(inverseDescentMask([1, 1, 1])).toBe(0);
  });
});
