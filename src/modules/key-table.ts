/**
 * A map from monomial or orbit codes (integers below 2^53) to small non-negative integers: a
 * flat Int32Array when the key range is small enough (fast, no hashing), otherwise an
 * open-addressing hash table in typed arrays. (A JS Map boxes keys above 2^31 as heap
 * numbers; the typed table does not, and is several times faster on the builder's lookups.)
 */
export const DIRECT_TABLE_LIMIT = 2 ** 25;

const EMPTY = -1; // keys are ≥ 0

export class KeyTable {
  private readonly direct: Int32Array | undefined;
  /** The flat table, when used (callers in hot loops read it directly; writes go through `set`). */
  get array(): Int32Array | undefined {
    return this.direct;
  }
  private keys: Float64Array;
  private values: Int32Array;
  private mask: number;
  private count = 0;

  constructor(keyBound: number) {
    if (keyBound <= DIRECT_TABLE_LIMIT) {
      this.direct = new Int32Array(keyBound).fill(-2);
      this.keys = new Float64Array(0);
      this.values = new Int32Array(0);
      this.mask = 0;
    } else {
      this.keys = new Float64Array(1024).fill(EMPTY);
      this.values = new Int32Array(1024);
      this.mask = 1023;
    }
  }

  /** Keys set in flat mode since the last clear (to undo them without a full refill). */
  private touched: Int32Array = new Int32Array(0);
  private touchedLen = 0;

  /** Forget every key; flat tables undo only what was set (callers must set through `set`). */
  clear(): void {
    if (this.direct) {
      for (let i = 0; i < this.touchedLen; i++) this.direct[this.touched[i]!] = -2;
      this.touchedLen = 0;
      return;
    }
    // a fresh small table: refilling a grown one for every seed costs more than regrowing
    this.keys = new Float64Array(1024).fill(EMPTY);
    this.values = new Int32Array(1024);
    this.mask = 1023;
    this.count = 0;
  }

  /** Number of keys stored (hashed mode). */
  get size(): number {
    return this.count;
  }

  private slot(key: number): number {
    const lo = key >>> 0;
    const hi = (key - lo) / 4294967296;
    let h = Math.imul(lo ^ Math.imul(hi, 0x9e3779b1), 0x85ebca6b);
    h ^= h >>> 15;
    h = Math.imul(h, 0xc2b2ae35);
    h ^= h >>> 13;
    let i = h & this.mask;
    const keys = this.keys;
    while (keys[i] !== EMPTY && keys[i] !== key) i = (i + 1) & this.mask;
    return i;
  }

  /** The stored value, or −2 when absent. */
  get(key: number): number {
    if (this.direct) return this.direct[key]!;
    const i = this.slot(key);
    return this.keys[i] === key ? this.values[i]! : -2;
  }

  set(key: number, value: number): void {
    if (this.direct) {
      if (this.direct[key] === -2) {
        if (this.touchedLen === this.touched.length) {
          const grown = new Int32Array(Math.max(1024, 2 * this.touched.length));
          grown.set(this.touched);
          this.touched = grown;
        }
        this.touched[this.touchedLen++] = key;
      }
      this.direct[key] = value;
      return;
    }
    const i = this.slot(key);
    if (this.keys[i] !== key) {
      this.keys[i] = key;
      this.count++;
    }
    this.values[i] = value;
    if (2 * this.count > this.mask) this.grow();
  }

  private grow(): void {
    const oldKeys = this.keys;
    const oldValues = this.values;
    const cap = oldKeys.length * 2;
    this.keys = new Float64Array(cap).fill(EMPTY);
    this.values = new Int32Array(cap);
    this.mask = cap - 1;
    for (let j = 0; j < oldKeys.length; j++) {
      const k = oldKeys[j]!;
      if (k === EMPTY) continue;
      const i = this.slot(k);
      this.keys[i] = k;
      this.values[i] = oldValues[j]!;
    }
  }
}
