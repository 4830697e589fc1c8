/** `gradus module` and `gradus quotient` as child processes. */
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.js';

describe('gradus module', () => {
  it('--json: axes, Hilbert table [i][j], Schur terms as q,t tables, checks, provenance', () => {
    const r = runCli(['module', '--seed', 'superspace-vandermonde', '--n', '3', '--k', '2', '--ops', 'x,theta', '--frobenius', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.seed).toBe('superspace-vandermonde');
    expect(doc.n).toBe(3);
    expect(doc.k).toBe(2);
    expect(doc.ops).toEqual(['x', 'theta']);
    expect(doc.axes).toEqual(['x', 'theta']);
    // 2!·S(3,2) = 6 in each θ row (Rhoades–Wilson, Trans. Amer. Math. Soc. (2020) — from memory); the half-turn makes the table symmetric
    expect(doc.hilbert).toEqual([[1, 2], [3, 3], [2, 1]]);
    expect(doc.hilbertSeries).toEqual(doc.hilbert);
    expect(Object.keys(doc.schur)).toEqual(['3', '2,1', '1,1,1']);
    expect(doc.schur['1,1,1'][2][1]).toBe(1); // the seed itself spans the sign representation
    expect(doc.checks.map((c: { check: string }) => c.check)).toContain('Schur positivity');
    expect(doc.provenance.primes).toHaveLength(2);
    expect(doc.provenance.version).toMatch(/^\d+\.\d+\.\d+$/);
    expect(r.stderr).toMatch(/estimated work/);
  });
  it('one axis gives plain arrays', () => {
    const r = runCli(['module', '--seed', 'vandermonde', '--n', '3', '--ops', 'x', '--frobenius', '--json']);
    const doc = JSON.parse(r.stdout);
    expect(doc.axes).toEqual(['x']);
    expect(doc.hilbert).toEqual([1, 2, 2, 1]); // [3]_q! (Lusztig–Stanley; Stanley, Bull. Amer. Math. Soc. 1 (1979) — from memory)
    expect(doc.schur['2,1']).toEqual([0, 1, 1, 0]);
  });
  it('text output: table, Frobenius, findings, provenance', () => {
    const r = runCli(['module', '--seed', 'poly', '--n', '2', '--poly', 'x1*th2 - x2*th1', '--ops', 'x,theta', '--frobenius']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Hilbert table/);
    expect(r.stdout).toMatch(/s\(1,1\)/);
    expect(r.stdout).toMatch(/holds {2}Schur positivity/);
    expect(r.stdout).toMatch(/67108859/);
  });
  const bad: [string[], RegExp][] = [
    [['module', '--seed', 'vandermond', '--n', '3', '--ops', 'x'], /vandermonde/],
    [['module', '--seed', 'poly', '--n', '3', '--poly', 'x1 + q2', '--ops', 'x'], /--poly: column 6/],
    [['module', '--seed', 'superspace-vandermonde', '--n', '3', '--ops', 'x'], /--k/],
    [['module', '--seed', 'vandermonde', '--n', '7', '--ops', 'x', '--max-work', '10'], /--max-work/],
  ];
  for (const [args, re] of bad) {
    it(`bad input ${args.slice(1).join(' ')}: one line on stderr, exit 2`, () => {
      const r = runCli(args);
      expect(r.code).toBe(2);
      expect(r.stderr.trim().split('\n').pop()).toMatch(re);
    });
  }
});

describe('gradus quotient', () => {
  it('generalized coinvariant ring: dimension k!·S(n,k) (Haglund–Rhoades–Shimozono, Adv. Math. 329 (2018))', () => {
    const r = runCli(['quotient', '--ideal', 'generalized-coinvariant', '--n', '4', '--k', '2', '--frobenius', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.ideal).toBe('generalized-coinvariant');
    expect(doc.dimension).toBe(14);
    expect(doc.axes).toEqual(['x']);
  });
  it('diagonal coinvariants n = 3: dimension 16 = (n+1)^(n−1) (Haiman, Invent. Math. 149 (2002))', () => {
    const r = runCli(['quotient', '--ideal', 'coinvariant', '--n', '3', '--vars', 'x,y', '--json']);
    const doc = JSON.parse(r.stdout);
    expect(doc.dimension).toBe(16);
    expect(doc.axes).toEqual(['x', 'y']);
    expect(doc.checks.find((c: { check: string }) => c.check.includes('transposition')).holds).toBe(true);
  });
  it('unknown ideal: exit 2 with suggestions', () => {
    const r = runCli(['quotient', '--ideal', 'coinvariants', '--n', '3']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/coinvariant/);
  });
});
