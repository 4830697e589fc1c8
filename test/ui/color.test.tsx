/** NO_COLOR (no-color.org, common practice): no escape code at all; with colour, there are some. */
import chalk from 'chalk';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SCREENS } from '../../src/ui/screens.js';
import { frame, press, renderApp } from './helpers.js';

const ESC = '\u001B';
let level: typeof chalk.level;
beforeAll(() => {
  // ink colours through chalk, which sees no terminal under the test runner: force colour
  // on, so that the NO_COLOR case is a real test of the app.
  level = chalk.level;
  chalk.level = 3;
});
afterAll(() => {
  chalk.level = level;
});

describe('colour', () => {
  it('draws with colour codes by default', () => {
    const r = renderApp({ env: {} });
    expect(frame(r)).toContain(ESC);
    r.unmount();
  });

  it('draws no escape code on any screen with NO_COLOR set', async () => {
    const r = renderApp({ env: { NO_COLOR: '1' } });
    for (const s of SCREENS) {
      await press(r, s.jump);
      expect(frame(r), s.id).not.toContain(ESC);
    }
    r.unmount();
  });
});
