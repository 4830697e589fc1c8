import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { factorial } from '../../src/core/integers.js';
import { dominates, fLambda, partitionList } from '../../src/core/partitions.js';
import { inverseKostkaMatrix, kostkaMatrix, kostkaNumber } from '../../src/symfun/kostka.js';

describe('Kostka numbers', () => {
  it('n = 4 matrix (Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., Ch. I §6 table — from memory)', () => {
    // rows λ, columns μ in the order (4), (3,1), (2,2), (2,1,1), (1,1,1,1)
    expect(kostkaMatrix(4)).toEqual([
      [1n, 1n, 1n, 1n, 1n],
      [0n, 1n, 1n, 2n, 3n],
      [0n, 0n, 1n, 1n, 2n],
      [0n, 0n, 0n, 1n, 3n],
      [0n, 0n, 0n, 0n, 1n],
    ]);
  });
  it('independent checks: K_{λ,1^n} = f^λ (hook length formula) and Σ_λ K_{λμ} f^λ = n!/Π μ_i! for n ≤ 8', () => {
    for (let n = 1; n <= 8; n++) {
      const ps = partitionList(n);
      const k = kostkaMatrix(n);
      ps.forEach((l, i) => expect(k[i]![ps.length - 1]).toBe(fLambda(l)));
      ps.forEach((mu, j) => {
        let s = 0n;
        ps.forEach((l, i) => (s += k[i]![j]! * fLambda(l)));
        expect(s).toBe(factorial(n) / mu.reduce((a, m) => a * factorial(m), 1n));
      });
    }
  });
  it('K_{λμ} ≠ 0 exactly when λ dominates μ, and is invariant under reordering μ (common practice)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 8 }), fc.nat(), fc.nat(), (n, a, b) => {
        const ps = partitionList(n);
        const l = ps[a % ps.length]!;
        const m = ps[b % ps.length]!;
        const k = kostkaNumber(l, m);
        expect(k !== 0n).toBe(dominates(l, m));
        expect(kostkaNumber(l, [...m].reverse())).toBe(k);
      }),
    );
  });
  it('the inverse matrix is an inverse', () => {
    for (let n = 0; n <= 7; n++) {
      const k = kostkaMatrix(n);
      const inv = inverseKostkaMatrix(n);
      const N = k.length;
      for (let i = 0; i < N; i++)
        for (let j = 0; j < N; j++) {
          let s = 0n;
          for (let r = 0; r < N; r++) s += k[i]![r]! * inv[r]![j]!;
          expect(s).toBe(i === j ? 1n : 0n);
        }
    }
  });
});
