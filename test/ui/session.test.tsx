/**
 * The session's results survive the app: w on the Export screen saves them to a session file
 * (our format, written atomically), the app opens it again (checked when read), a file that is
 * not a session of ours is refused and left as it was, and quitting asks first while results
 * are not saved.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { burst, frame, idle, KEYS, press, renderApp, unwrapped, waitForFrame, type Rendered } from './helpers.js';

let r: Rendered | undefined;
let dir = '';
afterEach(() => {
  r?.unmount();
  r = undefined;
  if (dir) rmSync(dir, { recursive: true, force: true });
});

/** Two results: an expression evaluated, and a typed series. */
async function twoResults(rr: Rendered): Promise<void> {
  await burst(rr, '5', 'e', KEYS.ctrlU, 'e(2)*s(1)', KEYS.enter);
  await waitForFrame(rr, (f) => f.includes('Schur basis'));
  await burst(rr, '6', 'e', KEYS.ctrlU, 'n=3:1,2,2,1', KEYS.enter);
  await waitForFrame(rr, (f) => f.includes('target typed n=3:1,2,2,1'));
}

describe('session files', () => {
  it('saves the results with w, opens them again, and quits without asking once saved', async () => {
    dir = mkdtempSync(join(tmpdir(), 'gradus-session-'));
    r = renderApp({ cwd: dir });
    await twoResults(r);
    let f = await burst(r, '7', 'w');
    const path = join(dir, 'gradus-session.json');
    expect(unwrapped(f)).toContain(`session saved: 2 results`);
    const doc = JSON.parse(readFileSync(path, 'utf8')) as { format: string; version: number; items: { title: string; origin: string; target?: { format: string } }[] };
    expect(doc.format).toBe('gradus-session');
    expect(doc.version).toBe(1);
    expect(doc.items.map((x) => x.origin)).toEqual(['symfun', 'typed']);
    expect(doc.items[1]!.target?.format).toBe('gradus-target');
    // Written through a file beside it, renamed into place: nothing else is left in the folder.
    expect(readdirSync(dir)).toEqual(['gradus-session.json']);
    // Everything is saved: q quits at once.
    await press(r, 'q');
    expect(r.exited()).toBe(true);
    r.unmount();

    r = renderApp({ cwd: dir, sessionFile: 'gradus-session.json' });
    f = await idle(r);
    expect(unwrapped(f)).toContain('session opened: 2 results');
    f = await burst(r, '7');
    expect(f).toContain('▶ symfun     sym e(2)*s(1)');
    f = await burst(r, '6');
    expect(f).toContain('target typed n=3:1,2,2,1');
    expect(f).toContain('n=3: q^3 + 2*q^2 + 2*q + 1');
  }, 40_000);

  it('refuses a file that is not a session of ours, leaving it untouched, and never saves over it', async () => {
    dir = mkdtempSync(join(tmpdir(), 'gradus-session-'));
    const foreign = join(dir, 'notes.json');
    writeFileSync(foreign, '{"format": "something-else", "items": []}\n');
    r = renderApp({ cwd: dir, sessionFile: 'notes.json' });
    let f = await idle(r);
    expect(unwrapped(f)).toMatch(/✗ session file \S+notes\.json.*"format" must be "gradus-session"/);
    await twoResults(r);
    // Quitting asks: results are not saved. Any other key stays.
    f = await burst(r, 'q');
    expect(unwrapped(f)).toContain('Quit? 2 results of this session are not saved.');
    f = await burst(r, 'n');
    expect(f).toContain('not quitting');
    expect(r.exited()).toBe(false);
    // s saves them — beside the foreign file, not over it — and quits.
    await burst(r, 'q', 's');
    expect(r.exited()).toBe(true);
    expect(readFileSync(foreign, 'utf8')).toBe('{"format": "something-else", "items": []}\n');
    const saved = JSON.parse(readFileSync(join(dir, 'gradus-session.json'), 'utf8')) as { items: unknown[] };
    expect(saved.items.length).toBe(2);
  }, 40_000);

  it('Ctrl+C asks too, and a second Ctrl+C quits', async () => {
    dir = mkdtempSync(join(tmpdir(), 'gradus-session-'));
    r = renderApp({ cwd: dir, initialScreen: 'search' });
    await burst(r, 'e', KEYS.ctrlU, 'n=2:1,1', KEYS.enter);
    const f = await burst(r, KEYS.ctrlC);
    expect(unwrapped(f)).toContain('Quit? 1 result of this session is not saved.');
    await burst(r, KEYS.ctrlC);
    expect(r.exited()).toBe(true);
    expect(readdirSync(dir)).toEqual([]);
  }, 30_000);
});
