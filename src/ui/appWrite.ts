/**
 * Writing a file from the app: atomically (src/export/atomicWrite.ts), with the refusals said
 * in the app's words — an existing file is kept unless the user pressed the overwrite key.
 */
import { existsSync, statSync } from 'node:fs';
import { InputError } from '../core/errors.js';
import { atomicWrite } from '../export/atomicWrite.js';
import { appWords } from './errorText.js';

export function appWrite(path: string, text: string, force: boolean, overwriteKey: string): void {
  if (existsSync(path)) {
    if (statSync(path).isDirectory()) throw new InputError(`${path} is a folder; give a file name`);
    if (!force) throw new InputError(`${path} exists; not overwritten (${overwriteKey} overwrites it)`);
  }
  try {
    atomicWrite(path, text, force, 'out');
  } catch (e) {
    if (e instanceof InputError) throw new InputError(appWords(e.message, 'export'));
    throw e;
  }
}
