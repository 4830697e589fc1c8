/**
 * Every screen, holding results, drawn at 60×20, 80×24 and 120×40: the frame fits the window
 * (no line reaches the last column, which the app keeps empty, so no line is cut by the
 * layout), and in the smallest window everything the screen holds can be reached with its
 * scrolling keys: each line of the same screen drawn in a very tall window shows up on some
 * page, and every column of a wide table comes into view, with markers where text goes on.
 */
import { rmSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadCatalog, statisticsOf } from '../../src/ui/engines/catalog.js';
import { burst, frame, idle, KEYS, press, problems, renderApp, waitForFrame, type Rendered } from './helpers.js';
import { tinyCatalogue } from './tinyCatalogue.js';

const SIZES = [
  [60, 20],
  [80, 24],
  [120, 40],
] as const;
const MARKER = /more (lines?|objects?) (above|below)/;

let cat: { dir: string; path: string };
beforeAll(() => {
  cat = tinyCatalogue();
});
afterAll(() => rmSync(cat.dir, { recursive: true, force: true }));

async function fitsEverySize(r: Rendered, what: string): Promise<void> {
  for (const [c, h] of SIZES) {
    r.resize(c, h);
    const f = await idle(r);
    expect(problems(f, c, h), `${what} at ${c}×${h}:\n${f}`).toEqual([]);
  }
}

/** Every line of the screen drawn `tall` rows high is seen while paging down at 60×20. */
async function everyLineReachable(r: Rendered, what: string, down: string = KEYS.pageDown, tall = 400): Promise<void> {
  r.resize(60, tall);
  const whole = (await idle(r)).split('\n').filter((l) => l.trim() !== '' && !MARKER.test(l) && !/^objects \d/.test(l));
  r.resize(60, 20);
  await press(r, '\u001b[H'); // Home: back to the top
  const seen = new Set<string>();
  for (let page = 0; page < 200; page++) {
    const f = frame(r);
    for (const l of f.split('\n')) seen.add(l);
    if (!/more (lines?|objects?) below/.test(f)) break;
    await press(r, down);
  }
  expect(whole.filter((l) => !seen.has(l)), `${what}: lines never shown at 60×20`).toEqual([]);
  await press(r, '\u001b[H');
}

describe('every screen at 60×20, 80×24 and 120×40', () => {
  it('fits each size, and at 60×20 all it holds is reachable by scrolling', async () => {
    const r = renderApp({ env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });
    try {
      // SymFun: ∇e_4, whose Schur expansion is far wider than any window.
      await burst(r, '5', 'e', KEYS.ctrlU, 'nabla(e(4))', KEYS.enter);
      await waitForFrame(r, (x) => x.includes('Schur basis'), 30_000);
      await fitsEverySize(r, 'symfun');
      await everyLineReachable(r, 'symfun', KEYS.down);

      // Statistics: inversions × cycles on permutations of 7: 22 columns (inversions 0..21).
      const inv = statisticsOf(loadCatalog()!, 'permutations').findIndex((s) => s.id === 'inversions');
      await burst(r, '3', 'p', KEYS.ctrlU, 'n=7', KEYS.enter, ...Array<string>(inv).fill(KEYS.down), 'j');
      await waitForFrame(r, (x) => x.includes('t\\q'), 30_000);
      await fitsEverySize(r, 'statistics');
      r.resize(60, 20);
      const columns = new Set<number>();
      for (let i = 0; i < 40; i++) {
        const f = await idle(r);
        const head = f.split('\n').find((l) => l.startsWith('t\\q'))!;
        for (const m of head.matchAll(/\d+/g)) columns.add(Number(m[0]));
        if (i === 0) expect(head.endsWith('›'), 'a cut table says so on its rows').toBe(true);
        if (!head.includes('›')) break;
        await press(r, '>');
      }
      // The largest number of inversions of a permutation of 7 is 7·6/2 = 21 (common practice).
      expect([...columns].sort((a, b) => a - b)).toEqual(Array.from({ length: 22 }, (_, i) => i));
      await everyLineReachable(r, 'statistics');

      // Modules: our seed at n = 3, with its findings.
      await burst(r, '4', KEYS.enter);
      await waitForFrame(r, (x) => x.includes('dimension 24'), 30_000);
      await fitsEverySize(r, 'modules');
      await everyLineReachable(r, 'modules');

      // Search: a typed [n]_q! and its candidates.
      await burst(r, '6', 'e', KEYS.ctrlU, 'n=3:1,2,2,1;n=4:1,3,5,6,5,3,1', KEYS.enter, KEYS.enter);
      await waitForFrame(r, (x) => x.includes('simplest first'), 30_000);
      await fitsEverySize(r, 'search');
      await everyLineReachable(r, 'search');

      await burst(r, '7');
      await fitsEverySize(r, 'export');
      await everyLineReachable(r, 'export');

      await burst(r, '2');
      await fitsEverySize(r, 'families');
      await everyLineReachable(r, 'families');

      await burst(r, '?');
      await fitsEverySize(r, 'help');
      await everyLineReachable(r, 'help');

      // Tour: the first step's report with its findings (a window under 36 rows shows one step).
      await burst(r, '1', KEYS.enter);
      await waitForFrame(r, (x) => x.includes('✓ 1.'), 60_000);
      await fitsEverySize(r, 'tour');
      await everyLineReachable(r, 'tour', KEYS.pageDown, 35);
    } finally {
      r.unmount();
    }
  }, 240_000);
});
