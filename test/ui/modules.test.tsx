import { afterEach, describe, expect, it } from 'vitest';
import { fits, frame, KEYS, press, renderApp, unwrapped, waitForFrame, type Rendered } from './helpers.js';

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
    let f = await waitForFrame(r, (x) => x.includes('dimension 24'));
    expect(f).toContain('closure of ε(x1^2 x2 θ3) under ∂x, ∂θ, n=3');
    // The Hilbert table of our seed at n = 3 (computed by the engine with two primes):
    // θ-degree 0 row 1 3 5 3, θ-degree 1 row 3 5 3 1 — total 24 = 4!.
    expect(f).toMatch(/θ0 +\[. 1\] +. 3 +. 5 +. 3/);
    expect(f).toMatch(/θ1 +. 3 +. 5 +. 3 +. 1/);
    expect(f).toContain('Frob(θ0 x0) s(3)');
    expect(f).toContain('✓ holds Frobenius table invariant under ω with a half-turn');
    expect(fits(f, 80, 24)).toBe(true);
    // Arrows move the selected cell; its Frobenius series follows.
    await press(r, KEYS.down, KEYS.right);
    f = frame(r);
    expect(f).toMatch(/θ1 +. 3 +\[. 5\]/);
    expect(f).toContain('Frob(θ1 x1)');
    // g sends the selected row (θ = 1) to the search screen as its target.
    await press(r, 'g');
    f = unwrapped(frame(r));
    expect(f).toContain('[6Search]');
    expect(f).toContain('row θ=1 (q=x) of closure of ε(x1^2 x2 θ3) under ∂x, ∂θ, n = 3');
    expect(f).toContain('n=3: q^3 + 3*q^2 + 5*q + 3');
    expect(f).toContain('one size only');
    // Back, the same request at n = 2: both sizes form the target.
    await press(r, '4', '-', KEYS.enter);
    await waitForFrame(r, (x) => x.includes('dimension 6'));
    await press(r, KEYS.down, 'g');
    f = unwrapped(frame(r));
    expect(f).toContain('row θ=1 (q=x) of closure of ε(x1 θ2) under ∂x, ∂θ, n = 2, 3');
    expect(f).toContain('n=2: q + 2');
  }, 30_000);
});

describe('Modules screen: choosing the request with keys', () => {
  it('cycles example seeds with s and changes n with + and -', async () => {
    r = renderApp({ initialScreen: 'modules' });
    await press(r, 's');
    expect(frame(r)).toContain('module --seed vandermonde --n 4 --ops x');
    await press(r, '-');
    expect(frame(r)).toContain('module --seed vandermonde --n 3 --ops x');
    await press(r, KEYS.enter);
    // Vandermonde n = 3: dimension 3! = 6 (the regular representation, Lusztig–Stanley; Stanley, Bull. Amer. Math. Soc. 1 (1979) — from memory).
    const f = await waitForFrame(r, (x) => x.includes('dimension 6'));
    expect(f).toContain('Vandermonde');
    // A module result is exported as the JSON of `gradus module --json`.
    await press(r, '7');
    expect(frame(r)).toContain('▶ module');
    expect(frame(r)).toContain('[json]');
  }, 30_000);
});
