/**
 * Runs the app in the terminal: switches to the alternate screen (so the shell's text is
 * back after quitting), keeps console output from breaking the frame, and resolves when
 * the user quits (q or Ctrl+C, confirmed when results are not saved).
 */
import { render } from 'ink';
import { App } from './App.js';
import { errorText } from './errorText.js';
import type { ScreenId } from './screens.js';

export async function runApp(options: { readonly initialScreen?: ScreenId; readonly cwd: string; readonly env: Readonly<Record<string, string | undefined>>; readonly sessionFile?: string }): Promise<void> {
  const out = process.stdout;
  const alt = Boolean(out.isTTY);
  // React reports errors caught by a screen's boundary on console.error with a stack;
  // the boundary already shows the message, so keep the trace off the terminal.
  const consoleError = console.error;
  console.error = () => {};
  if (alt) out.write('\x1b[?1049h\x1b[H');
  // Last resort: anything that escapes the screens ends the app with one line, no trace.
  const fatal = (e: unknown) => {
    if (alt) out.write('\x1b[?1049l');
    process.stderr.write(`gradus: ${errorText(e)}\n`);
    process.exit(1);
  };
  process.on('uncaughtException', fatal);
  process.on('unhandledRejection', fatal);
  try {
    // Ctrl+C is the app's own key: it asks before discarding results that are not saved.
    const instance = render(<App env={options.env} cwd={options.cwd} initialScreen={options.initialScreen} sessionFile={options.sessionFile} />, {
      exitOnCtrlC: false,
      patchConsole: true,
    });
    await instance.waitUntilExit();
  } finally {
    process.off('uncaughtException', fatal);
    process.off('unhandledRejection', fatal);
    if (alt) out.write('\x1b[?1049l');
    console.error = consoleError;
  }
}
