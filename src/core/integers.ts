/** Exact integer helpers on BigInt. */

const factorialCache: bigint[] = [1n];

/** n! as a BigInt (cached). */
export function factorial(n: number): bigint {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`factorial of ${n}`);
  for (let i = factorialCache.length; i <= n; i++) factorialCache.push(factorialCache[i - 1]! * BigInt(i));
  return factorialCache[n]!;
}

/** Binomial coefficient C(n, k) as a BigInt; 0 outside 0 ≤ k ≤ n. */
export function binomial(n: number, k: number): bigint {
  if (k < 0 || k > n || n < 0) return 0n;
  k = Math.min(k, n - k);
  let r = 1n;
  for (let i = 1; i <= k; i++) r = (r * BigInt(n - k + i)) / BigInt(i);
  return r;
}

export function gcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

export function abs(a: bigint): bigint {
  return a < 0n ? -a : a;
}

/** BigInt to a JSON value: a number when exactly representable (|x| ≤ 2^53), else a string. */
export function bigToJson(x: bigint): number | string {
  return x <= 9007199254740991n && x >= -9007199254740991n ? Number(x) : x.toString();
}
