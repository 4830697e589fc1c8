/**
 * Keys that arrive together — auto-repeat, a paste, a slow remote link — act exactly as the
 * same keys typed one by one, on every screen: each burst is one write to the terminal, and
 * its result is compared with the same keys sent one at a time and with what it must show.
 */
import { readdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { FAMILIES } from '../../objects/index.js';
import type { AppProps } from '../../src/ui/App.js';
import { burst, idle, KEYS, press, renderApp, waitForFrame, type Rendered } from './helpers.js';
import { tinyCatalogue } from './tinyCatalogue.js';

let cat: { dir: string; path: string };
const open: Rendered[] = [];
beforeAll(() => {
  cat = tinyCatalogue();
});
afterAll(() => rmSync(cat.dir, { recursive: true, force: true }));
afterEach(() => {
  for (const r of open.splice(0)) r.unmount();
});

function app(props: Partial<AppProps> = {}): Rendered {
  const r = renderApp({ env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir, ...props });
  open.push(r);
  return r;
}

/** Times and rates differ from run to run; everything else must be the same. */
const steady = (f: string) => f.replace(/\d+(\.\d+)?s\b/g, '#s');

/** The frame once no computation shows its progress (a count may outlast the quiet looks of idle). */
async function settled(r: Rendered): Promise<string> {
  await waitForFrame(r, (x) => !/elapsed/.test(x), 30_000);
  return idle(r);
}

/** The keys in one write give the same screen as the keys one at a time. */
async function sameAsSlow(props: Partial<AppProps>, keys: string[]): Promise<string> {
  const slow = app(props);
  await idle(slow);
  await press(slow, ...keys);
  const one = app(props);
  await idle(one);
  await burst(one, ...keys);
  const f = await settled(one);
  expect(steady(f)).toBe(steady(await settled(slow)));
  return f;
}

describe('bursts of keys', () => {
  it('Families: three → move three families; ↓↓ scroll two objects; a typed n=6, Backspace, 4, Enter gives n=4', async () => {
    const start = FAMILIES.findIndex((f) => f.id === 'permutations');
    let f = await sameAsSlow({ initialScreen: 'families' }, [KEYS.right, KEYS.right, KEYS.right, KEYS.down, KEYS.down]);
    expect(f).toContain(`◀ ${FAMILIES[(start + 3) % FAMILIES.length]!.id} ▶`);
    expect(f).toContain(`family ${start + 4} of ${FAMILIES.length}`);
    expect(f).toContain('objects 3–');
    // 4! = 24 permutations of 4 (common practice).
    f = await sameAsSlow({ initialScreen: 'families' }, ['p', KEYS.ctrlU, 'n=6', KEYS.backspace, '4', KEYS.enter]);
    expect(f).toContain('◀ permutations ▶ n=4 (24 objects');
  }, 30_000);

  it('Statistics: +++ raises n three times, ↓↓ moves two statistics', async () => {
    const f = await sameAsSlow({ initialScreen: 'statistics' }, ['+', '+', '+', KEYS.down, KEYS.down]);
    // 8! = 40320 (common practice).
    expect(f).toContain('◀ permutations ▶ n=8 (40320 objects)');
    expect(f).toMatch(/statistic \S+ \(3\/\d+\)/);
  }, 30_000);

  it('Modules: s-- picks a seed and lowers n twice; a whole request typed and submitted in one write computes it; →→→ moves the cell', async () => {
    const f = await sameAsSlow({ initialScreen: 'modules' }, ['s', '-', '-']);
    expect(f).toContain('module --seed vandermonde --n 2 --ops x');
    const r = app({ initialScreen: 'modules' });
    await idle(r);
    r.stdin.write(`e${KEYS.ctrlU}--seed vandermonde --n 3 --ops x${KEYS.enter}`);
    // The Vandermonde of n = 3: dimension 3! = 6, Hilbert series [3]_q! = 1 + 2q + 2q^2 + q^3 (common practice).
    await waitForFrame(r, (x) => x.includes('dimension 6'));
    const g = await burst(r, KEYS.right, KEYS.right, KEYS.right);
    expect(g).toMatch(/dim +. 1 +. 2 +. 2 +\[. 1\]/);
    expect(g).toContain('Frob(x3) s(1,1,1)');
  }, 40_000);

  it('SymFun: e, the expression and Enter in one write evaluate it', async () => {
    const r = app({ initialScreen: 'symfun' });
    await idle(r);
    r.stdin.write(`e${KEYS.ctrlU}nabla(e(2))${KEYS.enter}`);
    // ∇e_2 = s_2 + (q + t) s_{1,1} (Haglund, The q,t-Catalan numbers and the space of diagonal harmonics, ch. 2).
    const f = await waitForFrame(r, (x) => x.includes('Schur basis'));
    expect(f).toContain('nabla(e(2)) in the Schur basis, degree 2');
    expect(f).toMatch(/\n {2}s\(2\)\n {2}\+ \(q \+ t\)\*s\(1,1\)\n/);
  }, 30_000);

  it('Search and Export: a series typed, submitted and searched in one write; ↓↓↓ stops at the last candidate; →→ picks JSON; Enter writes it', async () => {
    const r = app({ initialScreen: 'search' });
    await idle(r);
    // [3]_q! and [4]_q!: the inversion generating function (common practice).
    r.stdin.write(`e${KEYS.ctrlU}n=3:1,2,2,1;n=4:1,3,5,6,5,3,1${KEYS.enter}${KEYS.enter}`);
    let f = await waitForFrame(r, (x) => x.includes('simplest first'));
    expect(f).toContain('2 candidates, simplest first.');
    f = await burst(r, KEYS.down, KEYS.down, KEYS.down);
    expect(f).toMatch(/▶ 2\. /);
    f = await burst(r, '7', KEYS.right, KEYS.right, KEYS.enter);
    expect(f).toContain('[json]');
    f = await waitForFrame(r, (x) => x.includes('✓ wrote'));
    const json = readdirSync(cat.dir).filter((x) => x.endsWith('.json'));
    expect(json.length).toBe(1);
    expect(JSON.parse(readFileSync(join(cat.dir, json[0]!), 'utf8')).format).toBe('gradus-export');
  }, 40_000);

  it('Tour: Enter and x together start a step and cancel it', async () => {
    const r = app();
    await idle(r);
    const f = await burst(r, KEYS.enter, 'x');
    expect(f).toContain('step cancelled; Enter runs it again');
    expect(f).toContain('▶ 1.');
  }, 30_000);

  it('Help and the shell: ? PgDn PgDn scrolls two pages; ?? comes back; three Tabs move three screens; Esc then 2 in one write', async () => {
    let f = await sameAsSlow({}, ['?', KEYS.pageDown, KEYS.pageDown]);
    expect(f).toMatch(/↑ \d+ more lines above/);
    f = await sameAsSlow({ initialScreen: 'search' }, ['?', '?']);
    expect(f).toContain('[6Search]');
    f = await sameAsSlow({}, [KEYS.tab, KEYS.tab, KEYS.tab]);
    expect(f).toContain('[4Modules]');
    f = await sameAsSlow({ initialScreen: 'symfun' }, ['e', 'x', KEYS.escape, '2']);
    expect(f).toContain('[2Families]');
  }, 30_000);
});
