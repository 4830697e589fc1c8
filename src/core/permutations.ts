/**
 * Permutations in one-line notation on 1..n: w[i−1] = w(i).
 */
import { InputError } from './errors.js';

export type Perm = readonly number[];

export function checkPermutation(w: readonly number[], name = 'permutation'): Perm {
  const seen = new Uint8Array(w.length + 1);
  for (const x of w) {
    if (!Number.isInteger(x) || x < 1 || x > w.length || seen[x]) {
      throw new InputError(`${name} must list each of 1..${w.length} once (got ${w.join(',')})`, name);
    }
    seen[x] = 1;
  }
  return w;
}

export function identity(n: number): number[] {
  return Array.from({ length: n }, (_, i) => i + 1);
}

export function inverse(w: Perm): number[] {
  const out = new Array<number>(w.length);
  w.forEach((x, i) => (out[x - 1] = i + 1));
  return out;
}

/** (u ∘ v)(i) = u(v(i)). */
export function compose(u: Perm, v: Perm): number[] {
  return v.map((x) => u[x - 1]!);
}

/** Cycle type as a partition (weakly decreasing). */
export function cycleType(w: Perm): number[] {
  const seen = new Uint8Array(w.length);
  const out: number[] = [];
  for (let i = 0; i < w.length; i++) {
    if (seen[i]) continue;
    let len = 0;
    for (let j = i; !seen[j]; j = w[j]! - 1) {
      seen[j] = 1;
      len++;
    }
    out.push(len);
  }
  return out.sort((a, b) => b - a);
}

/** Sign (+1 or −1): (−1)^(n − number of cycles). */
export function sign(w: Perm): 1 | -1 {
  return (w.length - cycleType(w).length) % 2 === 0 ? 1 : -1;
}

/** Next permutation in lexicographic order in place; false after the last one. */
export function nextPermutation(a: number[]): boolean {
  let i = a.length - 2;
  while (i >= 0 && a[i]! >= a[i + 1]!) i--;
  if (i < 0) return false;
  let j = a.length - 1;
  while (a[j]! <= a[i]!) j--;
  [a[i], a[j]] = [a[j]!, a[i]!];
  for (let l = i + 1, r = a.length - 1; l < r; l++, r--) [a[l], a[r]] = [a[r]!, a[l]!];
  return true;
}

/** Stream all permutations of 1..n in lexicographic order (each yielded array is fresh). */
export function* permutations(n: number): Generator<Perm> {
  if (!Number.isInteger(n) || n < 0) throw new InputError(`n must be a non-negative integer (got ${n})`, 'n');
  const a = identity(n);
  do yield a.slice();
  while (nextPermutation(a));
}

/** A permutation of the given cycle type: cycles (1..λ1)(λ1+1..)… */
export function permutationOfType(l: readonly number[]): number[] {
  const n = l.reduce((s, x) => s + x, 0);
  const w = new Array<number>(n);
  let start = 0;
  for (const len of l) {
    for (let i = 0; i < len; i++) w[start + i] = start + ((i + 1) % len) + 1;
    start += len;
  }
  return w;
}
