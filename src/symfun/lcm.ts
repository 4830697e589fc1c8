import { gcd } from '../core/integers.js';

/** Least common multiple of two positive integers. */
export function lcm(a: bigint, b: bigint): bigint {
  return (a / gcd(a, b)) * b;
}
