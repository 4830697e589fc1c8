/**
 * Descent sets of a word as bit masks (bit i−1 ⇔ i ∈ S): Des(w) = {i : w_i > w_{i+1}} and
 * iDes(w) = Des(std(w)^{-1}) = {i : i+1 stands left of i in std(w)}, where std(w) numbers
 * equal letters left to right (common practice).
 */
export function descentMask(w: readonly number[]): number {
  let m = 0;
  for (let i = 0; i + 1 < w.length; i++) if (w[i]! > w[i + 1]!) m |= 1 << i;
  return m;
}

export function inverseDescentMask(w: readonly number[]): number {
  const n = w.length;
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => w[a]! - w[b]! || a - b);
  // order[v] = position of the letter standardised to v+1
  let m = 0;
  for (let v = 0; v + 1 < n; v++) if (order[v + 1]! < order[v]!) m |= 1 << v;
  return m;
}
