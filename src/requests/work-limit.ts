/** A work limit as typed (`--max-work 5e9`): a positive number of the engines' work units. */
import { InputError } from '../core/errors.js';

export function parseWork(text: string | undefined, option = 'max-work'): number | undefined {
  if (text === undefined) return undefined;
  const v = Number(text);
  if (!/^\d+(\.\d+)?(e\d+)?$/i.test(text.trim()) || !Number.isFinite(v) || v <= 0) {
    throw new InputError(`--${option} must be a positive number of work units such as 5e9 (got "${text.slice(0, 40)}")`, option);
  }
  return v;
}
