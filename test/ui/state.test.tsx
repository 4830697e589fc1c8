/**
 * Each screen shows only what belongs to its input: a result stays with the request, series
 * or choice it was computed for, the Export selection stays on the result chosen, Esc gives
 * back the text from before editing, an error goes once the input is valid, and messages
 * name the app's own keys.
 */
import { rmSync } from 'node:fs';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { FAMILIES } from '../../objects/index.js';
import { burst, frame, idle, KEYS, renderApp, unwrapped, waitForFrame, type Rendered } from './helpers.js';
import { tinyCatalogue } from './tinyCatalogue.js';

let cat: { dir: string; path: string };
let r: Rendered | undefined;
beforeAll(() => {
  cat = tinyCatalogue();
});
afterAll(() => rmSync(cat.dir, { recursive: true, force: true }));
afterEach(() => {
  r?.unmount();
  r = undefined;
});
const env = () => ({ env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });

describe('what a screen shows belongs to its input', () => {
  it('Export: the selection and its file name stay on the chosen result when a newer one arrives', async () => {
    r = renderApp({ ...env(), initialScreen: 'symfun' });
    for (const x of ['e(2)', 'e(3)']) {
      await burst(r, 'e', KEYS.ctrlU, x, KEYS.enter);
      await waitForFrame(r, (f) => f.includes(`${x} in the Schur basis`));
    }
    let f = await burst(r, '7', KEYS.down);
    expect(f).toContain('▶ symfun     sym e(2)');
    const file = unwrapped(f).match(/file (\S+)/)![1]!;
    await burst(r, '5', 'e', KEYS.ctrlU, 'e(4)', KEYS.enter);
    await waitForFrame(r, (x) => x.includes('e(4) in the Schur basis'));
    f = await burst(r, '7');
    expect(f).toContain('results (3)');
    expect(f).toContain('▶ symfun     sym e(2)');
    expect(unwrapped(f).match(/file (\S+)/)![1]).toBe(file);
  }, 40_000);

  it('Search: candidates show only under the series they were found for', async () => {
    r = renderApp({ ...env(), initialScreen: 'search' });
    // [3]_q!, the inversion generating function (common practice).
    await burst(r, 'e', KEYS.ctrlU, 'n=3:1,2,2,1', KEYS.enter, KEYS.enter);
    await waitForFrame(r, (f) => f.includes('simplest first'));
    let f = await burst(r, 'e', KEYS.ctrlU, 'n=3:1,1,1,1,1,1', KEYS.enter);
    expect(f).toContain('target (2 of 2, [/] others) typed n=3:1,1,1,1,1,1');
    expect(f).not.toContain('candidate');
    expect(f).toContain('Enter searches the catalogue for this series.');
    f = await burst(r, '[');
    expect(f).toContain('typed n=3:1,2,2,1');
    expect(f).toContain('▶ 1. inversions on permutations');
  }, 30_000);

  it('Modules: +/- show the request at the new n without the old result, and bring a computed one back', async () => {
    r = renderApp({ ...env(), initialScreen: 'modules' });
    await burst(r, KEYS.enter);
    await waitForFrame(r, (f) => f.includes('dimension 24'));
    let f = await burst(r, '-');
    expect(f).toContain('--n 2 --x-exponents 1,0 --theta 2');
    expect(f).not.toContain('dimension 24 in');
    expect(f).not.toContain('Hilbert table');
    f = await burst(r, '+');
    expect(f).toContain('dimension 24 in');
    expect(f).toContain('Hilbert table');
  }, 30_000);

  it('Esc gives back the text from before editing; a valid input clears the error of a bad one', async () => {
    r = renderApp({ ...env(), initialScreen: 'symfun' });
    let f = await burst(r, 'e', KEYS.ctrlU, 'e(2) + * s(1)', KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('✗'));
    expect(f).toContain('column 8');
    f = await burst(r, 'e', KEYS.ctrlU, 'h(9', KEYS.escape);
    expect(f).toContain('sym e(2) + * s(1)\n');
    await burst(r, 'e', KEYS.ctrlU, 'h(2)', KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('Schur basis'));
    expect(f).not.toContain('✗');
    expect(f).not.toContain('column 8');
    // Statistics: a refused parameter is said on the status line, and gone after a good one.
    f = await burst(r, '3', 'p', KEYS.ctrlU, 'n=99', KEYS.enter);
    expect(f).toMatch(/✗ permutations: n must be an integer from 0 to \d+ \(got 99\)/);
    f = await burst(r, KEYS.ctrlU, 'n=4', KEYS.enter);
    expect(f).not.toContain('✗ permutations');
    expect(f).toContain('n=4 (24 objects)');
  }, 30_000);

  it('a limit is said with the keys of the app, not a command-line option', async () => {
    r = renderApp({ ...env(), initialScreen: 'statistics' });
    // 13! = 6227020800 permutations, over the distribution engine's limit.
    const f = await burst(r, 'p', KEYS.ctrlU, 'n=13', KEYS.enter);
    const g = unwrapped(await waitForFrame(r, (x) => x.includes('✗')));
    expect(g).toContain('lower n (-)');
    expect(g).not.toMatch(/--max-objects|raise it with/);
    expect(f).toContain('6227020800 objects');
  }, 30_000);

  it('semistandard tableaux open on a content that is a partition, so charge is defined on every row', async () => {
    const at = FAMILIES.findIndex((x) => x.id === 'semistandard-tableaux');
    const from = FAMILIES.findIndex((x) => x.id === 'permutations');
    r = renderApp({ ...env(), initialScreen: 'families' });
    const steps = (at - from + FAMILIES.length) % FAMILIES.length;
    const f = await burst(r, ...Array<string>(steps).fill(KEYS.right));
    expect(f).toContain('◀ semistandard-tableaux ▶');
    const content = /content=([\d,]+)/.exec(f)![1]!.split(',').map(Number);
    expect(content).toEqual([...content].sort((a, b) => b - a));
    expect(f).not.toContain('cannot draw');
    expect(f).not.toContain(' —\n');
    await idle(r);
    expect(frame(r)).toMatch(/charge \d/);
  }, 30_000);
});
