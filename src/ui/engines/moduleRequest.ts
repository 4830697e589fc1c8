/**
 * A module request typed as the options of `gradus module` ("--seed monomial --n 3 …"):
 * parsed with that command's own option table, then turned into the engine's ModuleSpec.
 */
import { moduleCommand } from '../../cli/commands/module.js';
import { moduleRequestFromArgs, type ModuleRequest } from '../../cli/module-request.js';
import { parseArgs } from '../../cli/parse-args.js';

export type { ModuleRequest };

/** Split a line into words; "double quotes" keep spaces (for --poly). */
export function splitWords(line: string): string[] {
  const words: string[] = [];
  const re = /"([^"]*)"|(\S+)/g;
  for (let m = re.exec(line); m; m = re.exec(line)) words.push(m[1] ?? m[2]!);
  return words;
}

/** Parse a typed request with the module command's own option table and mapping. */
export function parseModuleRequest(line: string): ModuleRequest {
  return moduleRequestFromArgs(parseArgs(moduleCommand, splitWords(line)));
}
