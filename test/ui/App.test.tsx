import { afterEach, describe, expect, it } from 'vitest';
import { SCREENS } from '../../src/ui/screens.js';
import { fits, frame, KEYS, press, renderApp, type Rendered } from './helpers.js';

let r: Rendered | undefined;
afterEach(() => {
  r?.unmount();
  r = undefined;
});

describe('app shell', () => {
  it('opens on the demo tour, with tabs for every screen and the help line', () => {
    r = renderApp();
    const f = frame(r);
    expect(f).toContain('[1Tour]');
    for (const s of SCREENS) expect(f).toContain(s.tab);
    expect(f).toContain('Enter run the next step');
    expect(f).toContain('q quit');
    expect(fits(f, 80, 24)).toBe(true);
  });

  it('reaches every screen with its jump key, each fitting 80x24 with its own help line', async () => {
    r = renderApp();
    for (const s of SCREENS) {
      await press(r, s.jump);
      const f = frame(r);
      expect(f, s.id).toContain(`[${s.jump}${s.tab}]`);
      expect(f, s.id).toContain(`${s.keys[0]!.keys} ${s.keys[0]!.action}`);
      expect(fits(f, 80, 24), `${s.id}:\n${f}`).toBe(true);
    }
  });

  it('Tab and Shift+Tab cycle through the screens', async () => {
    r = renderApp();
    await press(r, KEYS.tab);
    expect(frame(r)).toContain('[2Families]');
    await press(r, KEYS.shiftTab, KEYS.shiftTab);
    expect(frame(r)).toContain('[8Sweep]');
  });

  it('uses the room of a larger terminal', async () => {
    r = renderApp({ size: { columns: 120, rows: 40 } });
    const f = frame(r);
    expect(f.split('\n').length).toBeGreaterThan(30);
    expect(f).toContain('1 Tour');
    expect(fits(f, 120, 40)).toBe(true);
  });

  it('the help screen lists the keys of every screen', async () => {
    r = renderApp({ size: { columns: 80, rows: 200 } });
    await press(r, '?');
    const f = frame(r);
    for (const s of SCREENS.filter((x) => x.id !== 'help')) {
      expect(f).toContain(s.title);
      for (const k of s.keys) expect(f).toContain(k.action);
    }
  });

  it('while a field is edited, the help line shows the editing keys and digits type', async () => {
    r = renderApp({ initialScreen: 'symfun' });
    await press(r, 'e');
    let f = frame(r);
    expect(f).toContain('Enter submit  Esc cancel');
    await press(r, '2');
    f = frame(r);
    expect(f).toContain('[5SymFun]');
    expect(f).toContain('sym>nabla(e({n}))2');
    // Esc leaves the field and keeps the expression it held before.
    await press(r, KEYS.escape);
    f = frame(r);
    expect(f).toContain('e edit expression');
    expect(f).toContain('sym nabla(e({n}))\n');
  });

  it('? opens the help and ? or Esc goes back to the screen it came from', async () => {
    r = renderApp({ initialScreen: 'modules' });
    await press(r, '?');
    expect(frame(r)).toContain('[?Help]');
    await press(r, '?');
    expect(frame(r)).toContain('[4Modules]');
    await press(r, '3', '?');
    expect(frame(r)).toContain('Everywhere');
    await press(r, KEYS.escape);
    expect(frame(r)).toContain('[3Statistics]');
  });

  it('q quits at once when no result would be lost', async () => {
    r = renderApp();
    await press(r, 'q');
    expect(r.exited()).toBe(true);
  });
});
