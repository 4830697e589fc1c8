/**
 * Compositions of n (ordered sequences of positive integers summing to n), and weak
 * compositions. Generation order: lexicographic on the sequence.
 */
import { InputError } from './errors.js';
import { binomial } from './integers.js';

export type Composition = readonly number[];

/** Stream the compositions of n, optionally with exactly k parts. */
export function* compositions(n: number, k?: number): Generator<Composition> {
  if (!Number.isInteger(n) || n < 0) throw new InputError(`n must be a non-negative integer (got ${n})`, 'n');
  const a: number[] = [];
  function* rec(rest: number): Generator<Composition> {
    if (rest === 0) {
      if (k === undefined || a.length === k) yield a.slice();
      return;
    }
    if (k !== undefined && a.length >= k) return;
    for (let p = 1; p <= rest; p++) {
      a.push(p);
      yield* rec(rest - p);
      a.pop();
    }
  }
  yield* rec(n);
}

/** Number of compositions of n (into k parts when given). */
export function compositionCount(n: number, k?: number): bigint {
  if (n === 0) return k === undefined || k === 0 ? 1n : 0n;
  if (k === undefined) return 2n ** BigInt(n - 1);
  return binomial(n - 1, k - 1);
}

/** Stream weak compositions of n into exactly k non-negative parts. */
export function* weakCompositions(n: number, k: number): Generator<Composition> {
  const a: number[] = [];
  function* rec(rest: number, slots: number): Generator<Composition> {
    if (slots === 1) {
      a.push(rest);
      yield a.slice();
      a.pop();
      return;
    }
    for (let p = 0; p <= rest; p++) {
      a.push(p);
      yield* rec(rest - p, slots - 1);
      a.pop();
    }
  }
  if (k === 0) {
    if (n === 0) yield [];
    return;
  }
  yield* rec(n, k);
}

/** Descent set of a composition α: the partial sums α_1, α_1+α_2, … (excluding n). */
export function compositionToSet(a: Composition): number[] {
  const out: number[] = [];
  let s = 0;
  for (let i = 0; i < a.length - 1; i++) {
    s += a[i]!;
    out.push(s);
  }
  return out;
}

/** Inverse of compositionToSet for a subset S ⊆ [n−1]. */
export function setToComposition(n: number, set: readonly number[]): number[] {
  const sorted = [...set].sort((x, y) => x - y);
  const out: number[] = [];
  let prev = 0;
  for (const s of sorted) {
    out.push(s - prev);
    prev = s;
  }
  if (n > prev || n === 0) out.push(n - prev);
  return n === 0 ? [] : out;
}
