/** Exact rationals (fraction.js, BigInt mode) and helpers around them. */
import Fraction from 'fraction.js';
import { ArithmeticError } from './errors.js';

export { Fraction };

export function frac(n: bigint | number, d: bigint | number = 1n): Fraction {
  if (BigInt(d) === 0n) throw new ArithmeticError('division by zero');
  return new Fraction(BigInt(n), BigInt(d));
}

/** Signed numerator (fraction.js keeps the sign apart). */
export function numerator(f: Fraction): bigint {
  return f.s * f.n;
}

export function denominator(f: Fraction): bigint {
  return f.d;
}

/** The integer value of f, or throws ArithmeticError if f is not an integer. */
export function toBigIntExact(f: Fraction): bigint {
  if (f.d !== 1n) throw new ArithmeticError(`${f.toFraction()} is not an integer`);
  return f.s * f.n;
}
