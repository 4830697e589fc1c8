/**
 * Rank mod p of sparse rows whose columns are numbers below 2^53 (orbit codes), by
 * top-reduction: a row's largest column is its lead; while some stored row leads there, the
 * row loses that column (a sparse merge), and a row left with an unclaimed lead is stored,
 * scaled to lead with 1. The stored rows keep the columns their reductions produced, which
 * stays sparse when rows arrive in the order of a Gröbner-type computation (quotient-task.ts).
 * Residues below p < 2^26, so products are exact in doubles.
 */
import { invMod } from './echelon-mod-p.js';
import { KeyTable } from './key-table.js';

type Buf = { c: Float64Array; v: Float64Array };

export class SparseEchelonModP {
  private readonly lead = new KeyTable(Infinity);
  private start = new Int32Array(1024);
  private length = new Int32Array(1024);
  private tags = new Int32Array(1024);
  private codes = new Float64Array(1 << 14);
  private vals = new Float64Array(1 << 14);
  private used = 0;
  private count = 0;
  private bufA: Buf = { c: new Float64Array(64), v: new Float64Array(64) };
  private bufB: Buf = { c: new Float64Array(64), v: new Float64Array(64) };
  private readonly invP: number;
  /** Entries merged so far (a measure of the work). */
  merged = 0;

  constructor(readonly p: number) {
    this.invP = 1 / p;
  }

  get rank(): number {
    return this.count;
  }

  /** Entries held by the stored rows. */
  get entries(): number {
    return this.used;
  }

  /** The tag of the stored row leading at `code`, or −1. */
  tagAt(code: number): number {
    const i = this.lead.get(code);
    return i < 0 ? -1 : this.tags[i]!;
  }

  /**
   * Reduce the row (codes strictly decreasing, values residues in [1, p)) and store it when
   * something is left; `tag` is kept with a stored row. Returns true when the rank grew.
   */
  insert(codes: ArrayLike<number>, vals: ArrayLike<number>, len: number, tag: number): boolean {
    if (len === 0) return false;
    const p = this.p;
    const inv = this.invP;
    let a = this.fit(this.bufA, len + 1);
    for (let i = 0; i < len; i++) {
      a.c[i] = codes[i]!;
      a.v[i] = vals[i]!;
    }
    let alen = len;
    for (;;) {
      const k = this.lead.get(a.c[0]!);
      if (k < 0) break;
      // a ← a − a[0]·(stored row k), both past their leads
      const f = p - a.v[0]!;
      const s = this.start[k]!;
      const e = s + this.length[k]!;
      let b = this.fit(this.bufB, alen + e - s);
      const pc = this.codes;
      const pv = this.vals;
      let i = 1;
      let j = s + 1;
      let o = 0;
      while (i < alen && j < e) {
        const ci = a.c[i]!;
        const cj = pc[j]!;
        if (ci > cj) {
          b.c[o] = ci;
          b.v[o++] = a.v[i++]!;
        } else if (cj > ci) {
          const x = f * pv[j++]!;
          b.c[o] = cj;
          b.v[o++] = x - Math.floor(x * inv) * p;
        } else {
          const x = a.v[i++]! + f * pv[j++]!;
          let y = x - Math.floor(x * inv) * p;
          if (y < 0) y += p;
          else if (y >= p) y -= p;
          if (y !== 0) {
            b.c[o] = ci;
            b.v[o++] = y;
          }
        }
      }
      while (i < alen) {
        b.c[o] = a.c[i]!;
        b.v[o++] = a.v[i++]!;
      }
      while (j < e) {
        const x = f * pv[j]!;
        b.c[o] = pc[j++]!;
        b.v[o++] = x - Math.floor(x * inv) * p;
      }
      this.merged += alen + e - s;
      // the floor estimate may leave a value at p or below 0 only in the equal-column case, fixed there
      for (let q = 0; q < o; q++) {
        const y = b.v[q]!;
        if (y >= p) b.v[q] = y - p;
        else if (y < 0) b.v[q] = y + p;
      }
      [this.bufA, this.bufB] = [b, a];
      a = b;
      b = this.bufB;
      alen = o;
      if (alen === 0) return false;
    }
    this.store(a, alen, tag);
    return true;
  }

  private store(a: Buf, len: number, tag: number): void {
    const p = this.p;
    const k = this.count++;
    if (k === this.start.length) {
      this.start = grow32(this.start);
      this.length = grow32(this.length);
      this.tags = grow32(this.tags);
    }
    while (this.used + len > this.codes.length) {
      this.codes = grow64(this.codes);
      this.vals = grow64(this.vals);
    }
    const s = this.used;
    const inv = invMod(a.v[0]!, p);
    for (let i = 0; i < len; i++) {
      this.codes[s + i] = a.c[i]!;
      this.vals[s + i] = (a.v[i]! * inv) % p;
    }
    this.start[k] = s;
    this.length[k] = len;
    this.tags[k] = tag;
    this.used += len;
    this.lead.set(a.c[0]!, k);
  }

  private fit(buf: Buf, size: number): Buf {
    if (buf.c.length < size) {
      let cap = buf.c.length;
      while (cap < size) cap *= 2;
      buf.c = new Float64Array(cap);
      buf.v = new Float64Array(cap);
    }
    return buf;
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
