/**
 * Every LaTeX export compiles with pdflatex when \input into a plain article, with nothing
 * running past the margins and long tables breaking across pages; and no export (Markdown,
 * LaTeX, JSON) cites a file of notes — only published sources.
 * pdflatex comes from Debian's texlive-latex-base (scripts/ci/install-tex.sh, run by .ci/run,
 * which sets GRADUS_REQUIRE_TEX=1); elsewhere the compile test is skipped when it is missing.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FAMILIES } from '../../objects/index.js';
import { TRANSFORMS } from '../../objects/transforms/index.js';
import { STATISTICS } from '../../statistics/index.js';
import { makeProvenance } from '../../src/core/provenance.js';
import { silentProgress } from '../../src/core/progress.js';
import { qFactorial } from '../../src/core/qanalogs.js';
import { definitionOf, exportModel } from '../../src/export/exportModel.js';
import { citesNotesFile } from '../../src/export/publishedSource.js';
import { renderJson } from '../../src/export/renderJson.js';
import { renderLatex } from '../../src/export/renderLatex.js';
import { renderMarkdown } from '../../src/export/renderMarkdown.js';
import { recognise } from '../../src/match/recognise.js';
import { searchCatalogue } from '../../src/match/search.js';
import { searchDocument, type SearchDocument } from '../../src/match/searchDocument.js';
import { parseCoeffs } from '../../src/series/parseCoeffs.js';
import { qSeries } from '../../src/series/series.js';
import { makeTarget, rangeText, type Target } from '../../src/series/target.js';
import { buildCatalogue } from '../../src/store/buildCatalogue.js';
import { Catalogue } from '../../src/store/catalogue.js';

const hasTex = spawnSync('pdflatex', ['--version']).status === 0;
const requireTex = process.env['GRADUS_REQUIRE_TEX'] === '1';
let dir: string;
const docs: Record<string, SearchDocument> = {};

function search(cat: Catalogue, target: Target): SearchDocument {
  return searchDocument(target, rangeText(target.entries), recognise(target), searchCatalogue(cat, target), makeProvenance({ request: 'test', method: 'test', seconds: 0 }));
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'gradus-latex-'));
  const cat = Catalogue.open(join(dir, 'c.sqlite'));
  buildCatalogue(cat, { nMax: 4, maxObjects: 10_000_000n, families: ['permutations', 'ordered-set-partitions'], progress: silentProgress });
  // [n]_q! (the inversion generating function, common practice), with a typed title of
  // more than a line and no space in it.
  docs['short'] = search(cat, parseCoeffs('n=2:1,1;n=3:1,2,2,1;n=4:1,3,5,6,5,3,1'));
  // A long one: [n]_q! for n = 1..36 (up to 631 terms a series), so the values run over
  // several pages and each series over many lines.
  const long = makeTarget(
    `q-factorials n=1..36 ${Array.from({ length: 36 }, (_, i) => `[${i + 1}]_q!`).join(',')}`,
    Array.from({ length: 36 }, (_, i) => ({ n: i + 1, series: qSeries(qFactorial(i + 1)) })),
  );
  docs['long'] = search(cat, long);
  docs['none'] = search(cat, parseCoeffs('n=3:1,0,4,1;n=4:1,0,0,22,1'));
  cat.close();
}, 120_000);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('LaTeX exports', () => {
  it.skipIf(!hasTex && !requireTex)('compile with pdflatex inside an article: no overfull lines or pages, long tables over several pages', () => {
    expect(hasTex, 'pdflatex is missing: run scripts/ci/install-tex.sh').toBe(true);
    const names = Object.keys(docs);
    for (const name of names) writeFileSync(join(dir, `${name}.tex`), renderLatex(exportModel(docs[name]!, 10)));
    writeFileSync(join(dir, 'main.tex'), `\\documentclass{article}\n\\begin{document}\n${names.map((n) => `\\input{${n}.tex}\n\\clearpage`).join('\n')}\n\\end{document}\n`);
    const r = spawnSync('pdflatex', ['-interaction=nonstopmode', '-halt-on-error', 'main.tex'], { cwd: dir, encoding: 'utf8' });
    expect(r.status, r.stdout.slice(-3000)).toBe(0);
    const log = r.stdout;
    // TeX reports a line or page that does not fit as "Overfull \hbox (12.3pt too wide)".
    const overfull = [...log.matchAll(/Overfull \\([hv])box \(([\d.]+)pt too (wide|high)\)/g)].filter((m) => Number(m[2]) > 1);
    expect(overfull.map((m) => m[0]), log.slice(-3000)).toEqual([]);
    const pages = Number(/Output written on main\.pdf \((\d+) pages?/.exec(log)?.[1] ?? '0');
    expect(pages).toBeGreaterThanOrEqual(5);
  }, 120_000);
});

describe('sources in exports', () => {
  it('every definition an export can print names published sources only, never a file of notes', () => {
    const all = [
      ...FAMILIES.map((f) => definitionOf('family', f.id)),
      ...STATISTICS.map((s) => definitionOf('statistic', s.id)),
      ...TRANSFORMS.map((t) => definitionOf('transform', t.id)),
    ];
    expect(all.length).toBeGreaterThan(100);
    for (const d of all) {
      expect(citesNotesFile(`${d.description} ${d.source}`), `${d.id}: ${d.source}`).toBe(false);
      expect(d.source.trim(), d.id).not.toBe('');
    }
  });

  it('no export of a search names a Markdown notes file', () => {
    for (const doc of Object.values(docs)) {
      for (const text of [renderMarkdown(exportModel(doc, 10)), renderLatex(exportModel(doc, 10)), renderJson(exportModel(doc, 10))]) {
        expect(text).not.toMatch(/MATH\.md|DESIGN\.md|\w\.md\b/);
      }
    }
  });
});
