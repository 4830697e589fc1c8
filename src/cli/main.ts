/**
 * Entry of the command line: dispatches to a command, turns user errors into one line
 * on stderr with exit code 2, and internal errors into exit code 1.
 */
import { isUserError } from '../core/errors.js';
import { unknownNameMessage } from '../core/suggest.js';
import { VERSION } from '../version.js';
import type { CommandIO } from './command.js';
import { COMMAND_NAMES, loadAllCommands, loadCommand } from './commands/index.js';
import { commandHelp, mainHelp } from './help.js';
import { parseCommandArgs } from './parse-args.js';
import { environmentReason } from '../core/environment-errors.js';
import { stderrProgress } from './progress.js';

/** A message on one line: its line breaks become "; " (a multi-line error keeps every part). */
function oneLine(text: string): string {
  return text.split(/\r?\n/).map((l) => l.trim()).filter(Boolean).join('; ');
}

export function defaultIO(): CommandIO {
  return {
    out: (s) => process.stdout.write(s + '\n'),
    err: (s) => process.stderr.write(s + '\n'),
    progress: stderrProgress((s) => process.stderr.write(s), Boolean(process.stderr.isTTY)),
    env: process.env,
    cwd: process.cwd(),
  };
}

/** Run the command line on argv (without node and script); resolves to the exit code. */
export async function main(argv: readonly string[], io: CommandIO = defaultIO()): Promise<number> {
  const [name, ...rest] = argv;
  try {
    if (name === undefined) {
      // No command: the terminal app on its demo session, or the text demo without it.
      const start = (await loadCommand('app')) ?? (await loadCommand('demo'));
      if (!start) {
        io.out(mainHelp(await loadAllCommands(), VERSION));
        return 0;
      }
      await start.run({ positionals: [], options: {} }, io);
      return 0;
    }
    if (name === '--help' || name === '-h' || name === 'help') {
      const target = rest[0] ? await loadCommand(rest[0]) : undefined;
      io.out(target ? commandHelp(target) : mainHelp(await loadAllCommands(), VERSION));
      return 0;
    }
    if (name === '--version') {
      io.out(VERSION);
      return 0;
    }
    const spec = await loadCommand(name);
    if (!spec) {
      io.err(`gradus: ${unknownNameMessage('command', name, COMMAND_NAMES)}; see gradus --help`);
      return 2;
    }
    if (rest.includes('--help') || rest.includes('-h')) {
      io.out(commandHelp(spec));
      return 0;
    }
    const args = parseCommandArgs(spec, rest);
    await spec.run(args, io);
    return 0;
  } catch (e) {
    io.progress.finish();
    if (isUserError(e)) {
      io.err(`gradus: ${oneLine(e.message)}`);
      return 2;
    }
    // the machine, not gradus: a full disk, a read-only place, a file that cannot be read
    const why = environmentReason(e);
    if (why) {
      io.err(`gradus: ${why}${(e as { path?: string }).path ? ` (${(e as { path?: string }).path})` : ''}: ${oneLine((e as Error).message ?? String(e))}`);
      return 2;
    }
    const msg = e instanceof Error ? e.message : String(e);
    io.err(`gradus: internal error (a bug in gradus, please report it): ${msg.split('\n')[0]}`);
    if (io.env['GRADUS_DEBUG'] && e instanceof Error && e.stack) io.err(e.stack);
    return 1;
  }
}
