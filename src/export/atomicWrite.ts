/**
 * Write a file atomically: to a temporary file beside it, then rename over it. An existing
 * file is kept unless `force` is set (InputError naming --force); a folder is never a file
 * to write; a full disk or a read-only folder is one clear line.
 */
import { accessSync, constants, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { InputError } from '../core/errors.js';

/** Check before any work that `path` can be written: not a folder, kept unless forced, its folder present and writable. */
export function checkWritable(path: string, force: boolean, option = 'out'): void {
  if (/[/\\]$/.test(path)) throw new InputError(`--${option}: ${path} names a folder; give a file name`, option);
  let st;
  try {
    st = statSync(path);
  } catch {
    st = undefined;
  }
  if (st?.isDirectory()) throw new InputError(`--${option}: ${path} is a folder; give a file name`, option);
  if (st && !force) throw new InputError(`${path} exists; not overwritten (add --force to replace it)`, option);
  if (st && !st.isFile()) throw new InputError(`--${option}: ${path} is not a regular file`, option);
  const dir = dirname(path);
  let ds;
  try {
    ds = statSync(dir);
  } catch {
    throw new InputError(`--${option}: the folder ${dir} does not exist`, option);
  }
  if (!ds.isDirectory()) throw new InputError(`--${option}: ${dir} is not a folder`, option);
  try {
    accessSync(dir, constants.W_OK);
  } catch {
    throw new InputError(`--${option}: the folder ${dir} is read-only`, option);
  }
}

export function atomicWrite(path: string, text: string, force: boolean, option = 'out'): void {
  checkWritable(path, force, option);
  const tmp = join(dirname(path), `.${basename(path)}.${process.pid}.${Date.now()}.tmp`);
  try {
    writeFileSync(tmp, text);
    renameSync(tmp, path);
  } catch (e) {
    rmSync(tmp, { force: true });
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOSPC' ? 'the disk is full' : code === 'EACCES' || code === 'EPERM' ? 'permission denied' : code === 'EROFS' ? 'the file system is read-only' : (code ?? (e as Error).message);
    throw new InputError(`--${option}: cannot write ${path} (${why})`, option);
  }
}
