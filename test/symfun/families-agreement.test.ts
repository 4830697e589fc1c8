/**
 * The engine against the families and statistics written independently elsewhere in the
 * project (objects/, statistics/): two implementations of the same definitions must agree.
 * - H̃_μ: the fillings family with its inv/maj statistics and reading word, summed as
 *   Σ q^inv t^maj F_{iDes(word)} (Haglund–Haiman–Loehr 2005), against macdonald.ts.
 * - ∇e_n and Δ'_{e_{k−1}} e_n: the parking statistics against the operators (n ≤ 4).
 * - Kostka–Foulkes: the tableau charge statistic against hall-littlewood.ts (n ≤ 5).
 */
import { describe, expect, it } from 'vitest';
import { decoratedDyckPaths } from '../../objects/decorated-dyck-paths.js';
import { fillingReadingWord, fillings } from '../../objects/fillings.js';
import { parkingFunctions } from '../../objects/parking-functions.js';
import { parkingReadingWord } from '../../objects/support/parking.js';
import { partitionKey, partitionList } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { tableauCharge } from '../../statistics/charge.js';
import { fillingInv, fillingMaj } from '../../statistics/filling-statistics.js';
import { decoratedArea, decoratedDinv, parkingArea, parkingDinv } from '../../statistics/parking-statistics.js';
import { kostkaFoulkes, semistandardTableaux } from '../../src/symfun/hall-littlewood.js';
import { modifiedMacdonald } from '../../src/symfun/macdonald.js';
import { deltaPrimeOfEn } from '../../src/symfun/operators.js';
import { fundamentalToSchur } from '../../src/symfun/quasisym.js';
import { SymFun } from '../../src/symfun/symfun.js';

function iDesMask(w: readonly number[]): number {
  const pos: number[] = [];
  w.forEach((v, i) => (pos[v] = i));
  let mask = 0;
  for (let i = 1; i < w.length; i++) if (pos[i + 1]! < pos[i]!) mask |= 1 << (i - 1);
  return mask;
}

function add(m: Map<number, Poly>, mask: number, i: number, j: number): void {
  m.set(mask, (m.get(mask) ?? Poly.zero).add(Poly.monomial(1n, i, j)));
}

const e = (k: number) => SymFun.basisElement('e', k === 0 ? [] : [k]);

describe('agreement with the families and statistics', () => {
  it('H̃_μ from the fillings family and its inv/maj statistics, n ≤ 5', () => {
    for (let n = 1; n <= 5; n++)
      for (const mu of partitionList(n)) {
        const m = new Map<number, Poly>();
        for (const f of fillings.generate({ shape: [...mu] })) add(m, iDesMask(fillingReadingWord(f)), fillingInv.compute(f), fillingMaj.compute(f));
        expect(fundamentalToSchur(n, m).equals(modifiedMacdonald(mu)), partitionKey(mu)).toBe(true);
      }
  });
  it('∇e_n and Δ′_{e_{k−1}} e_n from the parking statistics, n ≤ 4', () => {
    for (let n = 1; n <= 4; n++) {
      const m = new Map<number, Poly>();
      for (const p of parkingFunctions.generate({ n })) add(m, iDesMask(parkingReadingWord(p)), parkingDinv.compute(p), parkingArea.compute(p));
      expect(fundamentalToSchur(n, m).equals(deltaPrimeOfEn(e(n - 1), n))).toBe(true);
      for (let k = 1; k <= n; k++) {
        const d = new Map<number, Poly>();
        for (const p of decoratedDyckPaths.generate({ n, k })) add(d, iDesMask(parkingReadingWord(p)), decoratedDinv.compute(p), decoratedArea.compute(p));
        expect(fundamentalToSchur(n, d).equals(deltaPrimeOfEn(e(k - 1), n)), `n = ${n}, k = ${k}`).toBe(true);
      }
    }
  });
  it('Kostka–Foulkes polynomials from the tableau charge statistic, n ≤ 5', () => {
    for (let n = 1; n <= 5; n++)
      for (const l of partitionList(n))
        for (const mu of partitionList(n)) {
          let s = Poly.zero;
          for (const T of semistandardTableaux(l, mu)) s = s.add(Poly.monomial(1n, 0, tableauCharge.compute(T)));
          expect(s.equals(kostkaFoulkes(l, mu))).toBe(true);
        }
  });
});
