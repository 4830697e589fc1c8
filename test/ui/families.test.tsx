import { afterEach, describe, expect, it } from 'vitest';
import { fits, frame, KEYS, press, renderApp, type Rendered } from './helpers.js';

let r: Rendered | undefined;
afterEach(() => {
  r?.unmount();
  r = undefined;
});

describe('Families screen', () => {
  it('lists permutations with statistic values beside each, scrolls, and takes parameters', async () => {
    r = renderApp({ initialScreen: 'families' });
    let f = frame(r);
    expect(f).toContain('family ◀ permutations ▶ n=5 (120 objects');
    expect(f).toContain('objects 1–');
    // The identity comes first and has no inversions and no descents (common practice).
    const first = f.split('\n').find((l) => l.startsWith('1 2 3 4 5'))!;
    expect(first).toBeDefined();
    expect(fits(f, 80, 24)).toBe(true);
    await press(r, KEYS.down, KEYS.down);
    expect(frame(r)).toContain('objects 3–');
    // Parameters: n=3 gives the 3! = 6 permutations.
    await press(r, 'p');
    await press(r, '\u0015', 'n=3', KEYS.enter);
    f = frame(r);
    expect(f).toContain('n=3 (6 objects');
    expect(f).toContain('objects 1–6 of 6');
    expect(f).toContain('3 2 1');
    // Add a statistic, then drop it.
    const before = f.split('\n').find((l) => l.startsWith('statistics '))!;
    await press(r, 'a');
    const after = frame(r).split('\n').find((l) => l.startsWith('statistics '))!;
    expect(after.split(',').length).toBe(before.split(',').length + 1);
    await press(r, 'd');
    expect(frame(r).split('\n').find((l) => l.startsWith('statistics '))).toBe(before);
  });

  it('refuses a parameter out of range with the family’s own message', async () => {
    r = renderApp({ initialScreen: 'families' });
    await press(r, 'p');
    await press(r, '\u0015', 'n=999', KEYS.enter);
    const f = frame(r);
    expect(f).toMatch(/✗ permutations: n must be an integer from 0 to \d+ \(got 999\)/);
    await press(r, KEYS.escape);
    await press(r, KEYS.right);
    expect(frame(r)).not.toContain('◀ permutations ▶');
  });
});
