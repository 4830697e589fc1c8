/**
 * Typed errors. The command line turns InputError and LimitError into one line on
 * stderr and exit code 2; anything else is a bug (exit 1).
 */

/** Bad input from the user: the message names the argument and the allowed range. */
export class InputError extends Error {
  override readonly name = 'InputError';
  constructor(message: string, readonly argument?: string) {
    super(message);
  }
}

/** Work that would be too large; the message names the size and the option raising the limit. */
export class LimitError extends Error {
  override readonly name = 'LimitError';
  constructor(message: string, readonly option?: string) {
    super(message);
  }
}

/** An arithmetic operation that has no exact answer (e.g. a division with remainder). */
export class ArithmeticError extends InputError {
  constructor(message: string) {
    super(message);
  }
}

export function isUserError(e: unknown): e is InputError | LimitError {
  return e instanceof InputError || e instanceof LimitError;
}

/** Check an integer argument against a range; throws InputError naming the argument. */
export function checkInt(name: string, value: unknown, min: number, max: number): number {
  const v = typeof value === 'string' && /^-?\d+$/.test(value.trim()) ? Number(value) : value;
  if (typeof v !== 'number' || !Number.isInteger(v) || v < min || v > max) {
    throw new InputError(`${name} must be an integer from ${min} to ${max} (got ${String(value)})`, name);
  }
  return v;
}
