/**
 * The demo's seed, a family of our own: the staircase monomial x1^(n−1) x2^(n−2) … x_(n−1)
 * with θ on the last variable (whose x-exponent is 0), antisymmetrized — for n = 3,
 * ε(x1^2 x2 θ3). It is not one of the named seeds (Vandermonde, δ_{n,k}, θ-staircase),
 * whose θ's sit on the positions of highest x-exponent or replace the staircase.
 */

export const DEMO_NS: readonly number[] = [2, 3, 4];
export const DEMO_SHOWN_N = 3;
export const DEMO_OPS = 'x,theta';

export function demoExponents(n: number): number[] {
  return Array.from({ length: n }, (_, i) => n - 1 - i);
}

/** The request in the options of `gradus module`. */
export function demoRequest(n: number): string {
  return `--seed monomial --n ${n} --x-exponents ${demoExponents(n).join(',')} --theta ${n} --ops ${DEMO_OPS}`;
}

/** ε(x1^2 x2 θ3) and the like. */
export function demoSeedText(n: number): string {
  const xs = demoExponents(n)
    .map((e, i) => (e === 0 ? '' : e === 1 ? `x${i + 1}` : `x${i + 1}^${e}`))
    .filter((s) => s !== '');
  return `ε(${[...xs, `θ${n}`].join(' ')})`;
}
