/**
 * A map from monomial or orbit codes to small non-negative integers: a flat Int32Array when the key
 * range is small enough (fast, no hashing), a Map otherwise.
 */
export const DIRECT_TABLE_LIMIT = 2 ** 25;

export class KeyTable {
  private readonly direct: Int32Array | undefined;
  /** The flat table, when used (callers in hot loops index it directly). */
  get array(): Int32Array | undefined {
    return this.direct;
  }
  private readonly map: Map<number, number> | undefined;
  constructor(keyBound: number) {
    if (keyBound <= DIRECT_TABLE_LIMIT) this.direct = new Int32Array(keyBound).fill(-2);
    else this.map = new Map();
  }
  /** The stored value, or −2 when absent. */
  get(key: number): number {
    if (this.direct) return this.direct[key]!;
    const v = this.map!.get(key);
    return v === undefined ? -2 : v;
  }
  set(key: number, value: number): void {
    if (this.direct) this.direct[key] = value;
    else this.map!.set(key, value);
  }
}
