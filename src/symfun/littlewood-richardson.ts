/**
 * Littlewood–Richardson coefficients: s_λ s_μ = Σ_ν c^ν_{λμ} s_ν, by adding μ_1 ones, then
 * μ_2 twos, … to λ, each letter as a horizontal strip, keeping the reverse reading word
 * (rows top to bottom, right to left) a lattice word: in every row r the number of i's in
 * rows 1..r is at most the number of (i−1)'s in rows 1..r−1. Cached per pair.
 */
import { partitionKey, type Partition } from '../core/partitions.js';

const cache = new Map<string, ReadonlyMap<string, bigint>>();

export function lrProduct(lambda: Partition, mu: Partition): ReadonlyMap<string, bigint> {
  // the product commutes: put the longer partition first (fewer, larger strips to add)
  const [a, b] = lambda.length >= mu.length ? [lambda, mu] : [mu, lambda];
  const key = `${partitionKey(a)}|${partitionKey(b)}`;
  const hit = cache.get(key);
  if (hit) return hit;
  const out = new Map<string, bigint>();
  const rowsMax = a.length + b.length;
  const shape = [...a, ...new Array<number>(b.length).fill(0)];
  // count[r][i] = number of letters i+1 placed in row r
  const count: number[][] = Array.from({ length: rowsMax }, () => new Array<number>(b.length).fill(0));
  const addLetter = (i: number): void => {
    if (i === b.length) {
      const k = partitionKey(shape.filter((x) => x > 0));
      out.set(k, (out.get(k) ?? 0n) + 1n);
      return;
    }
    const old = shape.slice();
    const place = (r: number, left: number, seenI: number, seenPrevAbove: number): void => {
      if (left === 0) {
        addLetter(i + 1);
        return;
      }
      if (r === rowsMax) return;
      const cap = r === 0 ? left : Math.min(left, old[r - 1]! - old[r]!);
      for (let x = cap; x >= 0; x--) {
        // lattice: i's in rows ≤ r at most the (i−1)'s in rows < r
        if (i > 0 && seenI + x > seenPrevAbove) continue;
        shape[r] = old[r]! + x;
        count[r]![i] = x;
        place(r + 1, left - x, seenI + x, seenPrevAbove + (i > 0 ? count[r]![i - 1]! : 0));
        count[r]![i] = 0;
        shape[r] = old[r]!;
      }
    };
    place(0, b[i]!, 0, 0);
  };
  addLetter(0);
  cache.set(key, out);
  return out;
}
