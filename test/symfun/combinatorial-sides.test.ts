/**
 * The algebraic operators against the combinatorial sides, objects from the families
 * (objects/parking-functions.ts, objects/decorated-dyck-paths.ts) and statistics defined
 * here (so that the check does not lean on the statistics under test elsewhere):
 * - shuffle theorem (Carlsson–Mellit, J. Amer. Math. Soc. 31 (2018)):
 *   ∇e_n = Σ_PF q^{dinv} t^{area} F_{iDes(reading word)};
 * - rise Delta theorem (stated in Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018);
 *   proved in D'Adderio–Mellit, A proof of the compositional Delta conjecture, Adv. Math. 402
 *   (2022) — from memory): Δ'_{e_{k−1}} e_n = Σ over labelled Dyck paths with
 *   n − k decorated double rises of q^{dinv} t^{area of the undecorated rows} F_{iDes}.
 * Statistics (Haglund, The q,t-Catalan numbers and the space of diagonal harmonics, ch. 5):
 * rows bottom to top, a_i = area of row i, l_i its car; dinv = #{i < j : a_i = a_j, l_i < l_j}
 * + #{i < j : a_i = a_j + 1, l_i > l_j}; iDes(w) = {i : i+1 left of i in w}.
 */
import { describe, expect, it } from 'vitest';
import { decoratedDyckPaths } from '../../objects/decorated-dyck-paths.js';
import { parkingFunctions } from '../../objects/parking-functions.js';
import { parkingReadingWord } from '../../objects/support/parking.js';
import type { DyckPath, LabelledDyckPath } from '../../objects/types.js';
import { Poly } from '../../src/core/poly.js';
import { deltaPrimeOfEn } from '../../src/symfun/operators.js';
import { fundamentalToSchur } from '../../src/symfun/quasisym.js';
import { SymFun } from '../../src/symfun/symfun.js';

function areas(path: DyckPath): number[] {
  const a: number[] = [];
  let east = 0;
  for (const s of path) {
    if (s === 1) a.push(a.length - east);
    else east++;
  }
  return a;
}

function dinv(a: readonly number[], l: readonly number[]): number {
  let s = 0;
  for (let i = 0; i < a.length; i++)
    for (let j = i + 1; j < a.length; j++) {
      const d = a[i]! - a[j]!;
      if ((d === 0 && l[i]! < l[j]!) || (d === 1 && l[i]! > l[j]!)) s++;
    }
  return s;
}

function iDesMask(w: readonly number[]): number {
  const pos = new Array<number>(w.length + 1);
  w.forEach((v, i) => (pos[v] = i));
  let mask = 0;
  for (let i = 1; i < w.length; i++) if (pos[i + 1]! < pos[i]!) mask |= 1 << (i - 1);
  return mask;
}

function tally(objects: Iterable<LabelledDyckPath & { decorated?: readonly number[] }>): Map<number, Poly> {
  const out = new Map<number, Poly>();
  for (const p of objects) {
    const a = areas(p.path);
    let area = a.reduce((x, y) => x + y, 0);
    for (const r of p.decorated ?? []) area -= a[r - 1]!;
    const mask = iDesMask(parkingReadingWord(p));
    out.set(mask, (out.get(mask) ?? Poly.zero).add(Poly.monomial(1n, dinv(a, p.labels), area)));
  }
  return out;
}

const e = (k: number) => SymFun.basisElement('e', k === 0 ? [] : [k]);

describe('combinatorial sides', () => {
  it('shuffle theorem: ∇e_n equals the parking-function sum for n ≤ 6', () => {
    for (let n = 1; n <= 6; n++) {
      const side = fundamentalToSchur(n, tally(parkingFunctions.generate({ n })));
      expect(side.equals(deltaPrimeOfEn(e(n - 1), n)), `n = ${n}`).toBe(true);
    }
  });
  it('rise Delta theorem: Δ′_{e_{k−1}} e_n equals the decorated labelled Dyck path sum for n ≤ 6, all k', () => {
    for (let n = 1; n <= 6; n++)
      for (let k = 1; k <= n; k++) {
        const side = fundamentalToSchur(n, tally(decoratedDyckPaths.generate({ n, k })));
        expect(side.equals(deltaPrimeOfEn(e(k - 1), n)), `n = ${n}, k = ${k}`).toBe(true);
      }
  });
});
