/** Cancelling long work returns a usable screen; engine errors are one clear line, never a crash. */
import { afterEach, describe, expect, it } from 'vitest';
import { fits, frame, KEYS, press, renderApp, waitForFrame, type Rendered } from './helpers.js';

let r: Rendered | undefined;
afterEach(() => {
  r?.unmount();
  r = undefined;
});

async function request(rr: Rendered, line: string): Promise<void> {
  await press(rr, 'e');
  await press(rr, '\u0015', line, KEYS.enter);
}

describe('Modules screen: cancel and errors', () => {
  it('cancels a long computation with x and computes again afterwards', async () => {
    r = renderApp({ initialScreen: 'modules' });
    // The Vandermonde of n = 8 (dimension 40320) takes far longer than this test waits.
    await request(r, '--seed vandermonde --n 8 --ops x');
    await waitForFrame(r, (f) => f.includes('░') && /\d+\/\d+|starting|estimated/.test(f));
    await press(r, 'x');
    let f = await waitForFrame(r, (x) => x.includes('Cancelled after'));
    expect(f).toContain('computation cancelled');
    expect(fits(f, 80, 24)).toBe(true);
    // Still usable: a small module computes.
    await request(r, '--seed vandermonde --n 3 --ops x');
    f = await waitForFrame(r, (x) => x.includes('dimension 6'));
    // Vandermonde n = 3: Hilbert series [3]_q! = 1 + 2q + 2q^2 + q^3 (Lusztig–Stanley; Stanley, Bull. Amer. Math. Soc. 1 (1979) — from memory).
    expect(f).toMatch(/dim +\[. 1\] +. 2 +. 2 +. 1/);
  }, 60_000);

  it('shows an unknown seed as one line naming the nearest names', async () => {
    r = renderApp({ initialScreen: 'modules' });
    await request(r, '--seed vandermond --n 3 --ops x');
    const f = await waitForFrame(r, (x) => x.includes('✗'));
    expect(f).toContain('unknown seed "vandermond"');
    expect(f).not.toMatch(/\bat .+:\d+:\d+/);
  }, 30_000);

  it('shows a refused cost (LimitError from the engine, in the worker) with the option that raises it', async () => {
    r = renderApp({ initialScreen: 'modules' });
    await request(r, '--seed vandermonde --n 5 --ops x --max-work 1');
    const f = await waitForFrame(r, (x) => x.includes('✗'));
    expect(f).toContain('max-work');
    expect(f).not.toContain('internal error');
  }, 30_000);

  it('shows a bad option of the request as the command line would', async () => {
    r = renderApp({ initialScreen: 'modules' });
    await request(r, '--seed vandermonde --n 99 --ops x');
    const f = await waitForFrame(r, (x) => x.includes('✗'));
    expect(f).toContain('--n must be an integer from 1 to 10');
  }, 30_000);
});
