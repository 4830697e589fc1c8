/**
 * Naming what the modules compute, through the command line: searches from the module and
 * quotient commands return (a) the symmetric-function expression, written so that `gradus sym`
 * evaluates it again, and (b) a combinatorial formula from the catalogue. Each case names its
 * theorem or conjecture; a conjecture is compared here, never assumed. The catalogue holds only
 * what the cases need (valley-decorated Dyck paths and ordered set partitions, the Delta family).
 */
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { instantiate } from '../../src/requests/template.js';
import { schurSeries, seriesEquals } from '../../src/series/series.js';
import { targetFromJson } from '../../src/series/targetFile.js';
import { evaluateExpression } from '../../src/symfun/expression.js';
import { runCli } from '../helpers/cli.js';

let cat: string;

beforeAll(() => {
  cat = join(mkdtempSync(join(tmpdir(), 'gradus-identify-')), 'c.sqlite');
  const b = runCli(['catalogue', 'build', '--n-max', '5', '--families', 'valley-decorated-dyck-paths,ordered-set-partitions', '--catalogue', cat]);
  expect(b.code, b.stderr).toBe(0);
  const e = runCli(['expressions', 'build', '--n-max', '5', '--families', 'deltaprime-e', '--catalogue', cat]);
  expect(e.code, e.stderr).toBe(0);
}, 180_000);

interface Doc {
  target: unknown;
  expressions: { family: string; expression: string; example: string; exampleAt: string; specialisation: string; variant: string; mapping: string; verified: string; complete: boolean; source: string; marker?: string }[];
  matches: { family: string; statistics: string[]; combine: string; mapping: string; verified: string; complete: boolean; marker?: string }[];
}

function search(from: string, range: string, extra: string[] = []): Doc {
  const r = runCli(['search', '--n-range', range, '--from', from, ...extra, '--catalogue', cat, '--json']);
  expect(r.code, r.stderr).toBe(0);
  return JSON.parse(r.stdout) as Doc;
}

/** The first expression match, checked: its own example evaluates to the target's entry there. */
function firstExpression(d: Doc): Doc['expressions'][number] {
  const m = d.expressions[0]!;
  const target = targetFromJson(d.target);
  const [, n, k] = /^n=(\d+)(?:,k=(\d+))?/.exec(m.exampleAt)!;
  const at = target.entries.find((e) => e.n === Number(n) && e.k === (k === undefined ? undefined : Number(k)))!;
  const f = evaluateExpression(m.example).value;
  expect(seriesEquals(schurSeries([...f.schurTerms()].map(([l, c]) => [l, c.toPoly()] as const)), at.series), `${m.example} = the target at ${m.exampleAt}`).toBe(true);
  return m;
}

describe('identifying modules (child processes)', () => {
  it('δ_{n,k} under ∂x, n ≤ 5, all k: Δ′_{e_{k−1}} e_n at t = 0 (Rhoades–Wilson, "Vandermondes in superspace", Trans. Amer. Math. Soc. (2020), from memory) and valley-decorated Dyck paths at one statistic 0', () => {
    const d = search('module --seed superspace-vandermonde --ops x --n {n} --k {k} --frobenius', '1..5');
    const m = firstExpression(d);
    expect([m.expression, m.variant, m.mapping, m.verified]).toEqual(['subs(deltaprime(e({k}-1), e({n})), t=0)', 'as-given', 'n ↦ n, k ↦ k', 'n = 1..5, all k = 1..n']);
    expect(m.source).toContain('Ordered set partitions, generalized coinvariant algebras, and the Delta Conjecture');
    // the valley version of the Delta conjecture (Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018)) at a statistic 0: compared
    const s = d.matches.find((x) => x.family === 'valley-decorated-dyck-paths' && x.combine === 'slice' && x.complete);
    expect(s?.verified).toBe('n = 1..5, all k = 1..n');
  }, 180_000);
  it('R_{n,k}, n ≤ 5, all k: rev_q ω of Δ′_{e_{k−1}} e_n at t = 0 (Haglund–Rhoades–Shimozono, Adv. Math. 329 (2018), the graded Frobenius series of R_{n,k}); the export states the source and the range', () => {
    const saved = join(dirname(cat), 'rnk.json');
    const d = search('quotient --ideal generalized-coinvariant --n {n} --k {k} --frobenius', '1..5', ['--save', saved]);
    const m = firstExpression(d);
    expect([m.expression, m.variant, m.verified]).toEqual(['revq(omega(subs(deltaprime(e({k}-1), e({n})), t=0)))', 'omega-q-reversed', 'n = 1..5, all k = 1..n']);
    expect(d.matches.some((x) => x.family === 'valley-decorated-dyck-paths' && x.combine === 'slice' && x.complete)).toBe(true);
    const md = join(dirname(cat), 'rnk.md');
    const ex = runCli(['export', saved, '--format', 'markdown', '--out', md, '--catalogue', cat]);
    expect(ex.code, ex.stderr).toBe(0);
    const text = readFileSync(md, 'utf8');
    expect(text).toContain('1. `revq(omega(subs(deltaprime(e({k}-1), e({n})), t=0)))` — Δ′_{e_{k−1}} e_n');
    expect(text).toContain('verified: n = 1..5, all k = 1..n; parameters n ↦ n, k ↦ k; specialisation t=0; variant omega-q-reversed');
    expect(text).toMatch(/source: Haglund, Remmel, Wilson, "The Delta Conjecture", Trans\. Amer\. Math\. Soc\. 370 \(2018\)/);
  }, 180_000);
  it('δ_{n,k} under ∂x, ∂y and the polarizations, n ≤ 4, all k: Δ′_{e_{k−1}} e_n (conjectured in "Vandermondes in superspace"; Haiman\'s theorem at k = n) and valley-decorated Dyck paths by area and dinv — compared', () => {
    const d = search('module --seed superspace-vandermonde --ops x,y,polar1,polar2,polar3 --n {n} --k {k} --frobenius', '1..4');
    const m = firstExpression(d);
    expect([m.expression, m.variant, m.verified]).toEqual(['deltaprime(e({k}-1), e({n}))', 'as-given', 'n = 1..4, all k = 1..n']);
    const s = d.matches.find((x) => x.family === 'valley-decorated-dyck-paths' && x.combine === 'ifundamental' && x.statistics.length === 2);
    expect(s?.verified).toBe('n = 1..4, all k = 1..n');
  }, 180_000);
  it('the x,θ coinvariants, n ≤ 4: a marked union Σ_k t^{n−k}·Δ′_{e_{k−1}} e_n at t = 0 (compared), and its Hilbert series Σ_k t^{n−k} [k]_q! Stir_q(n,k) by ordered set partitions ("The Hilbert series of the superspace coinvariant ring", Rhoades–Wilson, from memory)', () => {
    const d = search('quotient --ideal coinvariant --n {n} --vars x,theta --frobenius', '1..4');
    const m = d.expressions.find((x) => x.marker === 't^{n−k}')!;
    expect([m.expression, m.variant, m.verified]).toEqual(['subs(deltaprime(e({k}-1), e({n})), t=0)', 'as-given', 'n = 1..4, all k = 1..n']);
    expect(d.matches.some((x) => x.marker === 't^{n−k}' && x.family === 'valley-decorated-dyck-paths' && x.complete)).toBe(true);
    // the same documents, kept in the catalogue, read for their Hilbert series
    const h = search('quotient --ideal coinvariant --n {n} --vars x,theta --frobenius', '1..4', ['--take', 'hilbert']);
    const osp = h.matches.find((x) => x.marker === 't^{n−k}' && x.family === 'ordered-set-partitions' && x.statistics.join() === 'osp-inv');
    expect(osp?.verified).toBe('n = 1..4, all k = 1..n');
  }, 180_000);
  it('three gradings x, y, θ, n ≤ 3: Σ_k θ^{n−k}·Δ′_{e_{k−1}} e_n (the conjecture of "A module for the Delta conjecture", from memory — compared)', () => {
    const d = search('quotient --ideal coinvariant --n {n} --vars x,y,theta --frobenius', '1..3');
    const m = d.expressions[0]!;
    expect([m.marker, m.expression, m.verified]).toEqual(['θ^{n−k}', 'deltaprime(e({k}-1), e({n}))', 'n = 1..3, all k = 1..n']);
    expect(evaluateExpression(instantiate(m.expression, { n: 3, k: 2 })).value.isZero()).toBe(false);
  }, 120_000);
});

describe('gradus expressions (child processes)', () => {
  it('a family that fails is named with its place and reason, exit 2, and nothing is stored; one that works is searched like the built-in ones', () => {
    const bad = runCli(['expressions', 'add', 'my-ratio', '--template', '6*e({n})/(3-{n})', '--n-max', '4', '--workers', '1', '--catalogue', cat]);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/my-ratio fails at n = 3 .*division is only by a non-zero integer/);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
    const add = runCli(['expressions', 'add', 'my-delta', '--template', 'delta(e({k}-1), e({n}))', '--source', 'our own scenario', '--n-max', '4', '--catalogue', cat]);
    expect(add.code, add.stderr).toBe(0);
    const list = JSON.parse(runCli(['expressions', 'list', '--catalogue', cat, '--json']).stdout) as { families: { id: string; origin: string; sizes: number[] }[] };
    expect(list.families.map((f) => f.id)).not.toContain('my-ratio');
    expect(list.families.find((f) => f.id === 'my-delta')).toMatchObject({ origin: 'user', sizes: [1, 2, 3, 4] });
    // Δ_{e_{n−k}} e_n over (n, k) is the user's family under k ↦ n − k + 1
    const d = search('sym "delta(e({n}-{k}), e({n}))"', '2..4');
    const m = d.expressions.find((x) => x.family === 'my-delta')!;
    expect([m.expression, m.mapping, m.verified, m.source]).toEqual(['delta(e({n}-{k}), e({n}))', 'n ↦ n, k ↦ n-k+1', 'n = 2..4, all k = 1..n', 'our own scenario']);
    expect(runCli(['expressions', 'remove', 'my-delta', '--catalogue', cat]).code).toBe(0);
    expect(JSON.parse(runCli(['expressions', 'list', '--catalogue', cat, '--json']).stdout).families.map((f: { id: string }) => f.id)).not.toContain('my-delta');
    expect(runCli(['expressions', 'remove', 'deltaprime-e', '--catalogue', cat]).stderr).toMatch(/built in/);
  }, 180_000);
  it('a rebuilt catalogue keeps the families the user added (evaluated again at their sizes)', () => {
    const other = join(dirname(cat), 'other.sqlite');
    expect(runCli(['expressions', 'add', 'my-nabla', '--template', 'nabla(e({n}))', '--n-max', '3', '--workers', '1', '--catalogue', other]).code).toBe(0);
    const r = runCli(['catalogue', 'rebuild', '--n-max', '1', '--workers', '1', '--catalogue', other]);
    expect(r.code, r.stderr).toBe(0);
    const list = JSON.parse(runCli(['expressions', 'list', '--catalogue', other, '--json']).stdout) as { families: { id: string; sizes: number[] }[] };
    expect(list.families.find((f) => f.id === 'my-nabla')?.sizes).toEqual([1, 2, 3]);
  }, 120_000);
});
