/**
 * The coefficient rings of superpolynomials: F_p (residues as numbers, the fast path) and
 * Q (fraction.js in BigInt mode, for small exact runs that confirm the modular ones).
 */
import { PrimeField } from '../core/modp.js';
import { Fraction, frac } from '../core/rational.js';

export interface Coeffs<T> {
  readonly name: string;
  readonly zero: T;
  readonly one: T;
  fromInt(a: number | bigint): T;
  /** a / b for integers (b ≠ 0). */
  fromRatio(a: bigint, b: bigint): T;
  add(a: T, b: T): T;
  sub(a: T, b: T): T;
  mul(a: T, b: T): T;
  neg(a: T): T;
  inv(a: T): T;
  isZero(a: T): boolean;
  equals(a: T, b: T): boolean;
  format(a: T): string;
}

export function primeCoeffs(p: number): Coeffs<number> {
  const F = new PrimeField(p);
  return {
    name: `F_${p}`,
    zero: 0,
    one: 1,
    fromInt: (a) => F.reduce(a),
    fromRatio: (a, b) => F.mul(F.reduce(a), F.inv(F.reduce(b))),
    add: (a, b) => F.add(a, b),
    sub: (a, b) => F.sub(a, b),
    mul: (a, b) => F.mul(a, b),
    neg: (a) => F.neg(a),
    inv: (a) => F.inv(a),
    isZero: (a) => a === 0,
    equals: (a, b) => a === b,
    format: (a) => String(F.lift(a)),
  };
}

export const rationalCoeffs: Coeffs<Fraction> = {
  name: 'Q',
  zero: frac(0),
  one: frac(1),
  fromInt: (a) => frac(a),
  fromRatio: (a, b) => frac(a, b),
  add: (a, b) => a.add(b),
  sub: (a, b) => a.sub(b),
  mul: (a, b) => a.mul(b),
  neg: (a) => a.neg(),
  inv: (a) => a.inverse(),
  isZero: (a) => a.n === 0n,
  equals: (a, b) => a.equals(b),
  format: (a) => a.toFraction(),
};
