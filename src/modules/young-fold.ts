/**
 * Folding vectors onto the (anti-)invariants of a Young subgroup S_μ (blocks of consecutive
 * positions of sizes μ_1, μ_2, …), each block with its own character. The symmetrization
 * (mode 'sym') or antisymmetrization ('alt') of a vector is fixed by its coefficients at
 * orbit representatives: monomials whose letters (x_i, y_i, θ_i) increase weakly inside
 * every block. A monomial folds to its representative with a sign (θ re-sorting, and the
 * permutation's sign for 'alt'), or to nothing when its stabilizer kills it (two equal
 * θ-letters for 'sym', two equal θ-free letters for 'alt'). Column scales |Stab| are
 * dropped: they do not change ranks.
 */
import type { SuperSpace } from './superspace.js';

export type FoldMode = 'sym' | 'alt';

/** Block index of every position for the composition `blocks`. */
export function blockOf(n: number, blocks: readonly number[]): Int32Array {
  const out = new Int32Array(n);
  let pos = 0;
  blocks.forEach((b, i) => {
    for (let j = 0; j < b; j++) out[pos++] = i;
  });
  if (pos !== n) throw new RangeError(`blocks ${blocks.join(',')} do not sum to ${n}`);
  return out;
}

export class YoungFolder {
  private readonly cache = new Map<number, number>();
  private readonly repIndex = new Map<number, number>();
  private readonly block: Int32Array;
  private readonly x: Int32Array;
  private readonly y: Int32Array;
  private readonly letters: Float64Array;
  private readonly order: Int32Array;
  private readonly altAt: Uint8Array;

  constructor(
    readonly space: SuperSpace,
    readonly blocks: readonly number[],
    readonly modes: readonly FoldMode[],
  ) {
    const n = space.n;
    this.block = blockOf(n, blocks);
    this.altAt = new Uint8Array(n);
    for (let i = 0; i < n; i++) this.altAt[i] = modes[this.block[i]!] === 'alt' ? 1 : 0;
    this.x = new Int32Array(n);
    this.y = new Int32Array(n);
    this.letters = new Float64Array(n);
    this.order = new Int32Array(n);
  }

  /** Number of representatives met so far (the column count). */
  get columns(): number {
    return this.repIndex.size;
  }

  /** 2·column + (1 when the sign is −1), or −1 when the monomial folds to nothing. */
  fold(key: number): number {
    const hit = this.cache.get(key);
    if (hit !== undefined) return hit;
    const code = this.compute(key);
    this.cache.set(key, code);
    return code;
  }

  private compute(key: number): number {
    const r = this.repOf(key);
    if (r < 0) return -1;
    const parity = r % 2;
    const rep = (r - parity) / 2;
    let col = this.repIndex.get(rep);
    if (col === undefined) {
      col = this.repIndex.size;
      this.repIndex.set(rep, col);
    }
    return 2 * col + parity;
  }

  /** 2·(representative key) + (1 when the sign is −1), or −1 when the monomial folds to nothing. Uncached. */
  repOf(key: number): number {
    const sp = this.space;
    const n = sp.n;
    const R = sp.radix;
    const mask = sp.decode(key, this.x, this.y);
    const L = this.letters;
    for (let i = 0; i < n; i++) L[i] = ((this.x[i]! * R + (sp.hasY ? this.y[i]! : 0)) * 2) + ((mask >> i) & 1);
    let parity = 0;
    // inversions inside blocks (blocks are contiguous, so only same-block pairs can invert)
    for (let i = 0; i < n; i++) {
      const alt = this.altAt[i] === 1;
      for (let j = i + 1; j < n && this.block[j] === this.block[i]; j++) {
        const li = L[i]!;
        const lj = L[j]!;
        if (li > lj) {
          if (alt) parity ^= 1;
          if (li % 2 === 1 && lj % 2 === 1) parity ^= 1;
        } else if (li === lj) {
          if ((li % 2 === 1) !== alt) return -1; // killed by the stabilizer
        }
      }
    }
    // representative: letters sorted inside each block
    const ord = this.order;
    for (let i = 0; i < n; i++) ord[i] = i;
    let start = 0;
    while (start < n) {
      let end = start;
      while (end < n && this.block[end] === this.block[start]) end++;
      for (let i = start + 1; i < end; i++) {
        const v = ord[i]!;
        let j = i - 1;
        while (j >= start && L[ord[j]!]! > L[v]!) {
          ord[j + 1] = ord[j]!;
          j--;
        }
        ord[j + 1] = v;
      }
      start = end;
    }
    let lin = 0;
    let repMask = 0;
    for (let i = 0; i < n; i++) {
      const l = L[ord[i]!]!;
      const t = l % 2;
      const xy = (l - t) / 2;
      const yv = xy % R;
      const xv = (xy - yv) / R;
      lin += xv * sp.powers[i]!;
      if (sp.hasY) lin += yv * sp.powers[n + i]!;
      if (t) repMask |= 1 << i;
    }
    return 2 * (lin * sp.maskBase + repMask) + parity;
  }
}
