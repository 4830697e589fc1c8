import { afterEach, describe, expect, it } from 'vitest';
import { fits, frame, KEYS, press, renderApp, waitForFrame, type Rendered } from './helpers.js';

let r: Rendered | undefined;
afterEach(() => {
  r?.unmount();
  r = undefined;
});

describe('Modules screen', () => {
  it('computes the default seed in a worker and shows the shaded table, Frobenius and findings', async () => {
    r = renderApp({ initialScreen: 'modules' });
    expect(frame(r)).toContain('--seed monomial --n 3 --x-exponents 2,1,0 --theta 3 --ops x,theta');
    await press(r, KEYS.enter);
    const f = await waitForFrame(r, (x) => x.includes('dimension 24'));
    console.log(f);
    expect(fits(f, 80, 24)).toBe(true);
  }, 30_000);
});
