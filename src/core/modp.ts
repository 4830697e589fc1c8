/**
 * Arithmetic in a prime field F_p with p < 2^26, so that a product of two residues stays
 * below 2^52 and is exact in a double: (a * b) % p needs no BigInt.
 */
import { InputError } from './errors.js';

/** Primes just below 2^26 (each checked by trial division in the tests), largest first. */
export const PRIMES: readonly number[] = [67108859, 67108837, 67108819, 67108777, 67108763, 67108757];

/** The default prime and the one used to confirm a result. */
export const DEFAULT_PRIME = PRIMES[0]!;
export const CONFIRM_PRIME = PRIMES[1]!;

export const MAX_PRIME = 2 ** 26;

export class PrimeField {
  constructor(readonly p: number) {
    if (!Number.isInteger(p) || p < 2 || p >= MAX_PRIME || !isPrime(p)) {
      throw new InputError(`prime must be a prime below 2^26 (got ${p})`, 'prime');
    }
  }
  /** Reduce any integer (number or bigint) into [0, p). */
  reduce(a: number | bigint): number {
    if (typeof a === 'bigint') {
      const r = Number(a % BigInt(this.p));
      return r < 0 ? r + this.p : r;
    }
    const r = a % this.p;
    return r < 0 ? r + this.p : r + 0; // + 0 turns −0 into 0
  }
  add(a: number, b: number): number {
    const s = a + b;
    return s >= this.p ? s - this.p : s;
  }
  sub(a: number, b: number): number {
    const s = a - b;
    return s < 0 ? s + this.p : s;
  }
  neg(a: number): number {
    return a === 0 ? 0 : this.p - a;
  }
  mul(a: number, b: number): number {
    return (a * b) % this.p;
  }
  /** Inverse by the extended Euclidean algorithm; throws on 0. */
  inv(a: number): number {
    if (a === 0) throw new RangeError('inverse of 0 in F_p');
    let [r0, r1] = [this.p, a];
    let [s0, s1] = [0, 1];
    while (r1 !== 0) {
      const qt = Math.floor(r0 / r1);
      [r0, r1] = [r1, r0 - qt * r1];
      [s0, s1] = [s1, s0 - qt * s1];
    }
    return s0 < 0 ? s0 + this.p : s0;
  }
  pow(a: number, e: number): number {
    let r = 1;
    let b = a % this.p;
    while (e > 0) {
      if (e & 1) r = this.mul(r, b);
      b = this.mul(b, b);
      e = Math.floor(e / 2);
    }
    return r;
  }
  /** Symmetric lift of a residue to an integer in (−p/2, p/2]. */
  lift(a: number): number {
    return a > this.p / 2 ? a - this.p : a;
  }
}

/** Deterministic primality by trial division (fine for p < 2^26). */
export function isPrime(n: number): boolean {
  if (n < 2 || !Number.isInteger(n)) return false;
  if (n % 2 === 0) return n === 2;
  for (let d = 3; d * d <= n; d += 2) if (n % d === 0) return false;
  return true;
}
