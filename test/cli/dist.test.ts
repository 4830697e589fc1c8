/** `gradus dist` and `gradus statistics` as users meet them (child processes). */
import { describe, expect, it } from 'vitest';
import { qOrderedStirling } from '../../src/core/qanalogs.js';
import { runCli } from '../helpers/cli.js';

describe('gradus dist', { timeout: 60_000 }, () => {
  it('prints the series and its coefficients; [4]_q! for inversions (MacMahon)', () => {
    const r = runCli(['dist', 'permutations', 'inversions', '--n', '4']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('24 objects');
    expect(r.stdout).toContain('q^6 + 3*q^5 + 5*q^4 + 6*q^3 + 5*q^2 + 3*q + 1');
    expect(r.stdout).toContain('coefficients (q^0 up): 1 3 5 6 5 3 1');
  });

  it('--json: one document with family, params, statistics, series and count; q,t as a table', () => {
    const r = runCli(['dist', 'dyck-paths', 'dyck-dinv', '--stat2', 'dyck-area', '--n', '3', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.family).toBe('dyck-paths');
    expect(doc.params).toEqual({ n: 3 });
    expect(doc.statistics).toEqual(['dyck-dinv', 'dyck-area']);
    expect(doc.count).toBe(5);
    // C_3(q,t) = q³ + q²t + qt² + t³ + qt (q,t-Catalan: Haglund, AMS 2008, ch. 3 — from memory): [i][j] = coefficient of q^i t^j
    expect(doc.series).toEqual([
      [0, 0, 0, 1],
      [0, 1, 1, 0],
      [0, 1, 0, 0],
      [1, 0, 0, 0],
    ]);
  });

  it('--frobenius gives the F-expansion of ∇e_2 = s_2 + (q+t) s_11 = F_∅ + (q+t) F_{1} (Haglund, AMS 2008, ch. 2 — from memory)', () => {
    const r = runCli(['dist', 'parking-functions', 'parking-dinv', '--stat2', 'parking-area', '--n', '2', '--frobenius', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.frobenius.basis).toBe('fundamental-quasisymmetric');
    expect(doc.frobenius.terms).toEqual([
      { set: [], series: [[1]] },
      { set: [1], series: [[0, 1], [1, 0]] },
    ]);
    const text = runCli(['dist', 'parking-functions', 'parking-dinv', '--n', '2', '--frobenius']);
    expect(text.stdout).toContain('F{1}: q + 1');
  });

  it('--transform and t:s names; ordered set partitions give [k]_q! Stir_q(n,k) (Haglund–Remmel–Wilson 2018; Rhoades 2018)', () => {
    const r = runCli(['dist', 'permutations', 'foata:inversions', '--n', '3', '--json']);
    expect(JSON.parse(r.stdout).series).toEqual([1, 2, 2, 1]);
    const o = runCli(['dist', 'ordered-set-partitions', 'osp-minimaj', '--n', '4', '--k', '2', '--json']);
    // [2]_q Stir_q(4,2) = (1+q)(3 + 3q + q²) = 3 + 6q + 4q² + q³ (Carlitz's q-Stirling recurrence, by hand)
    expect(JSON.parse(o.stdout).series).toEqual([3, 6, 4, 1]);
  });

  it('--workers 2 starts worker threads from the command line and gives the same series', () => {
    const r = runCli(['dist', 'ordered-set-partitions', 'osp-dinv', '--n', '5', '--k', '3', '--workers', '2', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.provenance.method).toContain('2 worker threads');
    // [3]_q! Stir_q(5,3) (Remmel–Wilson 2015; Haglund–Remmel–Wilson 2018), at q = 1: 3!·S(5,3) = 150
    expect(doc.count).toBe(150);
    expect(doc.series).toEqual(qOrderedStirling(5, 3).toQArray().map(Number));
  });

  it('bad input exits 2 with one line naming the nearest names or the limit option', () => {
    const cases: [string[], RegExp][] = [
      [['dist', 'permutaions', 'inversions', '--n', '3'], /nearest: permutations/],
      [['dist', 'permutations', 'inversion', '--n', '3'], /nearest: inversions/],
      [['dist', 'permutations', 'inversions', '--n', '3', '--stat2', 'dyck-area'], /defined on dyck-paths/],
      [['dist', 'permutations', 'inversions', '--n', '3', '--transform', 'fota'], /nearest: foata/],
      [['dist', 'permutations', 'inversions', '--n', '13'], /6227020800 objects.*--max-objects/],
      [['dist', 'permutations', 'inversions', '--n', '6', '--max-objects', '100'], /720 objects/],
      [['dist', 'permutations', 'inversions', '--n', '3', '--frobenius', '--by-shape'], /no shape/],
    ];
    for (const [args, re] of cases) {
      const r = runCli(args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.stderr).toMatch(re);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
    }
  });
});

describe('gradus statistics', { timeout: 30_000 }, () => {
  it('--json lists every statistic with id, family, description and source', () => {
    const r = runCli(['statistics', '--json']);
    expect(r.code).toBe(0);
    const list = JSON.parse(r.stdout) as { id: string; family: string; description: string; source: string }[];
    expect(list.length).toBeGreaterThanOrEqual(45);
    expect(list.find((s) => s.id === 'dyck-bounce')?.family).toBe('dyck-paths');
    for (const s of list) expect(s.description && s.source).toBeTruthy();
  });
  it('--family filters, and an unknown family names the nearest', () => {
    const r = runCli(['statistics', '--family', 'ordered-set-partitions']);
    expect(r.code).toBe(0);
    for (const id of ['osp-inv', 'osp-maj', 'osp-minimaj', 'osp-dinv']) expect(r.stdout).toContain(id);
    expect(r.stdout).not.toContain('dyck-area');
    const bad = runCli(['statistics', '--family', 'dyck-path']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/nearest: dyck-paths/);
  });
});
