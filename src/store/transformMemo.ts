/**
 * Tells whether a transform gave the same object as on the previous call, by a flat copy of
 * its numbers (the object itself may be a reused buffer). A gate that rarely sees repeats in
 * its first objects closes and costs nothing after that.
 */
const TRIAL = 1024;
const CAPACITY = 512;

export class MemoGate {
  private prev = new Float64Array(CAPACITY);
  private next = new Float64Array(CAPACITY);
  private prevLength = -1;
  private calls = 0;
  private hits = 0;
  private open = true;

  /** True when y equals the previous argument (never on the first call or once the gate closed). */
  same(y: unknown): boolean {
    if (!this.open) return false;
    if (++this.calls === TRIAL && this.hits * 2 < TRIAL) this.open = false;
    const length = flatten(y, this.next, 0);
    if (length < 0) {
      this.open = false;
      return false;
    }
    let equal = length === this.prevLength;
    for (let i = 0; equal && i < length; i++) equal = this.next[i] === this.prev[i];
    const t = this.prev;
    this.prev = this.next;
    this.next = t;
    this.prevLength = length;
    if (equal) this.hits++;
    return equal;
  }
}

/** Writes the numbers of y (arrays with their lengths, plain objects by key order) from `at`; −1 when y holds something else or is too large. */
function flatten(y: unknown, out: Float64Array, at: number): number {
  if (typeof y === 'number') {
    if (at >= out.length) return -1;
    out[at] = y;
    return at + 1;
  }
  if (typeof y === 'boolean') return flatten(y ? 1 : 0, out, at);
  if (Array.isArray(y)) {
    if (at >= out.length) return -1;
    out[at++] = -0.5 - y.length; // an array marker no integer entry can equal
    for (const v of y) {
      at = flatten(v, out, at);
      if (at < 0) return -1;
    }
    return at;
  }
  if (y !== null && typeof y === 'object' && Object.getPrototypeOf(y) === Object.prototype) {
    for (const v of Object.values(y)) {
      at = flatten(v, out, at);
      if (at < 0) return -1;
    }
    return at;
  }
  return -1;
}
