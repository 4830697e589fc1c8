/**
 * The reading-word conventions, checked through the formulas they serve (statistics are
 * computed inline here from their published definitions: dinv and area in Haglund, AMS 2008;
 * inv and maj in Haglund–Haiman–Loehr, J. Amer. Math. Soc. 18 (2005)): the shuffle theorem's
 * ⟨∇e_n, e_n⟩ = C_n(q,t) picks the parking functions whose word is n…1, and the
 * Haglund–Haiman–Loehr sum over standard fillings gives H̃_μ (F-expansions are unique).
 */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import type { Filling, LabelledDyckPath } from '../../objects/types.js';

/** iDes(w) = {i : i+1 stands left of i}, as a key. */
function iDes(w: readonly number[]): string {
  const pos = new Map(w.map((x, i) => [x, i]));
  const out: number[] = [];
  for (let i = 1; i < w.length; i++) if (pos.get(i + 1)! < pos.get(i)!) out.push(i);
  return out.join(',');
}

function addTerm(m: Map<string, Map<string, number>>, set: string, q: number, t: number): void {
  const poly = m.get(set) ?? new Map<string, number>();
  poly.set(`${q},${t}`, (poly.get(`${q},${t}`) ?? 0) + 1);
  m.set(set, poly);
}

describe('parking functions: reading word of the shuffle theorem', () => {
  function areaAndDinv(p: LabelledDyckPath): [number, number] {
    const a: number[] = [];
    let east = 0;
    for (const s of p.path) s === 1 ? a.push(a.length - east) : east++;
    let dinv = 0;
    for (let i = 0; i < a.length; i++) {
      for (let j = i + 1; j < a.length; j++) {
        if (a[i] === a[j] && p.labels[i]! < p.labels[j]!) dinv++;
        if (a[i] === a[j]! + 1 && p.labels[i]! > p.labels[j]!) dinv++;
      }
    }
    return [a.reduce((x, y) => x + y, 0), dinv];
  }
  function catalanPart(n: number): Map<string, number> {
    const f = familyById('parking-functions');
    const out = new Map<string, number>();
    const top = Array.from({ length: n }, (_, i) => n - i).join(',');
    for (const p of f.generate({ n })) {
      if (f.readingWord!(p).join(',') !== top) continue;
      const [area, dinv] = areaAndDinv(p as LabelledDyckPath);
      out.set(`${dinv},${area}`, (out.get(`${dinv},${area}`) ?? 0) + 1);
    }
    return out;
  }
  it('n = 3: Σ q^dinv t^area F_iDes = ∇e_3 = s_3 + (q²+qt+t²+q+t) s_21 + C_3(q,t) s_111 (Haglund 2008 ch. 2–5, from memory; sizes 1 + 2·5 + 5 = 16 = 4² check it)', () => {
    const f = familyById('parking-functions');
    const m = new Map<string, Map<string, number>>();
    for (const p of f.generate({ n: 3 })) {
      const [area, dinv] = areaAndDinv(p as LabelledDyckPath);
      addTerm(m, iDes(f.readingWord!(p)), dinv, area);
    }
    const s21 = { '2,0': 1, '1,1': 1, '0,2': 1, '1,0': 1, '0,1': 1 };
    const plain = Object.fromEntries([...m].map(([k, v]) => [k, Object.fromEntries(v)]));
    expect(plain).toEqual({ '': { '0,0': 1 }, '1': s21, '2': s21, '1,2': { '3,0': 1, '2,1': 1, '1,2': 1, '0,3': 1, '1,1': 1 } });
  });
  it('word n…1 selects C_3(q,t) = q³ + q²t + qt² + t³ + qt (q,t-Catalan: Haglund, AMS 2008, ch. 3 — from memory)', () => {
    expect(Object.fromEntries(catalanPart(3))).toEqual({ '3,0': 1, '2,1': 1, '1,2': 1, '0,3': 1, '1,1': 1 });
  });
  it('for n = 4, 5 it selects a q,t-symmetric polynomial with C_n(1,1) = 14, 42 terms', () => {
    for (const [n, c] of [[4, 14], [5, 42]] as const) {
      const m = catalanPart(n);
      expect([...m.values()].reduce((a, b) => a + b, 0)).toBe(c);
      for (const [k, v] of m) expect(m.get(k.split(',').reverse().join(','))).toBe(v);
    }
  });
});

describe('standard fillings: reading word of the filling formula', () => {
  /** inv and maj of Haglund–Haiman–Loehr (J. Amer. Math. Soc. 18 (2005)) on a French filling (rows[0] bottom). */
  function invMaj(f: Filling): [number, number] {
    const rows = f.rows;
    const cells: [number, number][] = []; // reading order: top row first, left to right
    for (let r = rows.length - 1; r >= 0; r--) for (let c = 0; c < rows[r]!.length; c++) cells.push([r, c]);
    const val = ([r, c]: [number, number]): number => rows[r]![c]!;
    let maj = 0;
    let armSum = 0;
    for (const [r, c] of cells) {
      if (r > 0 && val([r, c]) > val([r - 1, c])) {
        let leg = 0;
        while (rows[r + leg + 1] && rows[r + leg + 1]!.length > c) leg++;
        maj += leg + 1;
        armSum += rows[r]!.length - c - 1;
      }
    }
    let inversions = 0;
    for (let i = 0; i < cells.length; i++) {
      for (let j = i + 1; j < cells.length; j++) {
        const [r1, c1] = cells[i]!;
        const [r2, c2] = cells[j]!;
        const attack = r1 === r2 || (r1 === r2 + 1 && c1 > c2);
        if (attack && val(cells[i]!) > val(cells[j]!)) inversions++;
      }
    }
    return [inversions - armSum, maj];
  }
  function expansion(shape: number[], swap = false): Map<string, Map<string, number>> {
    const fam = familyById('fillings');
    const m = new Map<string, Map<string, number>>();
    for (const f of fam.generate({ shape })) {
      const [inv, maj] = invMaj(f as Filling);
      addTerm(m, iDes(fam.readingWord!(f)), swap ? maj : inv, swap ? inv : maj);
    }
    return m;
  }
  const plain = (m: Map<string, Map<string, number>>) => Object.fromEntries([...m].map(([k, v]) => [k, Object.fromEntries(v)]));
  it('H̃_(2) = s_2 + q s_11 and H̃_(11) = s_2 + t s_11 (Haglund, AMS 2008, ch. 2 — from memory; s_2 = F_∅, s_11 = F_{1})', () => {
    expect(plain(expansion([2]))).toEqual({ '': { '0,0': 1 }, '1': { '1,0': 1 } });
    expect(plain(expansion([1, 1]))).toEqual({ '': { '0,0': 1 }, '1': { '0,1': 1 } });
  });
  it('H̃_(21) = s_3 + (q+t) s_21 + qt s_111 (Haglund 2008 ch. 2, from memory; s_21 = F_{1} + F_{2})', () => {
    expect(plain(expansion([2, 1]))).toEqual({
      '': { '0,0': 1 },
      '1': { '1,0': 1, '0,1': 1 },
      '2': { '1,0': 1, '0,1': 1 },
      '1,2': { '1,1': 1 },
    });
  });
  it('H̃_μ(q,t) = H̃_μ′(t,q) for μ = (3,1), (2,2) at n = 4 (Haglund, AMS 2008, ch. 2 — from memory)', () => {
    expect(plain(expansion([3, 1]))).toEqual(plain(expansion([2, 1, 1], true)));
    expect(plain(expansion([2, 2]))).toEqual(plain(expansion([2, 2], true)));
  });
});

describe('standard tableaux: reading word has iDes = Des(T)', () => {
  it('Σ_T F_{iDes(word T)} over SYT(λ) has one F_∅ only for λ = (n), one F_{[n−1]} only for λ = (1^n)', () => {
    const fam = familyById('standard-tableaux');
    for (const shape of [[3, 1], [2, 2], [4], [1, 1, 1, 1]]) {
      const sets = [...fam.generate({ shape })].map((t) => iDes(fam.readingWord!(t)));
      expect(sets.filter((s) => s === '').length).toBe(shape.length === 1 ? 1 : 0);
      expect(sets.filter((s) => s === '1,2,3').length).toBe(shape[0] === 1 ? 1 : 0);
    }
    // Des(T) for the tableau 1 2 4 / 3: 2 (3 lies below 2); the word is 3 1 2 4.
    expect(iDes(fam.readingWord!([[1, 2, 4], [3]]))).toBe('2');
  });
});
