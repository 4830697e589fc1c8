/**
 * `gradus sweep` as users meet it (child processes): the monomial sweep ranks the seeds whose
 * Hilbert series are products of q-integers first (checked here by a greedy division, not the
 * cyclotomic recognition the sweep uses), modules are kept and never computed twice, an
 * interrupted sweep resumes; the Vandermonde heights sweep finds [k]_q!·Stir_q(n,k) for the
 * published height and the ordered-set-partition statistics; exports and refusals.
 */
import Database from 'better-sqlite3';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { Poly } from '../../src/core/poly.js';
import { Catalogue } from '../../src/store/catalogue.js';
import { checkSweepDocument, type SweepDocument } from '../../src/sweep/sweepDocument.js';
import { latexBalanced } from '../export/fixtures.js';
import { runCli } from '../helpers/cli.js';

let dir: string;
let cat: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'gradus-sweep-'));
  cat = join(dir, 'catalogue.sqlite');
  const r = runCli(['catalogue', 'build', '--n-max', '5', '--families', 'ordered-set-partitions', '--catalogue', cat]);
  expect(r.code, r.stderr).toBe(0);
  const e = runCli(['expressions', 'build', '--n-max', '5', '--families', 'deltaprime-e', '--catalogue', cat]);
  expect(e.code, e.stderr).toBe(0);
});

function sweep(words: string[]): SweepDocument {
  const r = runCli(['sweep', 'run', ...words, '--catalogue', cat, '--json']);
  expect(r.code, r.stderr).toBe(0);
  return checkSweepDocument(JSON.parse(r.stdout), 'stdout');
}

function keptDocument(key: string): Record<string, unknown> {
  const c = Catalogue.open(cat, { existing: true });
  try {
    return c.getResult(key) as Record<string, unknown>;
  } finally {
    c.close();
  }
}

/** Σ dim q^{x-degree} and Σ dim q^{total degree} of a kept module document. */
function gradedDims(doc: Record<string, unknown>): [Poly, Poly] {
  let byX = Poly.zero;
  let byTotal = Poly.zero;
  const walk = (t: unknown, deg: number[]): void => {
    if (Array.isArray(t)) t.forEach((v, i) => walk(v, [...deg, i]));
    else if (Number(t) !== 0) {
      byX = byX.add(Poly.monomial(BigInt(Number(t)), deg[0]!));
      byTotal = byTotal.add(Poly.monomial(BigInt(Number(t)), deg.reduce((a, b) => a + b, 0)));
    }
  };
  walk(doc['hilbert'], []);
  return [byX, byTotal];
}

/**
 * c·q^s·Π [m_i]_q with some m_i ≥ 2 (common practice): divide by the largest [m]_q that divides
 * exactly until a monomial is left. Greedy is exact: Φ_M divides [m]_q only for m ≥ M.
 */
function isQIntegerProduct(p: Poly): boolean {
  let rest = p;
  let factors = 0;
  for (let m = rest.degQ() + 1; m >= 2; m--) {
    const qm = Poly.fromQCoeffs(new Array<number>(m).fill(1));
    for (;;) {
      let quotient: Poly;
      try {
        quotient = rest.divExact(qm);
      } catch {
        break;
      }
      rest = quotient;
      factors++;
    }
  }
  return factors > 0 && rest.termCount === 1;
}

describe('gradus sweep', () => {
  it('monomials of x-degree ≤ 4 with one θ, n = 3, 4, under ∂x and ∂θ: products of q-integers first; nothing computed twice; resumes', () => {
    const words = ['--family', 'monomials', '--max-degree', '4', '--thetas', '1', '--n', '3..4', '--ops', 'x,theta'];
    const doc = sweep(words);
    expect(doc.state).toBe('done');
    expect(doc.counts.computed).toBe(doc.counts.modules);
    const product = doc.rows.map((r) => r.places.some((p) => gradedDims(keptDocument(p.key)).some(isQIntegerProduct)));
    expect(product.some(Boolean) && product.some((x) => !x)).toBe(true);
    // every product row above every other row, and the finding says so exactly there
    expect(product.indexOf(false)).toBe(product.lastIndexOf(true) + 1);
    doc.rows.forEach((r, i) => expect(r.findings.some((f) => f.kind === 'product'), r.seed).toBe(product[i]));
    // the counts add up: every raw seed vanishes, repeats one before, or is a module
    expect(BigInt(doc.counts.raw)).toBe(BigInt(doc.counts.vanishing) + BigInt(doc.counts.duplicates) + BigInt(doc.counts.modules));

    const again = sweep(words);
    expect([again.counts.kept, again.counts.computed]).toEqual([doc.counts.modules, 0]);
    expect(again.rows.map((r) => r.seed)).toEqual(doc.rows.map((r) => r.seed));

    // an interrupted sweep: three of its modules never kept
    const db = new Database(cat);
    const gone = doc.rows.slice(0, 3).map((r) => r.places[0]!.key);
    for (const key of gone) db.prepare('DELETE FROM results WHERE key = ?').run(key);
    db.close();
    const plan = JSON.parse(runCli(['sweep', 'plan', ...words, '--catalogue', cat, '--json']).stdout) as { requests: { key: string; kept: boolean }[] };
    expect(plan.requests.filter((r) => !r.kept).map((r) => r.key).sort()).toEqual([...gone].sort());
    const resumed = sweep(words);
    expect([resumed.counts.kept, resumed.counts.computed]).toEqual([doc.counts.modules - 3, 3]);
  });

  it('superspace Vandermonde heights: the x-closures of the published height have Hilbert series [k]_q!·Stir_q(n,k) (Rhoades–Wilson, Vandermondes in superspace, Trans. Amer. Math. Soc. 2020, from memory)', () => {
    const doc = sweep(['--family', 'heights', '--height', '1,k-1', '--n', '1..5', '--ops', 'x']);
    const row = doc.rows.find((r) => r.seed === 'δ_{n,k} with height k-1')!;
    expect(row.rank).toBe(1);
    const named = row.findings.find((f) => f.kind === 'q-analog')!;
    expect(named.claim).toBe('Hilbert series by x-degree = [k]_q!·Stir_q(n,k)');
    expect(named.places).toHaveLength(15);
    // the claim against the kept modules, with [k]_q! Stir_q(n,k) built here by the q-Stirling recurrence (Carlitz 1948, from memory)
    const S = (n: number, k: number): Poly => (n === 0 && k === 0 ? Poly.one : n === 0 || k === 0 || k > n ? Poly.zero : S(n - 1, k - 1).add(Poly.fromQCoeffs(new Array<number>(k).fill(1)).mul(S(n - 1, k))));
    const fact = (k: number) => Array.from({ length: k }, (_, i) => Poly.fromQCoeffs(new Array<number>(i + 1).fill(1))).reduce((a, b) => a.mul(b), Poly.one);
    for (const p of row.places) expect(gradedDims(keptDocument(p.key))[0].equals(fact(p.k!).mul(S(p.n, p.k!))), `n=${p.n} k=${p.k}`).toBe(true);
    // the ordered-set-partition statistics of the catalogue (Remmel–Wilson; Haglund–Remmel–Wilson, Trans. Amer. Math. Soc. 370 (2018))
    expect(row.findings.find((f) => f.kind === 'statistic')?.verified).toMatch(/on ordered-set-partitions .* on n = 1\.\.5, all k = 1\.\.n/);
    // and the expression library names it by the Delta family at t = 0 (Haglund–Rhoades–Shimozono, Adv. Math. 329 (2018); compared on every place)
    const expression = row.findings.find((f) => f.kind === 'expression');
    expect(expression?.claim).toMatch(/deltaprime\(e\(\{k\}-1\), e\(\{n\}\)\)/);
    expect(expression?.verified).toMatch(/on n = 1\.\.5, all k = 1\.\.n; at n=5,k=\d: gradus sym "/);
    expect(doc.rows.find((r) => r.seed === 'δ_{n,k} with height 1')!.findings.some((f) => f.kind === 'q-analog')).toBe(false);
  });

  it('exports the findings table (Markdown, LaTeX without packages, JSON) atomically, with the commands of each row', () => {
    const list = runCli(['sweep', 'list', '--catalogue', cat, '--json']);
    const id = (JSON.parse(list.stdout) as { id: string; key: string }[]).find((s) => s.key.includes('heights'))!.id;
    for (const format of ['markdown', 'latex', 'json']) {
      const out = join(dir, `table.${format}`);
      const r = runCli(['sweep', 'export', id, '--format', format, '--out', out, '--catalogue', cat]);
      expect(r.code, r.stderr).toBe(0);
      const text = readFileSync(out, 'utf8');
      expect(text).toContain('gradus module --seed superspace-vandermonde --n 5 --k 3 --ops x --frobenius');
      if (format === 'latex') {
        expect(latexBalanced(text)).toBe(true);
        expect(text).not.toMatch(/\\usepackage|[^\x00-\x7f]/);
      }
      if (format === 'json') expect(checkSweepDocument(JSON.parse(text), out).rows[0]!.reproduce).toContain('gradus search --from "module --seed superspace-vandermonde --n {n} --k {k} --ops x --frobenius" --n-range 1..5 --take hilbert');
    }
    const out = join(dir, 'table.markdown');
    const before = readFileSync(out, 'utf8');
    const again = runCli(['sweep', 'export', id, '--format', 'latex', '--out', out, '--catalogue', cat]);
    expect([again.code, readFileSync(out, 'utf8')]).toEqual([2, before]);
    const show = runCli(['sweep', 'show', id, '--catalogue', cat, '--limit', '1']);
    expect(show.stdout).toMatch(/^ {3}1\. δ_\{n,k\} with height k-1 {2}\[x\]/m);
  });

  it('refuses malformed requests with one line and exit 2', () => {
    const cases: [string[], RegExp][] = [
      [['sweep', 'run', '--n', '3', '--ops', 'x'], /--family/],
      [['sweep', 'run', '--family', 'heights', '--n', '3', '--ops', 'x', '--format', 'latex'], /--format goes with sweep export/],
      [['sweep', 'show', 'sweep:0123abcd'], /no kept sweep sweep:0123abcd/],
    ];
    for (const [args, message] of cases) {
      const r = runCli([...args, '--catalogue', cat]);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
      expect(r.stderr).toMatch(message);
    }
  });
});
