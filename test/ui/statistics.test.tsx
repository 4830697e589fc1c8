import { afterEach, describe, expect, it } from 'vitest';
import { fits, frame, KEYS, press, renderApp, waitForFrame, type Rendered } from './helpers.js';

let r: Rendered | undefined;
afterEach(() => {
  r?.unmount();
  r = undefined;
});

describe('Statistics screen', () => {
  it('draws a distribution as a bar chart, then a joint table', async () => {
    r = renderApp({ initialScreen: 'statistics' });
    let f = await waitForFrame(r, (x) => x.includes('unimodal'));
    // Cycles on permutations of 5: the signless Stirling numbers of the first kind
    // c(5,k) = 24, 50, 35, 10, 1 (common practice; Stanley, EC1 §1.3).
    expect(f).toContain('family ◀ permutations ▶ n=5 (120 objects)');
    expect(f).toMatch(/q\^1 █+ 24/);
    expect(f).toMatch(/q\^2 █+ 50/);
    expect(f).toMatch(/q\^5 █+ 1/);
    expect(fits(f, 80, 24)).toBe(true);
    await press(r, 'j');
    f = await waitForFrame(r, (x) => x.includes('q,t') && x.includes('t1'));
    expect(f).toContain('× denert');
    expect(f).toContain('t\\q');
    expect(fits(f, 80, 24)).toBe(true);
    // A bad parameter is refused with the family's own message, not a crash.
    await press(r, 'p');
    await press(r, '\u0015', 'n=99', KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('✗'));
    expect(f).toMatch(/n must be/);
  }, 30_000);
});
