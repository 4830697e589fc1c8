/**
 * Findings on hand-made module data: dimension formulas fitted and checked on later sizes,
 * product and q-analog recognition (values built here by their defining products and
 * recurrences), Schur-unimodality, isomorphism candidates and the ranking order.
 */
import { describe, expect, it } from 'vitest';
import { Poly } from '../../src/core/poly.js';
import { schurSeries } from '../../src/series/series.js';
import { compareRows } from '../../src/sweep/analyse.js';
import { dimensionFindings } from '../../src/sweep/dimensionFit.js';
import { finding } from '../../src/sweep/findings.js';
import { hilbertFindings } from '../../src/sweep/hilbertFindings.js';
import { isomorphismCandidates } from '../../src/sweep/isomorphism.js';
import type { ModuleData } from '../../src/sweep/moduleData.js';
import type { SweepLine } from '../../src/sweep/plan.js';
import { tableFindings } from '../../src/sweep/tableFindings.js';

function data(n: number, byX: Poly, extra: Partial<ModuleData> = {}): ModuleData {
  return { key: `m${n}-${extra.k ?? ''}`, n, axes: ['x'], dimension: byX.sumCoefficients(), byX, byTotal: byX, cells: [], checks: [], ...extra };
}

const ones = (m: number) => Poly.fromQCoeffs(new Array<number>(m).fill(1));
const fact = (m: number) => Array.from({ length: m }, (_, i) => ones(i + 1)).reduce((a, b) => a.mul(b), Poly.one);
const dims = (ds: number[], n0 = 1) => ds.map((d, i) => data(n0 + i, Poly.constant(d)));

describe('dimension formulas (common practice: closed forms checked on the sizes not used to fit them)', () => {
  it('finds n!, 2^n − 1, 3^n − 2^n and a polynomial, each fitted on the first sizes and checked on the rest', () => {
    const cases: [number[], string, string][] = [
      [[1, 2, 6, 24, 120], 'n!', 'fitted on n = 1, 2, 3, checked on n = 4, 5'],
      [[1, 3, 7, 15, 31], '2^n - 1', 'fitted on n = 1, 2, 3, checked on n = 4, 5'],
      [[1, 5, 19, 65, 211, 665], '3^n - 2^n', 'fitted on n = 1, 2, 3, 4, checked on n = 5, 6'],
      [[1, 3, 6, 10, 15], '1/2·n^2 + 1/2·n', 'fitted on n = 1, 2, 3, checked on n = 4, 5'],
    ];
    for (const [ds, text, verified] of cases) {
      const f = dimensionFindings(dims(ds));
      expect(f.map((x) => x.claim), ds.join(',')).toEqual([`dimension = ${text}`]);
      expect(f[0]!.verified).toContain(verified);
    }
  });

  it('reports nothing for (n+1)^(n−1) (no form of the menu), a constant, or a fit checked on one size only', () => {
    expect(dimensionFindings(dims([1, 3, 16, 125, 1296]))).toEqual([]);
    expect(dimensionFindings(dims([1, 6, 36], 2))).toEqual([]);
    expect(dimensionFindings(dims([1, 5, 19, 65, 211]))).toEqual([]);
    expect(dimensionFindings(dims([4, 4, 4, 4]))).toEqual([]);
  });
});

describe('Hilbert series findings', () => {
  it('reads [n]_q! over n as one product formula', () => {
    const f = hilbertFindings([1, 2, 3, 4].map((n) => data(n, fact(n))));
    expect(f[0]!.kind).toBe('product');
    expect(f[0]!.claim).toBe('Hilbert series by x-degree = [n]_q!');
  });

  it('names [k]_q!·Stir_q(n,k) (built here by the q-Stirling recurrence, Carlitz 1948, from memory) and not products', () => {
    const stir = new Map<string, Poly>();
    const S = (n: number, k: number): Poly => {
      if (n === 0 && k === 0) return Poly.one;
      if (n === 0 || k === 0 || k > n) return Poly.zero;
      const key = `${n},${k}`;
      if (!stir.has(key)) stir.set(key, S(n - 1, k - 1).add(ones(k).mul(S(n - 1, k))));
      return stir.get(key)!;
    };
    const list: ModuleData[] = [];
    for (let n = 1; n <= 4; n++) for (let k = 1; k <= n; k++) list.push(data(n, fact(k).mul(S(n, k)), { k, key: `m${n},${k}` }));
    const f = hilbertFindings(list);
    expect(f.map((x) => x.kind)).toEqual(['q-analog', 'recurrence']);
    expect(f[0]!.claim).toBe('Hilbert series by x-degree = [k]_q!·Stir_q(n,k)');
    expect(f[0]!.places).toHaveLength(10);
    // a perturbed entry breaks it
    list[5] = { ...list[5]!, byX: list[5]!.byX.add(Poly.monomial(1n, 1)) };
    expect(hilbertFindings(list).some((x) => x.kind === 'q-analog')).toBe(false);
  });
});

const cell = (x: number, schur: Record<string, number>) => ({ degree: [x], dim: 1, schur: new Map(Object.entries(schur)) });

describe('tables', () => {
  it('Schur-unimodal: differences Schur-positive up to a peak, Schur-negative after; a mixed difference fails', () => {
    const frob = schurSeries([['3', Poly.one]]);
    const up = data(3, Poly.one, { frobenius: frob, cells: [cell(0, { '3': 1 }), cell(1, { '3': 1, '2,1': 1 }), cell(2, { '3': 1 })] });
    expect(tableFindings([up]).map((f) => f.kind)).toEqual(['schur-unimodal']);
    const mixed = data(3, Poly.one, { frobenius: frob, cells: [cell(0, { '3': 1 }), cell(1, { '2,1': 1 }), cell(2, { '3': 1 })] });
    expect(tableFindings([mixed])).toEqual([]);
  });

  it('groups different seeds with equal Frobenius series, not one module reached twice', () => {
    const frob = (c: number) => schurSeries([['2,1', Poly.constant(c)]]);
    const d = new Map<string, ModuleData>([
      ['a', { ...data(3, Poly.one), key: 'a', frobenius: frob(1) }],
      ['b', { ...data(3, Poly.one), key: 'b', frobenius: frob(1) }],
      ['c', { ...data(3, Poly.one), key: 'c', frobenius: frob(2) }],
    ]);
    const line = (id: string, key: string): SweepLine => ({ id, seed: id, ops: ['x'], places: [{ n: 3, key }], left: [] });
    const r = isomorphismCandidates([line('S1', 'a'), line('S2', 'b'), line('S3', 'c'), line('S4', 'a')], d);
    expect(r.groups).toEqual([{ n: 3, what: 'Frobenius series', modules: ['a', 'b'], lines: ['S1', 'S4', 'S2'] }]);
    // S4 reaches the very module of S1: a partner of S1 only through S2
    expect(r.findings.get('S1')![0]!.claim).toBe('same Frobenius series as S2 S2 (isomorphism candidate)');
    expect(r.findings.has('S3')).toBe(false);
  });
});

it('ranks a product above any number of lesser findings', () => {
  const p = [{ n: 3 }];
  const product = { id: 'S9', places: p, findings: [finding('product', '', '', p)] };
  const many = { id: 'S1', places: p, findings: (['schur-unimodal', 'omega-symmetry', 'isomorphism', 'symmetric', 'unimodal'] as const).map((k) => finding(k, '', '', p)) };
  expect(compareRows(product, many)).toBeLessThan(0);
  expect([many, product].sort(compareRows)[0]).toBe(product);
});
