/**
 * Rank mod p of sparse rows over a fixed set of columns 0..width−1, by top-reduction: a row's
 * largest column is its lead; while a stored row leads there, that stored row (scaled) is
 * subtracted, and a row left with an unclaimed lead is stored, scaled to lead with 1. The row
 * being reduced lives in a dense accumulator with a max-heap of its columns, so one step
 * costs the stored row's length (times a logarithm), not the growing row's. Stored rows keep
 * the tails their reductions produced, which stay short when rows arrive in the order of a
 * Gröbner-type computation (quotient-task.ts). Residues below p < 2^26: products are exact.
 */
import { invMod } from './echelon-mod-p.js';

export class SparseEchelonModP {
  private readonly leadRow: Int32Array;
  private start: Int32Array;
  private length: Int32Array;
  private tags: Int32Array;
  private cols: Int32Array;
  private vals: Float64Array;
  private used = 0;
  private count = 0;
  private readonly acc: Float64Array;
  private readonly inHeap: Uint8Array;
  private heap = new Int32Array(64);
  private heapLen = 0;
  private out = { c: new Int32Array(64), v: new Float64Array(64) };
  private readonly invP: number;
  /** Entries of stored rows applied so far (a measure of the work). */
  applied = 0;

  constructor(
    readonly p: number,
    readonly width: number,
  ) {
    this.invP = 1 / p;
    const rows = Math.max(16, width);
    this.start = new Int32Array(rows);
    this.length = new Int32Array(rows);
    this.tags = new Int32Array(rows);
    this.cols = new Int32Array(4 * rows);
    this.vals = new Float64Array(4 * rows);
    this.leadRow = new Int32Array(width).fill(-1);
    this.acc = new Float64Array(width);
    this.inHeap = new Uint8Array(width);
  }

  get rank(): number {
    return this.count;
  }

  /** Entries held by the stored rows. */
  get entries(): number {
    return this.used;
  }

  /** The tag of the stored row leading at `col`, or −1. */
  tagAt(col: number): number {
    const k = this.leadRow[col]!;
    return k < 0 ? -1 : this.tags[k]!;
  }

  /**
   * Reduce the row (columns distinct, any order; values residues in [0, p)) and store it when
   * something is left; `tag` is kept with a stored row. Returns true when the rank grew.
   */
  insert(cols: ArrayLike<number>, vals: ArrayLike<number>, len: number, tag: number): boolean {
    const p = this.p;
    const inv = this.invP;
    const acc = this.acc;
    for (let i = 0; i < len; i++) {
      const c = cols[i]!;
      const v = vals[i]!;
      if (v === 0) continue;
      acc[c] = v;
      this.push(c);
    }
    for (;;) {
      const lead = this.pop();
      if (lead < 0) return false;
      const a = acc[lead]!;
      if (a === 0) continue;
      const k = this.leadRow[lead]!;
      if (k < 0) {
        this.push(lead);
        this.store(tag);
        return true;
      }
      this.subtract(lead, a, k);
    }
  }

  /** acc ← acc − a·(stored row k), which leads at `lead`; the lead cancels exactly. */
  private subtract(lead: number, a: number, k: number): void {
    const p = this.p;
    const inv = this.invP;
    const acc = this.acc;
    acc[lead] = 0;
    const f = p - a;
    const s = this.start[k]!;
    const e = s + this.length[k]!;
    const pc = this.cols;
    const pv = this.vals;
    for (let j = s + 1; j < e; j++) {
      const c = pc[j]!;
      const x = acc[c]! + f * pv[j]!;
      let y = x - Math.floor(x * inv) * p;
      if (y < 0) y += p;
      else if (y >= p) y -= p;
      acc[c] = y;
      if (this.inHeap[c] === 0 && y !== 0) this.push(c);
    }
    this.applied += e - s;
  }

  /** Move the accumulator's nonzero entries (the heap holds them) into a stored row. */
  private store(tag: number): void {
    const p = this.p;
    const k = this.count++;
    if (k === this.start.length) {
      this.start = grow32(this.start);
      this.length = grow32(this.length);
      this.tags = grow32(this.tags);
    }
    let o = 0;
    let inv = 0;
    for (;;) {
      const c = this.pop();
      if (c < 0) break;
      const v = this.acc[c]!;
      if (v === 0) continue;
      this.acc[c] = 0;
      if (o === 0) inv = invMod(v, p);
      if (o === this.out.c.length) this.out = { c: grow32(this.out.c), v: grow64(this.out.v) };
      this.out.c[o] = c;
      this.out.v[o] = o === 0 ? 1 : (v * inv) % p;
      o++;
    }
    while (this.used + o > this.cols.length) {
      this.cols = grow32(this.cols);
      this.vals = grow64(this.vals);
    }
    const s = this.used;
    this.cols.set(this.out.c.subarray(0, o), s);
    this.vals.set(this.out.v.subarray(0, o), s);
    o += s;
    this.start[k] = s;
    this.length[k] = o - s;
    this.tags[k] = tag;
    this.used = o;
    this.leadRow[this.cols[s]!] = k;
  }

  private push(c: number): void {
    if (this.heapLen === this.heap.length) this.heap = grow32(this.heap);
    const h = this.heap;
    this.inHeap[c] = 1;
    let i = this.heapLen++;
    while (i > 0) {
      const up = (i - 1) >> 1;
      if (h[up]! >= c) break;
      h[i] = h[up]!;
      i = up;
    }
    h[i] = c;
  }

  /** The largest column in the heap (removed), or −1. */
  private pop(): number {
    if (this.heapLen === 0) return -1;
    const h = this.heap;
    const top = h[0]!;
    this.inHeap[top] = 0;
    const last = h[--this.heapLen]!;
    const n = this.heapLen;
    let i = 0;
    for (;;) {
      let child = 2 * i + 1;
      if (child >= n) break;
      if (child + 1 < n && h[child + 1]! > h[child]!) child++;
      if (h[child]! <= last) break;
      h[i] = h[child]!;
      i = child;
    }
    if (n > 0) h[i] = last;
    return top;
  }
}

function grow32(a: Int32Array): Int32Array<ArrayBuffer> {
  const g = new Int32Array(a.length * 2);
  g.set(a);
  return g;
}

function grow64(a: Float64Array): Float64Array<ArrayBuffer> {
  const g = new Float64Array(a.length * 2);
  g.set(a);
  return g;
}
