import { VERSION } from '../../version.js';
import type { CommandSpec } from '../command.js';
import { toJsonText } from '../../core/json-text.js';

export const versionCommand: CommandSpec = {
  name: 'version',
  summary: 'print the version of gradus',
  usage: 'version [--json]',
  options: [],
  producesData: true,
  run(args, io) {
    io.out(args.options['json'] ? toJsonText({ version: VERSION, node: process.version }) : VERSION);
  },
};
