import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { factorial } from '../../src/core/integers.js';
import {
  conjugate,
  dominates,
  fLambda,
  hookLengths,
  nStat,
  parsePartition,
  partitionCount,
  partitionList,
  partitions,
  zee,
} from '../../src/core/partitions.js';
import { InputError } from '../../src/core/errors.js';

// p(n) for n = 0..30: Abramowitz & Stegun, Handbook of Mathematical Functions, Table 24.5 (from memory)
const P_TABLE = [
  1, 1, 2, 3, 5, 7, 11, 15, 22, 30, 42, 56, 77, 101, 135, 176, 231, 297, 385, 490, 627, 792, 1002, 1255, 1575,
  1958, 2436, 3010, 3718, 4565, 5604,
];

describe('partitions', () => {
  it('counts p(n) for n ≤ 30 by generation and by recurrence (Abramowitz & Stegun Table 24.5, from memory)', () => {
    for (let n = 0; n <= 30; n++) {
      expect(partitionCount(n)).toBe(BigInt(P_TABLE[n]!));
      if (n <= 22) expect([...partitions(n)].length).toBe(P_TABLE[n]);
    }
  });
  it('generates in reverse lexicographic order, dominance-larger first', () => {
    expect(partitionList(4)).toEqual([[4], [3, 1], [2, 2], [2, 1, 1], [1, 1, 1, 1]]);
    const list = partitionList(7);
    for (let i = 0; i < list.length; i++)
      for (let j = i + 1; j < list.length; j++) expect(dominates(list[j]!, list[i]!) && !dominates(list[i]!, list[j]!)).toBe(false);
  });
  it('Σ_λ (f^λ)^2 = n! (common practice: RSK)', () => {
    for (let n = 0; n <= 12; n++) {
      let s = 0n;
      for (const l of partitions(n)) s += fLambda(l) ** 2n;
      expect(s).toBe(factorial(n));
    }
  });
  it('Σ_λ n!/z_λ = n! (class sizes add up; common practice)', () => {
    for (let n = 1; n <= 10; n++) {
      let s = 0n;
      for (const l of partitions(n)) s += factorial(n) / zee(l);
      expect(s).toBe(factorial(n));
    }
  });
  it('conjugation is an involution that reverses dominance and swaps n(λ) with Σ C(λ_i, 2) (properties)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 12 }), fc.nat(), fc.nat(), (n, a, b) => {
        const list = partitionList(n);
        const l = list[a % list.length]!;
        const m = list[b % list.length]!;
        expect(conjugate(conjugate(l))).toEqual(l);
        expect(dominates(l, m)).toBe(dominates(conjugate(m), conjugate(l)));
        expect(nStat(conjugate(l))).toBe(l.reduce((s, x) => s + (x * (x - 1)) / 2, 0));
      }),
    );
  });
  it('hook lengths of (3,1): 4 2 1 / 1, so f^(3,1) = 3 (common practice)', () => {
    expect(hookLengths([3, 1])).toEqual([[4, 2, 1], [1]]);
    expect(fLambda([3, 1])).toBe(3n);
    expect(zee([2, 1, 1])).toBe(4n);
  });
  it('parses "3,1,1" and rejects non-partitions with InputError', () => {
    expect(parsePartition('3,1,1')).toEqual([3, 1, 1]);
    expect(() => parsePartition('1,3')).toThrow(InputError);
    expect(() => parsePartition('a')).toThrow(InputError);
  });
});
