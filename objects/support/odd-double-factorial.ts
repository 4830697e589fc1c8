/** (2n−1)!! = 1·3·5·…·(2n−1) (1 for n = 0): Stirling permutations, increasing plane trees, perfect matchings of [2n]. */
export function doubleFactorialOdd(n: number): bigint {
  let r = 1n;
  for (let i = 1; i <= n; i++) r *= BigInt(2 * i - 1);
  return r;
}
