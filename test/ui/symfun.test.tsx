import { afterEach, describe, expect, it } from 'vitest';
import { fits, frame, KEYS, press, renderApp, waitForFrame, type Rendered } from './helpers.js';

/** The result lines below the header line, one term per line (up to the status line). */
function terms(f: string): string[] {
  const lines = f.split('\n');
  const at = lines.findIndex((l) => l.includes('Schur basis'));
  const out: string[] = [];
  for (const l of lines.slice(at + 1)) {
    if (!/^( {2}|\+ |- )/.test(l)) break;
    out.push(l.trim());
  }
  return out;
}

let r: Rendered | undefined;
afterEach(() => {
  r?.unmount();
  r = undefined;
});

describe('Symmetric functions screen', () => {
  it('evaluates nabla(e(2)) in the Schur basis', async () => {
    r = renderApp({ initialScreen: 'symfun' });
    await press(r, 'e');
    await press(r, '\u0015', 'nabla(e(2))', KEYS.enter);
    // ∇e_2 = s_2 + (q+t) s_11 (Haglund 2008 ch. 2 — from memory; the engine's tests check it independently).
    const f = await waitForFrame(r, (x) => x.includes('Schur basis'));
    expect(terms(f)).toEqual(['s(2)', '+ (q + t)*s(1,1)']);
    expect(f).toContain('degree 2');
    expect(fits(f, 80, 24)).toBe(true);
  }, 30_000);

  it('points a parse error at its column', async () => {
    r = renderApp({ initialScreen: 'symfun' });
    await press(r, 'e');
    await press(r, '\u0015', 'e(2) + * s(1)', KEYS.enter);
    const f = await waitForFrame(r, (x) => x.includes('column'));
    const lines = f.split('\n');
    const exprLine = lines.findIndex((l) => l.startsWith('at  e(2) + * s(1)'));
    expect(exprLine).toBeGreaterThan(0);
    // The caret sits under the "*" the parser stopped at (column 8 of the expression).
    expect(lines[exprLine + 1]!.indexOf('^')).toBe(lines[exprLine]!.indexOf('*'));
    expect(f).toContain('column 8');
    expect(f).not.toMatch(/\bat .+:\d+:\d+/); // no stack trace
  }, 30_000);

  it('an expression with {n} is a family over n: g builds its target with the search engine', async () => {
    r = renderApp({ initialScreen: 'symfun' });
    expect(frame(r)).toContain('sym nabla(e({n}))');
    expect(frame(r)).toContain('{n} = 3');
    await press(r, '-', KEYS.enter);
    // ∇e_2 = s_2 + (q+t) s_11 (Haglund 2008 ch. 2 — from memory).
    let f = await waitForFrame(r, (x) => x.includes('Schur basis'));
    expect(terms(f)).toEqual(['s(2)', '+ (q + t)*s(1,1)']);
    await press(r, 'g');
    f = await waitForFrame(r, (x) => x.includes('[6Search]'), 30_000);
    expect(f).toContain('target sym nabla(e({n})), n = 1..2');
    expect(f).toContain('n=2:');
  }, 40_000);
});
