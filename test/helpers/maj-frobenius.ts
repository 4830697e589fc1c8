/**
 * Σ_T q^maj(T) s_shape(T) over the standard Young tableaux of size n (the graded Frobenius
 * series of the Vandermonde's derivative closure: Lusztig–Stanley; Stanley, Bull. Amer. Math.
 * Soc. 1 (1979) — from memory), computed independently of the engines: tableaux by adding n
 * to a corner, maj from the descents i (i + 1 in a lower row).
 */
import { partitionKey } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';

export function standardTableaux(n: number): { shape: number[]; rowOf: number[] }[] {
  if (n === 0) return [{ shape: [], rowOf: [] }];
  const out: { shape: number[]; rowOf: number[] }[] = [];
  for (const t of standardTableaux(n - 1)) {
    for (let r = 0; r <= t.shape.length; r++) {
      if (r > 0 && (t.shape[r] ?? 0) + 1 > t.shape[r - 1]!) continue;
      const shape = t.shape.slice();
      shape[r] = (shape[r] ?? 0) + 1;
      out.push({ shape, rowOf: [...t.rowOf, r] });
    }
  }
  return out;
}

/** Partition key → Σ q^maj over the tableaux of that shape. */
export function majFrobenius(n: number): Map<string, Poly> {
  const out = new Map<string, Poly>();
  for (const t of standardTableaux(n)) {
    let maj = 0;
    for (let i = 1; i < n; i++) if (t.rowOf[i]! > t.rowOf[i - 1]!) maj += i;
    const key = partitionKey(t.shape);
    out.set(key, (out.get(key) ?? Poly.zero).add(Poly.monomial(1, maj)));
  }
  return out;
}
