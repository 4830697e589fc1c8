/**
 * Files of a work folder are written whole: to a temporary name beside them, then renamed
 * (replace) or linked (create once, never over another writer's file). A reader on the shared
 * file system sees either nothing or the complete file.
 */
import { linkSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { environmentReason } from '../core/environment-errors.js';
import { InputError } from '../core/errors.js';

function tempBeside(path: string): string {
  return join(dirname(path), `.${basename(path)}.${process.pid}.${Date.now()}.${Math.random().toString(36).slice(2, 8)}.tmp`);
}

function failure(path: string, e: unknown): InputError {
  return new InputError(`cannot write ${path} (${environmentReason(e) ?? (e as NodeJS.ErrnoException).code ?? (e as Error).message})`);
}

/** Write `text` to `path`, replacing a file there in one step. */
export function replaceFile(path: string, text: string): void {
  const tmp = tempBeside(path);
  try {
    writeFileSync(tmp, text, { flag: 'wx' });
    renameSync(tmp, path);
  } catch (e) {
    rmSync(tmp, { force: true });
    throw failure(path, e);
  }
}

/** Create `path` with `text` unless something is there already; false when it was. */
export function createFileOnce(path: string, text: string): boolean {
  const tmp = tempBeside(path);
  try {
    writeFileSync(tmp, text, { flag: 'wx' });
    linkSync(tmp, path);
    return true;
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'EEXIST') return false;
    throw failure(path, e);
  } finally {
    rmSync(tmp, { force: true });
  }
}
