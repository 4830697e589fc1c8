/** The demo session on the Tour screen, end to end with the keys shown on screen. */
import { readFileSync, rmSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fits, frame, KEYS, press, renderApp, waitForFrame } from './helpers.js';
import { tinyCatalogue } from './tinyCatalogue.js';

let cat: { dir: string; path: string };
beforeAll(() => {
  cat = tinyCatalogue();
});
afterAll(() => rmSync(cat.dir, { recursive: true, force: true }));

describe('Tour screen (demo session)', () => {
  it('runs the four steps with Enter and hands the results to the other screens', async () => {
    const r = renderApp({ env: { NO_COLOR: '1', GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });
    expect(frame(r)).toContain('▶ 1. The module of ε(x1^2 x2 θ3) under ∂x, ∂θ');
    await press(r, KEYS.enter);
    let f = await waitForFrame(r, (x) => x.includes('✓ 1.'));
    // Our seed's module: dimension (n+1)! for n = 2, 3, 4 (computed here, confirmed by two primes).
    expect(f).toContain('dimensions: n=2: 6, n=3: 24, n=4: 120');
    expect(f).toContain('θ0');
    expect(f).toMatch(/✓ Frobenius table invariant under ω with a half-turn/);
    expect(fits(f, 80, 24)).toBe(true);
    await press(r, KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('✓ 2.'));
    expect(f).toContain('n=3: 4*q^3 + 8*q^2 + 8*q + 4');
    await press(r, KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('✓ 3.'), 30_000);
    expect(f).toMatch(/no match|candidate/);
    expect(f).toContain('θ-degree 0 row');
    expect(f).toContain('tried:');
    expect(fits(f, 80, 24)).toBe(true);
    await press(r, KEYS.enter);
    f = await waitForFrame(r, (x) => x.includes('✓ 4.'));
    const m = /^ {2}(\/\S+\.md)$/m.exec(f);
    expect(m, f).not.toBeNull();
    expect(readFileSync(m![1]!, 'utf8')).toContain('Hilbert series by x-degree');
    // The search screen now holds the demo's series as its target.
    await press(r, '6');
    expect(frame(r)).toContain('target Hilbert series by x-degree of ε(x1^2 x2 θ3)');
    r.unmount();
  }, 60_000);
});
