/**
 * The orbit representatives of the monomials of one multidegree (x-, y-, θ-degree) under a
 * Young subgroup S_μ (blocks of consecutive positions, each block acting by the trivial or
 * the sign character): monomials whose letters increase weakly inside every block, a letter
 * being (x-exponent, y-exponent, θ-bit). A representative whose orbit sum vanishes is left
 * out: two equal θ-letters in a trivial-character block, two equal θ-free letters in a
 * sign-character block (the swap of the two positions acts by −1).
 *
 * Letters are "universal" numbers u = (x·yRadix + y)·2 + t, ordered as (x, y, t)
 * lexicographically, the same in every cell; each cell renumbers its letters densely and
 * codes a representative by ranking each block's sorted letters as a multiset (the
 * combinatorial number system) in mixed radix, the last block most significant. Comparing
 * codes compares the largest letters first: the term order of the quotient route.
 */
import { LimitError } from '../core/errors.js';

export interface CellDegree {
  readonly x: number;
  readonly y: number;
  readonly theta: number;
}

export class CellOrbits {
  /** Dense letter of every universal letter (−1 outside this cell's letters). */
  private readonly dense: Int32Array;
  /** Universal letter of every dense letter. */
  private readonly universal: Int32Array;
  readonly letters: number;
  /** term[pos · letters + dense]: what a letter adds to the code at that position (positions sorted in their block). */
  private readonly term: Float64Array;
  private readonly stride: Float64Array;
  private readonly radixOf: Float64Array;
  private readonly blockStart: Int32Array;
  private readonly blockOfPos: Int32Array;
  private readonly alt: Uint8Array;
  private readonly binom: Float64Array;
  private readonly binomWidth: number;
  readonly range: number;
  /** Parity (0 or 1) of the last successful fold. */
  parity = 0;

  constructor(
    readonly n: number,
    readonly blocks: readonly number[],
    /** Per block: true for the sign character. */
    blockAlt: readonly boolean[],
    readonly yRadix: number,
    readonly degree: CellDegree,
    /** Letters with an x-exponent of at least xCap are not used (a monomial ideal ⟨x_i^xCap⟩). */
    readonly xCap = Infinity,
  ) {
    const xMax = Math.min(degree.x, xCap - 1);
    const tMax = degree.theta > 0 ? 1 : 0;
    const universalRange = (Math.max(xMax, 0) * yRadix + degree.y + 1) * 2;
    this.dense = new Int32Array(Math.max(universalRange, 2)).fill(-1);
    const uni: number[] = [];
    for (let x = 0; x <= xMax; x++)
      for (let y = 0; y <= degree.y; y++)
        for (let t = 0; t <= tMax; t++) uni.push((x * yRadix + y) * 2 + t);
    uni.forEach((u, i) => (this.dense[u] = i));
    this.universal = Int32Array.from(uni);
    const L = uni.length;
    this.letters = L;
    this.blockOfPos = new Int32Array(n);
    this.blockStart = new Int32Array(blocks.length + 1);
    this.alt = new Uint8Array(n);
    let pos = 0;
    blocks.forEach((b, i) => {
      this.blockStart[i] = pos;
      for (let j = 0; j < b; j++) {
        this.blockOfPos[pos] = i;
        this.alt[pos] = blockAlt[i] ? 1 : 0;
        pos++;
      }
    });
    this.blockStart[blocks.length] = pos;
    if (pos !== n) throw new RangeError(`blocks ${blocks.join(',')} do not sum to ${n}`);
    // binomials C(s, j) for s ≤ L + n, j ≤ n
    const W = n + 2;
    this.binomWidth = W;
    this.binom = new Float64Array((L + n + 2) * W);
    for (let s = 0; s <= L + n + 1; s++) {
      this.binom[s * W] = 1;
      for (let j = 1; j <= Math.min(s, n + 1); j++) this.binom[s * W + j] = this.binom[(s - 1) * W + j - 1]! + (j <= s - 1 ? this.binom[(s - 1) * W + j]! : 0);
    }
    this.term = new Float64Array(n * Math.max(L, 1));
    this.stride = new Float64Array(blocks.length);
    this.radixOf = new Float64Array(blocks.length);
    let stride = 1;
    blocks.forEach((b, i) => {
      const start = this.blockStart[i]!;
      for (let j = 0; j < b; j++) for (let c = 0; c < L; c++) this.term[(start + j) * L + c] = this.C(c + j, j + 1) * stride;
      this.stride[i] = stride;
      this.radixOf[i] = this.C(L + b - 1, b);
      stride *= this.radixOf[i]!;
      if (stride > Number.MAX_SAFE_INTEGER) throw new LimitError(`orbit codes of ${L} letters in ${n} positions exceed 2^53: the degree (${degree.x}, ${degree.y}, ${degree.theta}) is too large for n = ${n}`, 'n');
    });
    this.range = stride;
  }

  private C(s: number, j: number): number {
    return j > s ? 0 : this.binom[s * this.binomWidth + j]!;
  }

  /** The dense letter of a universal letter, or −1 when this cell has no such letter. */
  denseOf(u: number): number {
    return u < this.dense.length ? this.dense[u]! : -1;
  }

  /**
   * Call `visit(letters, code)` for every representative (letters: universal, by position;
   * the array is reused). Representatives come in increasing code order within each block
   * pattern, not globally sorted.
   */
  enumerate(visit: (letters: Int32Array, code: number) => void): void {
    const n = this.n;
    const { universal, term, blockOfPos, blockStart, alt, letters: L, degree } = this;
    const yR = this.yRadix;
    const out = new Int32Array(n);
    const denseAt = new Int32Array(n);
    const rec = (i: number, rx: number, ry: number, rt: number, code: number): void => {
      if (i === n) {
        if (rx === 0 && ry === 0 && rt === 0) visit(out, code);
        return;
      }
      const b = blockOfPos[i]!;
      const first = i === blockStart[b]!;
      const start = first ? 0 : denseAt[i - 1]!;
      const left = blockStart[b + 1]! - i; // positions left in this block, this one included
      for (let d = start; d < L; d++) {
        const u = universal[d]!;
        const t = u & 1;
        const xy = u >> 1;
        const y = xy % yR;
        const x = (xy - y) / yR;
        // x is weakly increasing in a block: the rest of the block needs at least x each
        if (x * left > rx) break;
        if (y > ry || t > rt) continue;
        if (!first && d === denseAt[i - 1]! && (t === 1) !== (alt[i] === 1)) continue; // orbit sum vanishes
        denseAt[i] = d;
        out[i] = u;
        rec(i + 1, rx - x, ry - y, rt - t, code + term[i * L + d]!);
      }
    };
    rec(0, degree.x, degree.y, degree.theta, 0);
  }

  /**
   * Representative code of the monomial with these universal letters (by position, each block
   * in any order); sets `parity` to the sign exponent (the character on the sorting
   * permutation, and the re-sorting of the θ's). −1 when the orbit sum vanishes or a letter
   * lies outside the cell. `work` is scratch of length n.
   */
  fold(letters: ArrayLike<number>, work: Int32Array): number {
    const { dense, term, blockStart, alt, letters: L } = this;
    let parity = 0;
    let code = 0;
    for (let b = 0; b < this.blocks.length; b++) {
      const s = blockStart[b]!;
      const e = blockStart[b + 1]!;
      const a = alt[s] === 1;
      for (let i = s; i < e; i++) {
        const u = letters[i]!;
        if (u >= dense.length || dense[u]! < 0) return -1;
        const du = dense[u]!;
        let j = i - 1;
        while (j >= s && dense[work[j]!]! > du) {
          if (a) parity ^= 1;
          if (work[j]! & u & 1) parity ^= 1;
          work[j + 1] = work[j]!;
          j--;
        }
        if (j >= s && work[j] === u && (u & 1) !== (a ? 1 : 0)) return -1;
        work[j + 1] = u;
      }
      for (let i = s; i < e; i++) code += term[i * L + dense[work[i]!]!]!;
    }
    this.parity = parity;
    return code;
  }

  /** Code of a representative whose letters (universal, sorted in blocks) all lie in this cell. */
  codeOf(letters: ArrayLike<number>): number {
    const { dense, term, letters: L } = this;
    let code = 0;
    for (let i = 0; i < this.n; i++) code += term[i * L + dense[letters[i]!]!]!;
    return code;
  }

  /**
   * fold() for a representative `rep` (sorted in blocks, code `repCode` in this cell) whose
   * letter at position i is raised to u > rep[i] (in the letter order): the letter moves right
   * inside its block, and only the positions it passes change their code terms.
   */
  foldRaised(rep: ArrayLike<number>, repCode: number, i: number, u: number): number {
    const { dense, term, letters: L, alt, blockOfPos, blockStart } = this;
    if (u >= dense.length || dense[u]! < 0) return -1;
    const du = dense[u]!;
    const end = blockStart[blockOfPos[i]! + 1]!;
    const a = alt[i] === 1;
    let code = repCode - term[i * L + dense[rep[i]!]!]!;
    let parity = 0;
    let j = i;
    // positions i+1.. whose letters are below u shift one place left
    while (j + 1 < end) {
      const w = rep[j + 1]!;
      const dw = dense[w]!;
      if (dw > du) break;
      if (dw === du) {
        if ((u & 1) !== (a ? 1 : 0)) return -1; // equal letters kill the orbit sum
        break;
      }
      code += term[j * L + dw]! - term[(j + 1) * L + dw]!;
      if (a) parity ^= 1;
      if (w & u & 1) parity ^= 1;
      j++;
    }
    this.parity = parity;
    return code + term[j * L + du]!;
  }

  /** Universal letters (by position, sorted in blocks) of a representative code. */
  decode(code: number, out: Int32Array): void {
    const { blocks, blockStart, stride, radixOf, universal } = this;
    for (let b = blocks.length - 1; b >= 0; b--) {
      const bc = Math.floor(code / stride[b]!) % radixOf[b]!;
      let rem = bc;
      const s = blockStart[b]!;
      for (let j = blocks[b]! - 1; j >= 0; j--) {
        // the largest c with C(c + j, j + 1) ≤ rem
        let lo = 0;
        let hi = this.letters - 1;
        while (lo < hi) {
          const mid = (lo + hi + 1) >> 1;
          if (this.C(mid + j, j + 1) <= rem) lo = mid;
          else hi = mid - 1;
        }
        rem -= this.C(lo + j, j + 1);
        out[s + j] = universal[lo]!;
      }
    }
  }
}
