import { render } from 'ink-testing-library';
import { describe, expect, it } from 'vitest';
import { App } from '../../src/ui/App.js';

describe('App shell', () => {
  it('renders at 80x24', () => {
    const r = render(<App size={{ columns: 80, rows: 24 }} env={{ NO_COLOR: '1' }} />);
    const f = r.lastFrame() ?? '';
    console.log(f);
    r.unmount();
  });
});
