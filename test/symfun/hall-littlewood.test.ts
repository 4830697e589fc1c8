import { describe, expect, it } from 'vitest';
import { nStat, partitionKey, partitionList } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { charge, kostkaFoulkes, modifiedHallLittlewood } from '../../src/symfun/hall-littlewood.js';
import { kostkaNumber } from '../../src/symfun/kostka.js';
import { modifiedMacdonald } from '../../src/symfun/macdonald.js';

const T = (...coeffs: [number, number][]) => Poly.fromTerms(coeffs.map(([e, c]) => [0, e, BigInt(c)] as const));

describe('Kostka–Foulkes polynomials by charge', () => {
  it('charge of standard words: 12…n has charge C(n,2), n…21 has charge 0 (Lascoux–Schützenberger)', () => {
    expect(charge([1, 2, 3, 4])).toBe(6);
    expect(charge([4, 3, 2, 1])).toBe(0);
    expect(charge([2, 1, 3])).toBe(1); // 1 (index 0), 2 left of 1 (0), 3 right of 2 (1)
  });
  it('n ≤ 4 table (Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., Ch. III §6 — from memory)', () => {
    const table: [string, string, Poly][] = [
      ['3', '2,1', T([1, 1])],
      ['3', '1,1,1', T([3, 1])],
      ['2,1', '1,1,1', T([1, 1], [2, 1])],
      ['4', '3,1', T([1, 1])],
      ['4', '2,2', T([2, 1])],
      ['4', '2,1,1', T([3, 1])],
      ['4', '1,1,1,1', T([6, 1])],
      ['3,1', '2,2', T([1, 1])],
      ['3,1', '2,1,1', T([1, 1], [2, 1])],
      ['3,1', '1,1,1,1', T([3, 1], [4, 1], [5, 1])],
      ['2,2', '2,1,1', T([1, 1])],
      ['2,2', '1,1,1,1', T([2, 1], [4, 1])],
      ['2,1,1', '1,1,1,1', T([1, 1], [2, 1], [3, 1])],
    ];
    const p = (k: string) => k.split(',').map(Number);
    for (const [l, m, v] of table) expect(kostkaFoulkes(p(l), p(m)).equals(v)).toBe(true);
    for (let n = 1; n <= 4; n++) for (const l of partitionList(n)) expect(kostkaFoulkes(l, l).equals(Poly.one)).toBe(true);
  });
  it('independent checks for n ≤ 6: K_{λμ}(1) = K_{λμ}, and when λ ≥ μ the top term is t^{n(μ)−n(λ)} with coefficient 1', () => {
    for (let n = 1; n <= 6; n++)
      for (const l of partitionList(n))
        for (const m of partitionList(n)) {
          const k = kostkaFoulkes(l, m);
          expect(k.sumCoefficients()).toBe(kostkaNumber(l, m));
          if (!k.isZero()) {
            expect(k.degT()).toBe(nStat(m) - nStat(l));
            expect(k.coeff(0, k.degT())).toBe(1n);
          }
        }
  });
  it('modified Hall–Littlewood H̃_μ(X;t) = H̃_μ(X;0,t) for n ≤ 5 (two independent constructions; Haglund–Haiman–Loehr)', () => {
    for (let n = 1; n <= 5; n++)
      for (const mu of partitionList(n)) {
        const hl = modifiedHallLittlewood(mu);
        expect(hl.equals(modifiedMacdonald(mu).specialize({ q: 0 })), partitionKey(mu)).toBe(true);
      }
  });
});
