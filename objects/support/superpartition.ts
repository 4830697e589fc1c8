/**
 * Superpartition helpers: counting strict fermionic parts, uniform sampling, and the
 * diagram (rows of Λ⊛ with circles ending the fermionic rows; a fermionic row sits above the
 * bosonic rows of its length, so that Λ⊛ and Λ* are both partitions), as in Desrosiers–Lapointe–Mathieu, "Classical symmetric
 * functions in superspace", J. Algebraic Combin. 24 (2006) §2.
 */
import type { Superpartition } from '../types.js';
import { weightedIndex } from './random.js';

const distinctMemo = new Map<string, bigint>();

/** Partitions of a into exactly j distinct positive parts. */
export function distinctParts(a: number, j: number): bigint {
  if (a < 0 || j < 0) return 0n;
  if (j === 0) return a === 0 ? 1n : 0n;
  const key = `${a},${j}`;
  let v = distinctMemo.get(key);
  if (v === undefined) {
    // All parts > 1 (take one from each), or the smallest is 1 (drop it, take one from the rest).
    v = distinctParts(a - j, j) + distinctParts(a - j, j - 1);
    distinctMemo.set(key, v);
  }
  return v;
}

/** Strictly decreasing tuples of m non-negative parts with sum a (a part 0 allowed). */
export function fermionicCount(a: number, m: number): bigint {
  return distinctParts(a, m) + distinctParts(a, m - 1);
}

/** A uniform partition of a into j distinct positive parts (decreasing), by the recursion above. */
function randomDistinct(a: number, j: number, random: () => number): number[] {
  if (j === 0) return [];
  const w = [distinctParts(a - j, j), distinctParts(a - j, j - 1)];
  if (weightedIndex(random, w) === 0) return randomDistinct(a - j, j, random).map((x) => x + 1);
  return [...randomDistinct(a - j, j - 1, random).map((x) => x + 1), 1];
}

/** A uniform strictly decreasing tuple of m non-negative parts with sum a. */
export function randomFermionic(a: number, m: number, random: () => number): number[] {
  if (weightedIndex(random, [distinctParts(a, m), distinctParts(a, m - 1)]) === 0) return randomDistinct(a, m, random);
  return [...randomDistinct(a, m - 1, random), 0];
}

/** Rows of the diagram top-down: length (without circle) and whether the row ends with a circle. */
export function diagramRows(s: Superpartition): { length: number; circle: boolean }[] {
  const rows = [...s.fermionic.map((f) => ({ length: f, circle: true })), ...s.bosonic.map((b) => ({ length: b, circle: false }))];
  // Longer rows first; among equal lengths the circled row comes first.
  return rows.sort((x, y) => y.length - x.length || Number(y.circle) - Number(x.circle));
}

/** Notation (Λ_1, …, Λ_m; Λ_{m+1}, …). */
export function superpartitionText(s: Superpartition): string {
  return `(${s.fermionic.join(',')};${s.bosonic.join(',')})`;
}
