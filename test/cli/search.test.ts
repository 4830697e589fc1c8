/**
 * Acceptance through the command line (child processes): the search finds the known
 * combinatorial formulas of the literature (sources beside each case) from the module and
 * symmetric-function engines.
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { readFileSync, writeFileSync } from 'node:fs';
import { exportModel } from '../../src/export/exportModel.js';
import { renderJson } from '../../src/export/renderJson.js';
import { renderLatex } from '../../src/export/renderLatex.js';
import { renderMarkdown } from '../../src/export/renderMarkdown.js';
import { checkSearchDocument } from '../../src/match/searchDocument.js';
import { checkFixture, latexBalanced, searchCore } from '../export/fixtures.js';
import { runCli } from '../helpers/cli.js';

let dir: string;
let cat: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'gradus-search-'));
  cat = join(dir, 'catalogue.sqlite');
  const r = runCli(['catalogue', 'build', '--n-max', '6', '--catalogue', cat]);
  expect(r.code, r.stderr).toBe(0);
}, 300_000); // the build also fills the expression library (n ≤ 6)

interface Match {
  family: string;
  statistics: string[];
  combine: string;
  transform: string;
  variant: string;
  verified: string;
  complete: boolean;
}

/** Export a saved search in our three formats (in-process) and compare with test/fixtures/search. */
function exportFixtures(name: string): void {
  const text = readFileSync(join(dir, `${name}.search.json`), 'utf8');
  checkFixture(`${name}.search.json`, searchCore(text));
  const model = exportModel(checkSearchDocument(JSON.parse(text), name), 1);
  const tex = renderLatex(model);
  expect(latexBalanced(tex)).toBe(true);
  checkFixture(`${name}.tex`, tex);
  checkFixture(`${name}.md`, renderMarkdown(model));
  checkFixture(`${name}.export.json`, renderJson(model));
}

function search(args: string[]): { code: number; doc: { matches: Match[]; recognition: { recurrences: { text: string; name?: string }[] }; tried: { candidates: number } }; stderr: string } {
  const r = runCli(['search', ...args, '--catalogue', cat, '--json']);
  return { code: r.code, doc: r.code === 0 ? JSON.parse(r.stdout) : null, stderr: r.stderr };
}

describe('gradus search (acceptance)', () => {
  it('δ_{n,k} under x-derivatives, n ≤ 6, all k: an ordered-set-partition statistic and the q-Stirling recurrence (Rhoades–Wilson, Vandermondes in superspace, Trans. Amer. Math. Soc. (2020) — from memory)', () => {
    const r = search(['--n-range', '1..6', '--from', 'module --seed superspace-vandermonde --ops x --n {n} --k {k}', '--take', 'hilbert', '--save', join(dir, 'delta-x-hilbert.search.json')]);
    expect(r.code, r.stderr).toBe(0);
    const m = r.doc.matches.find((x) => x.family === 'ordered-set-partitions' && x.combine === 'single' && x.variant === 'as-given');
    expect(m).toBeDefined();
    expect(m!.verified).toBe('n = 1..6, all k = 1..n');
    expect(m!.complete).toBe(true);
    expect(r.doc.recognition.recurrences[0]!.name).toBe('q-Stirling recurrence');
    // the 21 module results were kept in the catalogue with provenance
    const info = JSON.parse(runCli(['catalogue', 'info', '--catalogue', cat, '--json']).stdout);
    expect(info.results).toEqual([{ kind: 'module', count: 21 }]);
    exportFixtures('delta-x-hilbert');
  }, 120_000);
  it('the Vandermonde module, n ≤ 6: Σ q^maj s_shape over standard Young tableaux first (Lusztig–Stanley; Stanley, Bull. Amer. Math. Soc. 1 (1979) — from memory)', () => {
    const r = search(['--n-range', '1..6', '--from', 'module --seed vandermonde --ops x --n {n} --frobenius', '--save', join(dir, 'vandermonde-frobenius.search.json')]);
    expect(r.code, r.stderr).toBe(0);
    const first = r.doc.matches[0]!;
    expect([first.family, first.statistics.join(), first.combine, first.variant]).toEqual(['standard-tableaux', 'tableau-major-index', 'shape', 'as-given']);
    expect(first.verified).toBe('n = 1..6');
    exportFixtures('vandermonde-frobenius');
  }, 120_000);
  it('⟨∇e_n, e_n⟩, n ≤ 6: a pair of Dyck-path statistics, area with dinv or bounce (q,t-Catalan: Haglund, AMS 2008, ch. 3 — from memory)', () => {
    const r = search(['--n-range', '1..6', '--from', 'sym "nabla(e({n}))"', '--take', 'sign', '--save', join(dir, 'nabla-en-sign.search.json')]);
    expect(r.code, r.stderr).toBe(0);
    const pairs = r.doc.matches.filter((x) => x.family === 'dyck-paths' && x.transform === '' && x.combine === 'joint').map((x) => x.statistics.join('&'));
    expect(pairs).toContain('dyck-area&dyck-bounce');
    expect(pairs).toContain('dyck-area&dyck-dinv');
    expect(r.doc.matches[0]!.verified).toBe('n = 1..6');
    exportFixtures('nabla-en-sign');
  }, 120_000);
  it('a typed target that nothing explains: "no match" and what was tried', { timeout: 30_000 }, () => {
    const r = runCli(['search', '--coeffs', 'n=3:1,3,1,1;n=4:2,0,5,1,7', '--catalogue', cat]);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toContain('no match');
    expect(r.stdout).toMatch(/tried \d+ candidates/);
    expect(r.stdout).toContain('variants as-given, q-reversed');
    const j = search(['--coeffs', 'n=3:1,3,1,1;n=4:2,0,5,1,7']);
    expect(j.doc.matches).toEqual([]);
    expect(j.doc.tried.candidates).toBeGreaterThan(0);
  });
  it('typed q-factorials are found as inversions/major index on permutations, reversed ones too', { timeout: 30_000 }, () => {
    const r = search(['--coeffs', 'n=3:1,2,2,1;n=4:1,3,5,6,5,3,1']);
    const perm = r.doc.matches.filter((x) => x.family === 'permutations' && x.combine === 'single' && x.transform === '').map((x) => x.statistics[0]);
    expect(perm).toContain('inversions');
    expect(perm).toContain('major-index');
  });
  it('q-binomials (src/core/qanalogs.ts) as a slice: subsets with k ones weighted by inversions of the 0/1 word (common practice)', { timeout: 60_000 }, () => {
    const r = search(['--n-range', '1..6', '--from', 'qanalog binomial --n {n} --k {k}']);
    expect(r.code, r.stderr).toBe(0);
    const m = r.doc.matches.find((x) => x.combine === 'slice' && x.family === 'subsets' && x.transform === '');
    expect(m?.statistics).toEqual(['binary-inversions', 'ones']);
    expect(m?.verified).toBe('n = 1..6, all k = 1..n');
  });
  it('a target file in our format, cut by --n-range', { timeout: 30_000 }, () => {
    const f = join(dir, 'target.json');
    // [n]_q! for n = 1..5 (src/core/qanalogs.ts values, written by hand)
    writeFileSync(f, JSON.stringify({ format: 'gradus-target', version: 1, kind: 'q', label: 'q-factorials', entries: [
      { n: 1, series: [1] }, { n: 2, series: [1, 1] }, { n: 3, series: [1, 2, 2, 1] }, { n: 4, series: [1, 3, 5, 6, 5, 3, 1] }, { n: 5, series: [1, 4, 9, 15, 20, 22, 20, 15, 9, 4, 1] }] }));
    const r = runCli(['search', '--target-file', f, '--n-range', '2..5', '--catalogue', cat]);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toContain('formula: f = [n]_q!  (verified on n = 2..5)');
    expect(r.stdout).toContain('recurrence: f(n) = [n]_q · f(n-1)');
    expect(r.stdout).toMatch(/q\^\{inversions\(x\)\}/);
    writeFileSync(f, '{"format":"gradus-target","version":2}');
    const bad = runCli(['search', '--target-file', f, '--catalogue', cat]);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain('"version" must be 1');
  });
  it('bad input: two target sources, a bad range, a missing catalogue', { timeout: 30_000 }, () => {
    expect(runCli(['search', '--coeffs', 'n=1:1', '--target-file', 'x.json', '--catalogue', cat]).code).toBe(2);
    const r = runCli(['search', '--n-range', '5..2', '--from', 'qanalog integer --n {n}', '--catalogue', cat]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--n-range');
    const m = runCli(['search', '--coeffs', 'n=1:1', '--catalogue', join(dir, 'none.sqlite')]);
    expect(m.code).toBe(2);
    expect(m.stderr).toContain('catalogue build');
  });
});
