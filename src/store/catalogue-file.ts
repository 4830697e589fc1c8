/**
 * What is at a catalogue path, looked at before SQLite touches it: nothing (a new catalogue),
 * a catalogue of ours, or something gradus did not write (a folder, a text file, another
 * program's database), which is never opened for writing, moved or reported as "damaged".
 */
import { closeSync, openSync, readSync, statSync } from 'node:fs';
import { InputError } from '../core/errors.js';

/** Our mark in the SQLite header (PRAGMA application_id): "grad" in ASCII. */
export const GRADUS_APPLICATION_ID = 0x67726164;

const SQLITE_MAGIC = 'SQLite format 3\u0000';

export type CatalogueFile =
  | { readonly kind: 'missing' }
  | { readonly kind: 'empty' } // a file of zero bytes: nothing in it to lose
  | { readonly kind: 'sqlite'; readonly applicationId: number };

/** A file at the catalogue path that gradus did not write. */
export class ForeignFileError extends InputError {}

export function notOurs(path: string, what: string): InputError {
  return new ForeignFileError(`${path} is ${what}, not a gradus catalogue; gradus leaves it alone (give another --catalogue path)`, 'catalogue');
}

export function inspectCatalogueFile(path: string): CatalogueFile {
  let st;
  try {
    st = statSync(path);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') return { kind: 'missing' };
    if (code === 'ENOTDIR') throw new InputError(`--catalogue: a part of ${path} is a file, not a folder`, 'catalogue');
    throw new InputError(`--catalogue: cannot look at ${path} (${code ?? 'error'})`, 'catalogue');
  }
  if (st.isDirectory()) throw new InputError(`${path} is a folder; give the path of a catalogue file, such as ${path.replace(/\/$/, '')}/catalogue.sqlite`, 'catalogue');
  if (!st.isFile()) throw notOurs(path, 'not a regular file');
  if (st.size === 0) return { kind: 'empty' };
  const head = Buffer.alloc(100);
  let got = 0;
  try {
    const fd = openSync(path, 'r');
    try {
      got = readSync(fd, head, 0, 100, 0);
    } finally {
      closeSync(fd);
    }
  } catch (e) {
    throw new InputError(`--catalogue: cannot read ${path} (${(e as NodeJS.ErrnoException).code ?? 'error'})`, 'catalogue');
  }
  if (got < 100 || head.toString('latin1', 0, 16) !== SQLITE_MAGIC) throw notOurs(path, 'not an SQLite database');
  return { kind: 'sqlite', applicationId: head.readUInt32BE(68) };
}
