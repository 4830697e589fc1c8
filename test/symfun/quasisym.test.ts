import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { partitionList } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { semistandardTableaux } from '../../src/symfun/hall-littlewood.js';
import { compositionMask, fundamentalToSchur, maskComposition } from '../../src/symfun/quasisym.js';
import { SymFun } from '../../src/symfun/symfun.js';

describe('fundamental quasisymmetric functions to Schur', () => {
  it('Σ_{T ∈ SYT(λ)} F_{Des(T)} = s_λ for n ≤ 6 (Gessel; Stanley, Enumerative Combinatorics vol. 2, §7.19)', () => {
    for (let n = 1; n <= 6; n++)
      for (const l of partitionList(n)) {
        const coeffs = new Map<number, Poly>();
        for (const T of semistandardTableaux(l, new Array(n).fill(1))) {
          const row = new Map<number, number>();
          T.forEach((r, i) => r.forEach((v) => row.set(v, i)));
          let mask = 0;
          for (let i = 1; i < n; i++) if (row.get(i + 1)! > row.get(i)!) mask |= 1 << (i - 1);
          coeffs.set(mask, (coeffs.get(mask) ?? Poly.zero).add(Poly.one));
        }
        expect(fundamentalToSchur(n, coeffs).equals(SymFun.basisElement('s', l))).toBe(true);
      }
  });
  it('composition masks round-trip', () => {
    expect(compositionMask([2, 1, 3])).toBe(0b00110);
    expect(maskComposition(6, 0b00110)).toEqual([2, 1, 3]);
  });
  it('a non-symmetric sum is an InputError naming the offending monomial coefficient', () => {
    // F_{3,{1}} alone: M_(1,2) has coefficient 1 but M_(2,1) has 0
    const run = () => fundamentalToSchur(3, new Map([[0b01, Poly.q]]));
    expect(run).toThrow(InputError);
    expect(run).toThrow(/M_\(2,1\).*M_\(2,1\)|M_\(1,2\)/);
  });
});
