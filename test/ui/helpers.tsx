/** Rendering the app in tests: fixed size, keys by name, and waiting for a frame. */
import { render } from 'ink-testing-library';
import { App, type AppProps } from '../../src/ui/App.js';

export const KEYS = {
  up: '\u001B[A',
  down: '\u001B[B',
  right: '\u001B[C',
  left: '\u001B[D',
  enter: '\r',
  tab: '\t',
  shiftTab: '\u001B[Z',
  escape: '\u001B',
  backspace: '\u007F',
} as const;

export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

export type Rendered = ReturnType<typeof render>;

export function renderApp(props: Partial<AppProps> = {}): Rendered {
  return render(<App size={{ columns: 80, rows: 24 }} env={{ NO_COLOR: '1' }} {...props} />);
}

export function frame(r: Rendered): string {
  return r.lastFrame() ?? '';
}

/**
 * Type keys one at a time, as a quick typist would: ink handles input asynchronously,
 * re-subscribes key handlers after each render and draws at most 30 frames a second.
 */
export async function press(r: Rendered, ...keys: string[]): Promise<void> {
  for (const k of keys) {
    r.stdin.write(k);
    await sleep(40);
  }
  await sleep(40);
}

/** Wait until the frame satisfies `ok` (engine work runs in a worker), or fail with the frame. */
export async function waitForFrame(r: Rendered, ok: (f: string) => boolean, timeoutMs = 15_000): Promise<string> {
  const t0 = Date.now();
  while (Date.now() - t0 < timeoutMs) {
    const f = frame(r);
    if (ok(f)) return f;
    await sleep(25);
  }
  throw new Error(`frame never matched within ${timeoutMs} ms; last frame:\n${frame(r)}`);
}

/** Every line fits the width and the frame fits the height. */
export function fits(f: string, columns: number, rows: number): boolean {
  const lines = f.split('\n');
  return lines.length <= rows && lines.every((l) => [...l].length <= columns);
}
