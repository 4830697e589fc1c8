/**
 * A module request typed as the options of `gradus module` ("--seed monomial --n 3 …"):
 * parsed with the request model's own option table for modules, so it means exactly what
 * the command line means.
 */
import { moduleKind, type ModuleRequest } from '../../requests/module-request.js';
import { parseArgs } from '../../requests/options.js';
import { splitWords } from '../../requests/words.js';

export type { ModuleRequest };

export { splitWords };

/** Parse a typed request with the module request's option table (frobenius always on in the app). */
export function parseModuleRequest(line: string, cwd = process.cwd()): ModuleRequest {
  const request = moduleKind.fromArgs(parseArgs(moduleKind, splitWords(line, 'request')), cwd);
  return { ...request, frobenius: true };
}
