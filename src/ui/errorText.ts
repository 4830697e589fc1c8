/**
 * One clear line for any error an engine throws: user errors (InputError, LimitError) as
 * they are, anything else labelled as an internal error. Never a stack trace.
 */
import { isUserError } from '../core/errors.js';

export function errorText(e: unknown): string {
  if (isUserError(e)) return e.message.split('\n')[0] ?? e.message;
  const msg = e instanceof Error ? e.message : String(e);
  return `internal error (a bug in gradus, please report it): ${msg.split('\n')[0] ?? ''}`;
}
