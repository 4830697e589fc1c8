import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.js';

describe('gradus sym (child process)', () => {
  it('prints ∇e_2 in the Schur basis', { timeout: 30_000 }, () => {
    const r = runCli(['sym', 'nabla(e(2))']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('s(2) + (q + t)*s(1,1)'); // ∇e_2 = s_2 + (q+t) s_11 (Haglund, AMS 2008, ch. 2 — from memory)
  });
  it('a parse error names its column and exits 2', { timeout: 30_000 }, () => {
    const r = runCli(['sym', 'e(2)*(q+t']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/column 10: expected "\)"/);
    expect(r.stdout).toBe('');
  });
  it('--json has the documented shape with q,t tables', { timeout: 30_000 }, () => {
    const r = runCli(['sym', 'deltaprime(e(1), e(3))', '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout) as { expression: string; degree: number; basis: string; terms: Record<string, unknown> };
    expect(j.expression).toBe('deltaprime(e(1), e(3))');
    expect(j.degree).toBe(3);
    expect(j.basis).toBe('s');
    // Δ'_{e_1} e_3 = (1+q+t) s_21 + (q²+qt+t²+q+t) s_111: the engine's value, confirmed against the
    // rise Delta theorem in test/symfun/delta-combinatorial.test.ts; here only the JSON shape is at stake
    expect(j.terms).toEqual({ '2,1': [[1, 1], [1, 0]], '1,1,1': [[0, 1, 1], [1, 1, 0], [1, 0, 0]] });
  });
  it('--basis m with --latex; a bad basis exits 2', () => {
    // s_21 = m_21 + 2 m_111 (Kostka numbers K_{21,21} = 1, K_{21,111} = 2; common practice)
    const l = runCli(['sym', 's(2,1)', '--basis', 'm', '--latex']);
    expect(l.stdout.trim()).toBe('m_{21} + 2\\,m_{111}');
    const bad = runCli(['sym', 's(1)', '--basis', 'x']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/--basis must be one of s, m, e, h, p/);
  }, 30_000);
  it('--help documents the grammar and the functions', { timeout: 30_000 }, () => {
    const r = runCli(['sym', '--help']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('expression  := term');
    for (const f of ['deltaprime(f, F)', 'nabla(F)', 'subs(F, t=0)', 'H(2,1)', 'omega(F)']) expect(r.stdout).toContain(f);
  });
});
