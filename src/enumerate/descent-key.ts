/**
 * The inverse descent set of a word, the index of Gessel's fundamental quasisymmetric
 * function in Frobenius-level sums (Stanley, Enumerative Combinatorics vol. 2, §7.19; as in
 * Carlsson–Mellit, A proof of the shuffle conjecture, J. Amer. Math. Soc. 31 (2018):
 * Σ q^stat F_{n, iDes(reading word)}).
 * A word with repeated letters is first standardized (equal letters numbered left to
 * right), so iDes = { i : the letter numbered i+1 stands left of the one numbered i }.
 */

/** iDes of the standardization of w, as the number Σ_{i ∈ iDes} 2^{i−1} (n ≤ 53). */
export function inverseDescentKey(w: readonly number[]): number {
  const n = w.length;
  // Counting sort by letter, stable in position: order[j] = position of the j-th smallest.
  let max = 0;
  for (const x of w) if (x > max) max = x;
  const start = new Int32Array(max + 2);
  for (const x of w) start[x + 1]!++;
  for (let v = 1; v <= max + 1; v++) start[v]! += start[v - 1]!;
  const order = new Int32Array(n);
  for (let i = 0; i < n; i++) order[start[w[i]!]!++] = i;
  let key = 0;
  let bit = 1;
  for (let j = 0; j + 1 < n; j++, bit *= 2) if (order[j + 1]! < order[j]!) key += bit;
  return key;
}

/** The set {i : bit i−1 of key is set}, ascending. */
export function descentSetOfKey(key: number, n: number): number[] {
  const out: number[] = [];
  let bit = 1;
  for (let i = 1; i < n; i++, bit *= 2) if (Math.floor(key / bit) % 2 === 1) out.push(i);
  return out;
}
