/**
 * Write a file atomically: to a temporary file beside it, then rename over it. An existing
 * file is kept unless `force` is set (InputError naming --force).
 */
import { existsSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { InputError } from '../core/errors.js';

export function atomicWrite(path: string, text: string, force: boolean, option = 'out'): void {
  if (existsSync(path) && !force) {
    throw new InputError(`${path} exists; not overwritten (add --force to replace it)`, option);
  }
  if (!existsSync(dirname(path))) throw new InputError(`--${option}: the folder ${dirname(path)} does not exist`, option);
  const tmp = join(dirname(path), `.${basename(path)}.${process.pid}.${Date.now()}.tmp`);
  try {
    writeFileSync(tmp, text);
    renameSync(tmp, path);
  } catch (e) {
    rmSync(tmp, { force: true });
    throw new InputError(`--${option}: cannot write ${path} (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`, option);
  }
}
