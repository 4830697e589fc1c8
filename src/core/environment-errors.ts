/**
 * Failures of the machine (file system, SQLite) rather than of gradus or its input, turned
 * into one clear line (InputError, exit 2): disk full, read-only, busy, unreadable. Anything
 * else is left as it is (a bug).
 */
import { InputError } from './errors.js';

const WHY: Readonly<Record<string, string>> = {
  SQLITE_FULL: 'the disk is full',
  ENOSPC: 'the disk is full',
  SQLITE_READONLY: 'the catalogue is read-only',
  SQLITE_READONLY_DIRECTORY: 'its folder is read-only',
  SQLITE_READONLY_DBMOVED: 'the file was moved while open',
  EROFS: 'the file system is read-only',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  SQLITE_CANTOPEN: 'the file cannot be opened',
  SQLITE_BUSY: 'another gradus is writing it (waited 10 s)',
  SQLITE_LOCKED: 'another gradus is writing it',
  SQLITE_IOERR: 'an input/output error',
  EIO: 'an input/output error',
  SQLITE_PERM: 'permission denied',
};

function codeOf(e: unknown): string | undefined {
  const code = (e as { code?: unknown } | null)?.code;
  return typeof code === 'string' ? code : undefined;
}

/** The reason for an environment failure, or undefined when e is something else. */
export function environmentReason(e: unknown): string | undefined {
  const code = codeOf(e);
  if (!code) return undefined;
  return WHY[code] ?? (code.startsWith('SQLITE_IOERR') ? 'an input/output error' : code.startsWith('SQLITE_READONLY') ? 'the catalogue is read-only' : code.startsWith('SQLITE_CANTOPEN') ? 'the file cannot be opened' : undefined);
}

/** Run fn; an environment failure becomes an InputError saying what `doing` could not do and why. */
export function guarded<T>(doing: string, fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    const why = environmentReason(e);
    if (why) throw new InputError(`${doing}: ${why}`, 'catalogue');
    throw e;
  }
}
