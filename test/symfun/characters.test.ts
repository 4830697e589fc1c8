import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { factorial } from '../../src/core/integers.js';
import { conjugate, fLambda, partitionList, zee, type Partition } from '../../src/core/partitions.js';
import { frac } from '../../src/core/rational.js';
import { character, characterTable, classFunctionToSchur } from '../../src/symfun/characters.js';

describe('characters of S_n', () => {
  it('S_4 table (Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., Ch. I §7 — from memory)', () => {
    // rows λ and columns ρ in the order (4), (3,1), (2,2), (2,1,1), (1,1,1,1)
    expect(characterTable(4)).toEqual([
      [1n, 1n, 1n, 1n, 1n],
      [-1n, 0n, -1n, 1n, 3n],
      [0n, -1n, 2n, 0n, 2n],
      [1n, 0n, -1n, -1n, 3n],
      [-1n, 1n, 1n, -1n, 1n],
    ]);
  });
  it('S_5 table (same source — from memory; the independent checks below also cover it)', () => {
    // classes (5), (4,1), (3,2), (3,1,1), (2,2,1), (2,1,1,1), (1^5); rows in the same order
    expect(characterTable(5)).toEqual(
      [
        [1, 1, 1, 1, 1, 1, 1],
        [-1, 0, -1, 1, 0, 2, 4],
        [0, -1, 1, -1, 1, 1, 5],
        [1, 0, 0, 0, -2, 0, 6],
        [0, 1, -1, -1, 1, -1, 5],
        [-1, 0, 1, 1, 0, -2, 4],
        [1, -1, -1, 1, 1, -1, 1],
      ].map((r) => r.map(BigInt)),
    );
  });
  it('independent checks: χ^λ(1^n) = f^λ (hook formula) and χ^λ' + "'" + ' = sign · χ^λ for n ≤ 8', () => {
    for (let n = 1; n <= 8; n++) {
      const ps = partitionList(n);
      for (const l of ps) {
        expect(character(l, new Array(n).fill(1))).toBe(fLambda(l));
        for (const r of ps) {
          const sign = (n - r.length) % 2 === 0 ? 1n : -1n;
          expect(character(conjugate(l), r)).toBe(sign * character(l, r));
        }
      }
    }
  });
  it('column orthogonality Σ_λ χ^λ(ρ) χ^λ(σ) = z_ρ δ_{ρσ} for n ≤ 8 (common practice)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 8 }), fc.nat(), fc.nat(), (n, a, b) => {
        const ps = partitionList(n);
        const table = characterTable(n);
        const i = a % ps.length;
        const j = b % ps.length;
        let s = 0n;
        for (const row of table) s += row[i]! * row[j]!;
        expect(s).toBe(i === j ? zee(ps[i]!) : 0n);
      }),
      { numRuns: 200 },
    );
  });
  it('classFunctionToSchur: the regular character gives f^λ; the trivial one gives s_(n)', () => {
    const n = 5;
    const reg = classFunctionToSchur(n, (rho: Partition) => (rho.every((x) => x === 1) ? factorial(n) : 0n));
    for (const l of partitionList(n)) expect(reg.get(l.join(','))!.equals(frac(fLambda(l)))).toBe(true);
    const triv = classFunctionToSchur(n, () => 1n);
    expect([...triv.entries()].filter(([, v]) => !v.equals(0)).map(([k]) => k)).toEqual(['5']);
    // a character given with fractions: half the regular character
    const half = classFunctionToSchur(3, (rho) => (rho.length === 3 ? frac(3n) : frac(0n)));
    expect(half.get('2,1')!.equals(frac(1n))).toBe(true);
    expect(half.get('3')!.equals(frac(1n, 2n))).toBe(true);
  });
});
