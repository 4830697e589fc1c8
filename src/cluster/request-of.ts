/** The typed request of a module or quotient plan, read back from its canonical key. */
import { InputError } from '../core/errors.js';
import { requestFromWords, type ModuleRequest, type QuotientRequest } from '../requests/index.js';
import { splitWords } from '../requests/words.js';
import type { Manifest } from './manifest.js';

export function requestOf(m: Manifest, cwd: string): ModuleRequest | QuotientRequest {
  if (m.kind === 'catalogue') throw new InputError('a catalogue plan has no data request', 'folder');
  const r = requestFromWords(splitWords(m.key, 'folder'), cwd, 'folder');
  if (r.kind !== m.kind) throw new InputError(`the plan's request is a ${r.kind}, not a ${m.kind}`, 'folder');
  return r as ModuleRequest | QuotientRequest;
}
