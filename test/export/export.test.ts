import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { silentProgress } from '../../src/core/progress.js';
import { atomicWrite } from '../../src/export/atomicWrite.js';
import { exportModel } from '../../src/export/exportModel.js';
import { latexText } from '../../src/export/latexText.js';
import { renderJson } from '../../src/export/renderJson.js';
import { renderLatex } from '../../src/export/renderLatex.js';
import { renderMarkdown } from '../../src/export/renderMarkdown.js';
import { recognise } from '../../src/match/recognise.js';
import { searchCatalogue } from '../../src/match/search.js';
import { searchDocument, type SearchDocument } from '../../src/match/searchDocument.js';
import { parseCoeffs } from '../../src/series/parseCoeffs.js';
import { rangeText } from '../../src/series/target.js';
import { buildCatalogue } from '../../src/store/buildCatalogue.js';
import { Catalogue } from '../../src/store/catalogue.js';
import { makeProvenance } from '../../src/core/provenance.js';
import { runCli } from '../helpers/cli.js';
import { latexBalanced } from './fixtures.js';

let dir: string;
let doc: SearchDocument;
let none: SearchDocument;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'gradus-export-'));
  const cat = Catalogue.open(join(dir, 'c.sqlite'));
  buildCatalogue(cat, { nMax: 4, maxObjects: 10_000_000n, families: ['permutations'], progress: silentProgress });
  // [n]_q! for n = 2..4 (q-factorials, src/core/qanalogs.ts values)
  const target = parseCoeffs('n=2:1,1;n=3:1,2,2,1;n=4:1,3,5,6,5,3,1');
  doc = searchDocument(target, rangeText(target.entries), recognise(target), searchCatalogue(cat, target), makeProvenance({ request: 'test', method: 'test', seconds: 0 }));
  const odd = parseCoeffs('n=3:1,0,4,1;n=4:1,0,0,22,1');
  none = searchDocument(odd, rangeText(odd.entries), recognise(odd), searchCatalogue(cat, odd), makeProvenance({ request: 'test', method: 'test', seconds: 0 }));
  cat.close();
}, 60_000);

describe('export', () => {
  it('LaTeX: balanced, formula and definitions with sources, values (compiled in latex-compile.test.ts)', () => {
    const tex = renderLatex(exportModel(doc, 3));
    expect(latexBalanced(tex)).toBe(true);
    expect(tex).toContain('\\sum_{x \\in \\mbox{\\texttt{permutations}}(n)}');
    expect(tex).toContain('[n]\\_q!');
    expect(tex).toContain('source:');
    // [4]_q! = 1 + 3q + 5q^2 + 6q^3 + 5q^4 + 3q^5 + q^6, 24 at q = 1 (common practice).
    expect(tex).toMatch(/\$n=4\$: \$q\^\{6\} \+ 3q\^\{5\}.*\(value at \$1\$: 24\)/);
    expect(/[^\x00-\x7e\n]/.test(tex)).toBe(false); // plain ASCII: no package needed for Unicode
  });
  it('LaTeX of a search without matches says what was tried', () => {
    const tex = renderLatex(exportModel(none, 3));
    expect(latexBalanced(tex)).toBe(true);
    expect(tex).toContain('No match. Tried');
  });
  it('latexText escapes specials and writes symbols as math (common practice)', () => {
    expect(latexText('a_b {c} 50% ω ≤ n')).toBe('a\\_b \\{c\\} 50\\% $\\omega$ $\\le$ n');
  });
  it('Markdown: formula, matches with definitions, values table', () => {
    const md = renderMarkdown(exportModel(doc, 2));
    expect(md).toContain('f = `[n]_q!`');
    expect(md).toMatch(/\| 4 \| q\^6 \+ 3\*q\^5/);
    expect(md).toContain('statistic `');
  });
  it('JSON: our versioned schema with provenance', () => {
    const j = JSON.parse(renderJson(exportModel(doc, 2)));
    expect(j.format).toBe('gradus-export');
    expect(j.version).toBe(1);
    expect(j.provenance.search.version).toMatch(/^\d+\.\d+\.\d+/);
    expect(j.values[2]).toEqual({ n: 4, series: [1, 3, 5, 6, 5, 3, 1], valueAtOne: 24 });
    expect(j.matches[0].statistics[0].source).toBeTruthy();
  });
  it('atomic write: an existing file is kept without force, replaced with it', () => {
    const p = join(dir, 'out.txt');
    atomicWrite(p, 'one', false);
    expect(() => atomicWrite(p, 'two', false)).toThrow(/--force/);
    expect(readFileSync(p, 'utf8')).toBe('one');
    atomicWrite(p, 'two', true);
    expect(readFileSync(p, 'utf8')).toBe('two');
  });
  it('command line: exit 2 with a clear line on an existing file, a bad format, a missing result', { timeout: 60_000 }, () => {
    const saved = join(dir, 'saved.json');
    writeFileSync(saved, JSON.stringify(doc));
    const out = join(dir, 'r.md');
    expect(runCli(['export', saved, '--format', 'markdown', '--out', out]).code).toBe(0);
    expect(existsSync(out)).toBe(true);
    const again = runCli(['export', saved, '--format', 'markdown', '--out', out]);
    expect(again.code).toBe(2);
    expect(again.stderr).toContain('exists; not overwritten (add --force');
    expect(runCli(['export', saved, '--format', 'markdown', '--out', out, '--force']).code).toBe(0);
    expect(runCli(['export', saved, '--format', 'pdf', '--out', out]).stderr).toContain('--format must be one of latex, markdown, json');
    expect(runCli(['export', join(dir, 'none.json'), '--format', 'json', '--out', join(dir, 'x.json')]).stderr).toContain('cannot read');
  });
});
