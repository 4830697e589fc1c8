/**
 * The whole loop with the keys shown on screen: type a series, search it, browse the
 * match, export it, and check the file; and the demo tour end to end.
 */
import { readdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { fits, frame, KEYS, press, renderApp, unwrapped, waitForFrame, type Rendered } from './helpers.js';
import { tinyCatalogue } from './tinyCatalogue.js';

let r: Rendered | undefined;
let cat: { dir: string; path: string };
beforeAll(() => {
  cat = tinyCatalogue();
});
afterAll(() => rmSync(cat.dir, { recursive: true, force: true }));
afterEach(() => {
  r?.unmount();
  r = undefined;
});

describe('search and export loop', () => {
  it('finds inversions for typed [n]_q! coefficients and exports the result', async () => {
    r = renderApp({ initialScreen: 'search', env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });
    expect(frame(r)).toContain('none yet');
    await press(r, 'e');
    // [3]_q! = 1 + 2q + 2q^2 + q^3 and [4]_q! (common practice: the inversion generating function).
    await press(r, '\u0015', 'n=3:1,2,2,1;n=4:1,3,5,6,5,3,1', KEYS.enter);
    expect(frame(r)).toContain('typed n=3:1,2,2,1');
    await press(r, KEYS.enter);
    let f = await waitForFrame(r, (x) => x.includes('candidate'));
    expect(f).toContain('inversions on permutations');
    expect(f).toContain('n = 3..4');
    expect(fits(f, 80, 24)).toBe(true);
    await press(r, KEYS.down);
    f = frame(r);
    expect(f).toMatch(/▶ 2\. /);
    // To the export screen: the search result is listed there, newest first.
    await press(r, '7');
    f = frame(r);
    expect(f).toContain('▶ search     search: typed n=3:1,2,2,1');
    expect(f).toContain('[markdown]');
    expect(f.replace(/\n\s*/g, '')).toContain(`file ${cat.dir}`);
    await press(r, KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('✓ wrote'));
    const written = readdirSync(cat.dir).filter((x) => x.endsWith('.md'));
    expect(written.length).toBe(1);
    const path = join(cat.dir, written[0]!);
    expect(f.replace(/\n/g, '')).toContain(path);
    const md = readFileSync(path, 'utf8');
    expect(md).toContain('inversions');
    expect(md).toContain('major-index');
    // Writing again does not overwrite without f.
    await press(r, KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('exists'));
    expect(unwrapped(f)).toContain('f overwrites');
    await press(r, 'f');
    f = await waitForFrame(r, (x) => x.includes('✓ wrote'));
    // LaTeX, then JSON (our versioned export schema).
    await press(r, KEYS.right);
    expect(frame(r)).toContain('[latex]');
    await press(r, KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('✓ wrote') && x.includes('.tex'));
    await press(r, KEYS.right);
    expect(frame(r)).toContain('[json]');
    await press(r, KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('✓ wrote') && x.includes('.json'));
    const json = JSON.parse(readFileSync(path.replace(/\.md$/, '.json'), 'utf8')) as { format: string; matches: unknown[] };
    expect(json.format).toBe('gradus-export');
    expect(json.matches.length).toBe(2);
  }, 40_000);

  it('choose, compute, search: the Vandermonde module for n = 3, 4 finds [n]_q! statistics', async () => {
    r = renderApp({ initialScreen: 'modules', env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });
    await press(r, 's', KEYS.enter);
    await waitForFrame(r, (x) => x.includes('dimension 24'));
    await press(r, '-', KEYS.enter);
    await waitForFrame(r, (x) => x.includes('dimension 6'));
    await press(r, 'g');
    expect(frame(r)).toContain('Hilbert series (q=x) of closure of Vandermonde');
    await press(r, KEYS.enter);
    // Vandermonde: Hilbert series [n]_q! (Lusztig–Stanley; Stanley, Bull. Amer. Math. Soc. 1 (1979) — from memory), the inversion generating function.
    const f = await waitForFrame(r, (x) => x.includes('candidate'));
    expect(f).toContain('formula: [n]_q!');
    expect(f).toContain('inversions on permutations');
    expect(f).toContain('(n = 3..4)');
  }, 40_000);

  it('says plainly when nothing matches, and what was tried', async () => {
    r = renderApp({ initialScreen: 'search', env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });
    await press(r, 'e');
    await press(r, '\u0015', 'n=3:1,1,1,1,1,1;n=4:2,22', KEYS.enter, KEYS.enter);
    const f = await waitForFrame(r, (x) => x.includes('Tried'));
    expect(f).toContain('No statistic matched.');
    expect(unwrapped(f)).toMatch(/Tried: \d+ candidates/);
  }, 40_000);

  it('shows a clear message for a bad typed series and for a missing catalogue', async () => {
    r = renderApp({ initialScreen: 'search', env: { NO_COLOR: '1', GRADUS_CATALOGUE: `${cat.dir}/nothing-here.sqlite` }, cwd: cat.dir });
    await press(r, 'e');
    await press(r, '\u0015', 'n=3:1,x', KEYS.enter);
    let f = frame(r);
    expect(f).toContain('✗ series: coefficients must be integers');
    await press(r, KEYS.escape);
    await press(r, 'e');
    await press(r, '\u0015', 'n=2:1,1', KEYS.enter, KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('no catalogue'));
    // The way out is said in the app's own keys, not as a command line.
    expect(unwrapped(f)).toContain('b on the Search screen builds one');
    expect(f).not.toContain('gradus catalogue build');
    expect(f).not.toMatch(/\bat .+:\d+:\d+/);
  }, 40_000);
});
