/**
 * The app and the expression library: g on the Statistics and SymFun screens sends the whole
 * range n = 1..N (and every k) to the search, and the Search screen lists expression matches
 * before statistic matches.
 */
import { rmSync } from 'node:fs';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { silentProgress } from '../../src/core/progress.js';
import { buildExpressionLibrary } from '../../src/match/buildExpressions.js';
import { Catalogue } from '../../src/store/catalogue.js';
import { expressionFamilies } from '../../src/store/expressionStore.js';
import { fits, frame, KEYS, press, renderApp, waitForFrame, type Rendered } from './helpers.js';
import { tinyCatalogue } from './tinyCatalogue.js';

let r: Rendered | undefined;
let cat: { dir: string; path: string };
beforeAll(async () => {
  cat = tinyCatalogue();
  const c = Catalogue.open(cat.path);
  try {
    await buildExpressionLibrary(c, { nMax: 4, families: ['pleth-h-q'], workers: 1, progress: silentProgress });
  } finally {
    c.close();
  }
});
afterAll(() => rmSync(cat.dir, { recursive: true, force: true }));
afterEach(() => {
  r?.unmount();
  r = undefined;
});

describe('identification in the app', () => {
  it('the Search screen shows the expression (≡ …) beside the statistics: [n]_q! is the Hilbert series of (q;q)_n h_n[X/(1−q)] and inversions', async () => {
    r = renderApp({ initialScreen: 'search', env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });
    await press(r, 'e');
    // [3]_q! and [4]_q! (common practice: the inversion generating function; Stanley, Bull. AMS 1 (1979) for the coinvariants)
    await press(r, '\u0015', 'n=3:1,2,2,1;n=4:1,3,5,6,5,3,1', KEYS.enter, KEYS.enter);
    const f = await waitForFrame(r, (x) => x.includes('candidate'));
    expect(f).toContain('1. ≡ hilbert(plethdiv(h({n}), 1-q))');
    expect(fits(f, 80, 24)).toBe(true);
    // the statistics follow the expressions, below the fold
    await press(r, KEYS.pageDown);
    expect(frame(r)).toContain('inversions on permutations');
  }, 40_000);

  it('g on the Statistics screen searches n = 1..N, not one size', async () => {
    r = renderApp({ initialScreen: 'statistics', env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });
    await waitForFrame(r, (x) => x.includes('n=5 (120 objects)'));
    await press(r, '-', '-');
    await waitForFrame(r, (x) => x.includes('n=3 (6 objects)') && x.includes('unimodal'));
    await press(r, 'g');
    const f = await waitForFrame(r, (x) => x.includes('[6Search]'), 30_000);
    expect(f).toMatch(/target .*on permutations, n = 1\.\.3/);
    expect(f).toContain('n=1:');
    expect(f).toContain('n=3:');
  }, 40_000);

  it('an expression with {k} is a family over n and k: the SymFun screen shows k and g takes every k', async () => {
    r = renderApp({ initialScreen: 'symfun', env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });
    await press(r, 'e');
    await press(r, '\u0015', 'deltaprime(e({k}-1), e({n}))', KEYS.enter);
    // Δ′_{e_1} e_3 at n = 3, k = 2 (the middle k)
    let f = await waitForFrame(r, (x) => x.includes('Schur basis'));
    expect(f).toContain('{n} = 3, {k} = 2');
    await press(r, 'g');
    f = await waitForFrame(r, (x) => x.includes('[6Search]'), 30_000);
    expect(f).toContain('n = 1..3, all k');
    expect(f).toContain('n=2,k=1:');
    expect(f).toContain('n=3,k=3:'); // every place: 1 + 2 + 3 of them
  }, 40_000);

  it('a keeps the expression as a family of the library, searched like the built-in ones', async () => {
    r = renderApp({ initialScreen: 'symfun', env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });
    expect(frame(r)).toContain('sym nabla(e({n}))');
    await press(r, 'a');
    await press(r, '\u0015', 'my-nabla', KEYS.enter);
    await waitForFrame(r, (x) => x.includes('kept my-nabla'), 30_000);
    const c = Catalogue.open(cat.path, { existing: true });
    try {
      expect(expressionFamilies(c).find((f) => f.id === 'my-nabla')).toMatchObject({ origin: 'user', template: 'nabla(e({n}))', sizes: [1, 2, 3] });
    } finally {
      c.close();
    }
  }, 40_000);
});
