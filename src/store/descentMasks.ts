/**
 * Descent sets of a word as bit masks (bit i−1 ⇔ i ∈ S): Des(w) = {i : w_i > w_{i+1}} and
 * iDes(w) = Des(std(w)^{-1}) = {i : i+1 stands left of i in std(w)}, where std(w) numbers
 * equal letters left to right (common practice). Called once per object by the catalogue
 * build: a counting sort in reused buffers, no allocation for letters in a small range.
 */
export function descentMask(w: readonly number[]): number {
  let m = 0;
  for (let i = 0; i + 1 < w.length; i++) if (w[i]! > w[i + 1]!) m |= 1 << i;
  return m;
}

const RANGE = 256;
let counts = new Int32Array(RANGE + 1);
let position = new Int32Array(64);

export function inverseDescentMask(w: readonly number[]): number {
  const n = w.length;
  if (n === 0) return 0;
  let lo = w[0]!;
  let hi = lo;
  for (let i = 1; i < n; i++) {
    const x = w[i]!;
    if (x < lo) lo = x;
    else if (x > hi) hi = x;
  }
  if (hi - lo >= RANGE || !Number.isInteger(lo) || !Number.isInteger(hi)) return inverseDescentMaskBySort(w);
  if (position.length < n) position = new Int32Array(2 * n);
  if (counts.length < RANGE + 1) counts = new Int32Array(RANGE + 1);
  const span = hi - lo + 1;
  counts.fill(0, 0, span + 1);
  for (let i = 0; i < n; i++) counts[w[i]! - lo + 1]!++;
  for (let v = 1; v <= span; v++) counts[v]! += counts[v - 1]!;
  // counts[x − lo] = next standardised value (0-based) for the letter x
  for (let i = 0; i < n; i++) position[counts[w[i]! - lo]!++] = i;
  let m = 0;
  for (let v = 0; v + 1 < n; v++) if (position[v + 1]! < position[v]!) m |= 1 << v;
  return m;
}

function inverseDescentMaskBySort(w: readonly number[]): number {
  const n = w.length;
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => w[a]! - w[b]! || a - b);
  let m = 0;
  for (let v = 0; v + 1 < n; v++) if (order[v + 1]! < order[v]!) m |= 1 << v;
  return m;
}
