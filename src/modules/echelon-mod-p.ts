/**
 * Rank mod p by semi-echelon elimination: each stored row has a leading 1 at its pivot
 * column and zeros at the pivot columns of the rows stored before it, so a vector is
 * reduced by one pass over the rows in insertion order. Rows are dense Float64Arrays
 * (residues below p < 2^26, so (p − a)·b + c < 2^53 stays exact); the column count may
 * grow while vectors arrive. Ranks over F_p are lower bounds of ranks over Q.
 */
export class EchelonModP {
  private rows: Float64Array[] = [];
  private pivotCols: number[] = [];
  private width: number;
  private work: Float64Array;
  private isPivot: Uint8Array;
  private readonly invP: number;

  constructor(
    readonly p: number,
    width = 16,
  ) {
    this.width = Math.max(1, width);
    this.invP = 1 / p;
    this.work = new Float64Array(this.width);
    this.isPivot = new Uint8Array(this.width);
  }

  get rank(): number {
    return this.rows.length;
  }

  get columns(): number {
    return this.width;
  }

  /** The stored rows (leading 1 at pivotColumn(i)). */
  row(i: number): Float64Array {
    return this.rows[i]!;
  }
  pivotColumn(i: number): number {
    return this.pivotCols[i]!;
  }

  /** Make room for columns below `width`. */
  ensureWidth(width: number): void {
    if (width <= this.width) return;
    let w = this.width;
    while (w < width) w *= 2;
    this.rows = this.rows.map((r) => {
      const g = new Float64Array(w);
      g.set(r);
      return g;
    });
    const work = new Float64Array(w);
    this.work = work;
    const piv = new Uint8Array(w);
    piv.set(this.isPivot);
    this.isPivot = piv;
    this.width = w;
  }

  /**
   * Reduce the sparse vector (cols[i], vals[i]) for i < len (duplicate columns add up) and
   * store it when independent. Returns true when the rank grew.
   */
  insert(cols: ArrayLike<number>, vals: ArrayLike<number>, len: number): boolean {
    const p = this.p;
    let maxCol = -1;
    for (let i = 0; i < len; i++) if (cols[i]! > maxCol) maxCol = cols[i]!;
    if (maxCol < 0) return false;
    this.ensureWidth(maxCol + 1);
    const w = this.work;
    w.fill(0);
    let any = false;
    for (let i = 0; i < len; i++) {
      let v = vals[i]! % p;
      if (v === 0) continue;
      if (v < 0) v += p;
      const c = cols[i]!;
      w[c] = (w[c]! + v) % p;
      any = true;
    }
    if (!any) return false;
    return this.reduceAndStore(w);
  }

  /** Same as insert, for a dense vector of residues (copied). */
  insertDense(v: ArrayLike<number>): boolean {
    this.ensureWidth(v.length);
    const w = this.work;
    w.fill(0);
    for (let i = 0; i < v.length; i++) w[i] = v[i]!;
    return this.reduceAndStore(w);
  }

  private reduceAndStore(w: Float64Array): boolean {
    const p = this.p;
    const width = this.width;
    const rows = this.rows;
    const pcs = this.pivotCols;
    for (let r = 0; r < rows.length; r++) {
      const a = w[pcs[r]!]!;
      if (a === 0) continue;
      const row = rows[r]!;
      const m = p - a;
      const inv = this.invP;
      for (let j = pcs[r]!; j < width; j++) {
        const b = row[j]!;
        if (b === 0) continue;
        // x < 2^53 exactly; the floor estimate may be off by one, fixed below (much faster than %)
        const x = w[j]! + m * b;
        const y = x - Math.floor(x * inv) * p;
        w[j] = y < 0 ? y + p : y >= p ? y - p : y;
      }
      // entries left of the pivot column are zero in every stored row by construction
    }
    let lead = -1;
    for (let j = 0; j < width; j++) {
      if (w[j] !== 0) {
        lead = j;
        break;
      }
    }
    if (lead < 0) return false;
    const inv = invMod(w[lead]!, p);
    const row = new Float64Array(width);
    for (let j = lead; j < width; j++) {
      const b = w[j]!;
      if (b !== 0) row[j] = (b * inv) % p;
    }
    rows.push(row);
    pcs.push(lead);
    this.isPivot[lead] = 1;
    return true;
  }
}

export function invMod(a: number, p: number): number {
  let [r0, r1] = [p, a % p];
  let [s0, s1] = [0, 1];
  while (r1 !== 0) {
    const q = Math.floor(r0 / r1);
    [r0, r1] = [r1, r0 - q * r1];
    [s0, s1] = [s1, s0 - q * s1];
  }
  if (r0 !== 1) throw new RangeError(`${a} is not invertible mod ${p}`);
  return s0 < 0 ? s0 + p : s0;
}
