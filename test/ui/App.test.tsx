import { render } from 'ink-testing-library';
import { describe, expect, it } from 'vitest';
import { App } from '../../src/ui/App.js';

describe('App shell', () => {
  it('renders at 80x24', async () => {
    const r = render(<App size={{ columns: 80, rows: 24 }} env={{ NO_COLOR: '1' }} initialScreen="families" />);
    await new Promise((res) => setTimeout(res, 50));
    console.log(r.lastFrame());
    r.stdin.write('\u001b[C');
    await new Promise((res) => setTimeout(res, 50));
    r.stdin.write('a');
    await new Promise((res) => setTimeout(res, 50));
    console.log(r.lastFrame());
    r.unmount();
  });
});
