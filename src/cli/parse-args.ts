/** The command line's parse: the command's own options, and `--json` for every data command. */
import { parseArgs, type OptionSpec, type ParsedArgs } from '../requests/options.js';
import type { CommandSpec } from './command.js';

export const JSON_OPTION: OptionSpec = {
  name: 'json',
  type: 'flag',
  description: 'print exactly one JSON document on stdout',
};

export function optionsOf(spec: CommandSpec): OptionSpec[] {
  return spec.producesData ? [...spec.options, JSON_OPTION] : [...spec.options];
}

export function parseCommandArgs(spec: CommandSpec, argv: readonly string[]): ParsedArgs {
  return parseArgs({ ...spec, options: optionsOf(spec) }, argv);
}
