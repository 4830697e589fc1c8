/**
 * Compact codes for S_μ-orbit representatives (letters weakly increasing inside every block of
 * the Young subgroup): each block's sorted letters are ranked as a multiset by the
 * combinatorial number system, and the blocks combine in mixed radix. The code range is
 * Π_blocks C(L + b − 1, b) for L letters, about L^n/|S_μ|, instead of the L^n of plain
 * monomial keys: tables indexed by codes stay small enough to be flat arrays for the large
 * subgroups that do most of the work (and n = 9 fits at all).
 *
 * Letters are the engine's (x·R + y)·2 + θ; they are first renumbered densely (no y, no θ:
 * the unused digits are dropped), which keeps their order.
 */
import { LimitError } from '../core/errors.js';
import type { SuperSpace } from './superspace.js';

export class BlockCoder {
  /** Dense letter number of every engine letter. */
  readonly dense: Int32Array;
  /** Number of dense letters. */
  readonly letters: number;
  /** term[i · letters + c]: what dense letter c at position i adds to the code, positions sorted inside their block. */
  readonly term: Float64Array;
  /** Largest code + 1. */
  readonly range: number;

  constructor(space: SuperSpace, block: Int32Array) {
    const n = space.n;
    const R = space.radix;
    const yDigits = space.hasY ? R : 1;
    const tDigits = space.hasTheta ? 2 : 1;
    this.letters = R * yDigits * tDigits;
    this.dense = new Int32Array(2 * R * R).fill(-1);
    for (let x = 0; x < R; x++)
      for (let y = 0; y < yDigits; y++)
        for (let t = 0; t < tDigits; t++) this.dense[(x * R + y) * 2 + t] = (x * yDigits + y) * tDigits + t;
    const L = this.letters;
    // binomials up to C(L + n, n); exact in doubles while the range check below passes
    const binom: number[][] = [];
    for (let s = 0; s <= L + n; s++) {
      const row = [1];
      for (let j = 1; j <= Math.min(s, n); j++) row.push(binom[s - 1]![j - 1]! + (j <= s - 1 ? binom[s - 1]![j]! : 0));
      binom.push(row);
    }
    const C = (s: number, j: number): number => (j > s ? 0 : binom[s]![j]!);
    this.term = new Float64Array(n * L);
    let stride = 1;
    let start = 0;
    while (start < n) {
      let end = start;
      while (end < n && block[end] === block[start]) end++;
      const b = end - start;
      // weakly increasing l_0 ≤ … ≤ l_{b−1} ↦ strictly increasing l_j + j ↦ Σ_j C(l_j + j, j + 1)
      for (let j = 0; j < b; j++) for (let c = 0; c < L; c++) this.term[(start + j) * L + c] = C(c + j, j + 1) * stride;
      stride *= C(L + b - 1, b);
      if (stride > Number.MAX_SAFE_INTEGER) throw new LimitError(`orbit codes for ${L} letters in ${n} positions exceed 2^53; lower n or the degrees`, 'n');
      start = end;
    }
    this.range = stride;
  }
}
