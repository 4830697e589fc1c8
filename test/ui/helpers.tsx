/**
 * Rendering the app in tests: a terminal of a given size (columns and rows as ink sees them),
 * keys by name, keys one at a time or several in one write (a burst), and waiting for a frame.
 */
import { EventEmitter } from 'node:events';
import { render } from 'ink';
import { App, type AppProps } from '../../src/ui/App.js';
import { KeyBus } from '../../src/ui/keys/keyBus.js';
import { cellWidth } from '../../src/ui/text/cellWidth.js';

export const KEYS = {
  up: '\u001B[A',
  down: '\u001B[B',
  right: '\u001B[C',
  left: '\u001B[D',
  pageUp: '\u001B[5~',
  pageDown: '\u001B[6~',
  enter: '\r',
  tab: '\t',
  shiftTab: '\u001B[Z',
  escape: '\u001B',
  backspace: '\u007F',
  ctrlC: '\u0003',
  ctrlU: '\u0015',
} as const;

export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

class TestStdout extends EventEmitter {
  constructor(
    public columns: number,
    public rows: number,
  ) {
    super();
  }
  isTTY = true;
  last = '';
  write = (frame: string): boolean => {
    this.last = frame;
    return true;
  };
}

class TestStdin extends EventEmitter {
  isTTY = true;
  private data: string | null = null;
  write = (data: string): void => {
    this.data = data;
    this.emit('readable');
  };
  read = (): string | null => {
    const d = this.data;
    this.data = null;
    return d;
  };
  setEncoding(): void {}
  setRawMode(): void {}
  resume(): void {}
  pause(): void {}
  ref(): void {}
  unref(): void {}
}

export interface Rendered {
  readonly stdin: { write(s: string): void };
  /** Keys sent but not yet handled and drawn. */
  keysPending(): number;
  lastFrame(): string;
  /** Draw the same app (same state) in a terminal of another size. */
  resize(columns: number, rows: number): void;
  unmount(): void;
  readonly exited: () => boolean;
}

export function renderApp(props: Partial<AppProps> = {}, columns = props.size?.columns ?? 80, rows = props.size?.rows ?? 24): Rendered {
  const stdout = new TestStdout(columns, rows);
  const stdin = new TestStdin();
  const bus = new KeyBus();
  const tree = (c: number, r: number) => <App env={{ NO_COLOR: '1' }} {...props} size={{ columns: c, rows: r }} keyBus={bus} />;
  const instance = render(tree(columns, rows), {
    stdout: stdout as unknown as NodeJS.WriteStream,
    stderr: new TestStdout(columns, rows) as unknown as NodeJS.WriteStream,
    stdin: stdin as unknown as NodeJS.ReadStream,
    debug: true,
    exitOnCtrlC: false,
    patchConsole: false,
  });
  let done = false;
  void instance.waitUntilExit().then(
    () => (done = true),
    () => (done = true),
  );
  return {
    stdin,
    keysPending: () => bus.pending(),
    lastFrame: () => stdout.last,
    resize(c, r) {
      stdout.columns = c;
      stdout.rows = r;
      instance.rerender(tree(c, r));
      stdout.emit('resize');
    },
    unmount: () => instance.unmount(),
    exited: () => done,
  };
}

export function frame(r: Rendered): string {
  return r.lastFrame() ?? '';
}

/**
 * Wait until every key sent has been handled and the frame has stayed the same for a few
 * looks in a row (counted in looks, not time: an engine running on this thread may hold the
 * clock still between two looks).
 */
export async function idle(r: Rendered, quietLooks = 6, timeoutMs = 15_000): Promise<string> {
  const t0 = Date.now();
  let last = frame(r);
  let quiet = 0;
  while (Date.now() - t0 < timeoutMs) {
    await sleep(25);
    const f = frame(r);
    if (f !== last || r.keysPending() > 0) {
      last = f;
      quiet = 0;
    } else if (++quiet >= quietLooks) return f;
  }
  return last;
}

/** Type keys one at a time, each after the previous one has been drawn. */
export async function press(r: Rendered, ...keys: string[]): Promise<void> {
  for (const k of keys) {
    r.stdin.write(k);
    await idle(r, 3);
  }
}

/** Send several keys in one write, as auto-repeat, a paste or a slow link delivers them. */
export async function burst(r: Rendered, ...keys: string[]): Promise<string> {
  r.stdin.write(keys.join(''));
  return idle(r);
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

/**
 * The frame fits the terminal: at most rows − 1 lines (one spare), and no line reaches the
 * last column. The app keeps that column empty, so a line as wide as the window could only
 * be one cut by the layout rather than wrapped or scrolled with a marker.
 */
export function fits(f: string, columns: number, rows: number): boolean {
  return problems(f, columns, rows).length === 0;
}

export function problems(f: string, columns: number, rows: number): string[] {
  const lines = f.split('\n');
  const out: string[] = [];
  if (lines.length > rows - 1) out.push(`${lines.length} lines for ${rows} rows`);
  lines.forEach((l, i) => {
    if (cellWidth(l) >= columns) out.push(`line ${i + 1} is ${cellWidth(l)} wide for ${columns} columns: ${l}`);
  });
  return out;
}

/** Text of a frame with wrapped lines joined (for finding a long text that was wrapped). */
export function unwrapped(f: string): string {
  return f.replace(/\s*\n\s*/g, ' ');
}
