/**
 * `gradus app` (and `gradus` with no command): the terminal app, opened on its demo
 * session. Without a terminal on stdin and stdout (a pipe, CI) it prints the demo as
 * text, computed live, and ends.
 */
import { InputError } from '../../core/errors.js';
import { unknownNameMessage } from '../../core/suggest.js';
import { SCREENS, type ScreenId } from '../../ui/screens.js';
import { strOpt, type CommandSpec } from '../command.js';

export const appCommand: CommandSpec = {
  name: 'app',
  summary: 'the terminal app (the default when no command is given); text demo when not in a terminal',
  usage: 'app [--screen NAME] [--session FILE] [--text]',
  options: [
    { name: 'screen', type: 'string', description: `screen to open on: ${SCREENS.map((s) => s.id).join(', ')}`, placeholder: 'NAME' },
    { name: 'session', type: 'string', description: 'a session file to open (and to save to: w on the Export screen, or on quitting)', placeholder: 'FILE' },
    { name: 'text', type: 'flag', description: 'print the demo session as text instead of opening the app' },
  ],
  producesData: false,
  async run(args, io) {
    const name = strOpt(args, 'screen');
    if (name !== undefined && !SCREENS.some((s) => s.id === name)) {
      throw new InputError(`app: ${unknownNameMessage('screen', name, SCREENS.map((s) => s.id))}`, 'screen');
    }
    const interactive = Boolean(process.stdin.isTTY) && Boolean(process.stdout.isTTY);
    if (!interactive || args.options['text'] === true) {
      const { textDemo } = await import('../../ui/demo/textDemo.js');
      await textDemo(io.out, io.env);
      return;
    }
    // Loaded only here: ink and React stay out of every other command's start-up.
    const { runApp } = await import('../../ui/runApp.js');
    const session = strOpt(args, 'session');
    await runApp({ initialScreen: name as ScreenId | undefined, cwd: io.cwd, env: io.env, ...(session !== undefined ? { sessionFile: session } : {}) });
  },
};
