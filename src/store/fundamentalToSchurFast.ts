/**
 * Σ_S c_S F_{n,S} → Schur expansion on plain number tallies (the catalogue's hot path;
 * src/symfun/quasisym.ts does the same on exact polynomials and is the reference in tests).
 * With m_T = Σ_{S ⊆ T} c_S (the M_T coefficient, = ⟨f, h_α⟩ for α the composition of T),
 * Jacobi–Trudi gives ⟨f, s_λ⟩ = Σ_σ sgn(σ) ⟨f, h_{λ_i − i + σ(i)}⟩.
 * Returns undefined when the sum is not symmetric.
 */
import { partitionKey, partitionList } from '../core/partitions.js';
import { compositionMask, maskComposition } from '../symfun/quasisym.js';

export type CountMap = Map<number, number>;

function addInto(target: CountMap, src: CountMap, sign = 1): void {
  for (const [k, v] of src) {
    const s = (target.get(k) ?? 0) + sign * v;
    if (s === 0) target.delete(k);
    else target.set(k, s);
  }
}

function sameMap(a: CountMap, b: CountMap): boolean {
  if (a.size !== b.size) return false;
  for (const [k, v] of a) if (b.get(k) !== v) return false;
  return true;
}

export function fundamentalToSchurFast(n: number, byMask: ReadonlyMap<number, CountMap>): Map<string, CountMap> | undefined {
  const size = n === 0 ? 1 : 1 << (n - 1);
  const m: CountMap[] = Array.from({ length: size }, () => new Map());
  for (const [mask, c] of byMask) addInto(m[mask]!, c);
  for (let b = 0; b < n - 1; b++) for (let T = 0; T < size; T++) if (T & (1 << b)) addInto(m[T]!, m[T ^ (1 << b)]!);
  // symmetry: the M_α coefficient depends only on the multiset of parts of α
  for (let T = 0; T < size; T++) {
    const sortedParts = maskComposition(n, T).sort((x, y) => y - x);
    if (!sameMap(m[T]!, m[compositionMask(sortedParts)]!)) return undefined;
  }
  return jacobiTrudi(n, (alpha) => m[compositionMask(alpha)]!);
}

/**
 * Σ_μ c_μ m_μ → Schur, from the coefficients c_μ of the monomials of the partitions μ ⊢ n
 * (missing partitions count 0): the symmetric function with these monomial coefficients.
 */
export function monomialToSchurFast(n: number, byPartition: ReadonlyMap<string, CountMap>): Map<string, CountMap> {
  const none: CountMap = new Map();
  return jacobiTrudi(n, (alpha) => byPartition.get(partitionKey([...alpha].sort((x, y) => y - x))) ?? none);
}

/** ⟨f, s_λ⟩ = Σ_σ sgn(σ) ⟨f, h_{λ_i − i + σ(i)}⟩ for every λ ⊢ n, given ⟨f, h_α⟩ for compositions α. */
function jacobiTrudi(n: number, h: (alpha: number[]) => CountMap): Map<string, CountMap> {
  const out = new Map<string, CountMap>();
  for (const lambda of partitionList(n)) {
    const l = lambda.length;
    const acc: CountMap = new Map();
    const used = new Array<boolean>(l + 1).fill(false);
    const alpha = new Array<number>(l).fill(0);
    const rec = (i: number, sign: number): void => {
      if (i === l) {
        addInto(acc, h(alpha.filter((a) => a > 0)), sign);
        return;
      }
      for (let s = 1; s <= l; s++) {
        if (used[s]) continue;
        const a = lambda[i]! - (i + 1) + s;
        if (a < 0) continue;
        // sign of σ: count the already used values greater than s (inversions)
        let inv = 0;
        for (let u = s + 1; u <= l; u++) if (used[u]) inv++;
        used[s] = true;
        alpha[i] = a;
        rec(i + 1, inv % 2 === 0 ? sign : -sign);
        used[s] = false;
      }
    };
    rec(0, 1);
    if (acc.size > 0) out.set(partitionKey(lambda), acc);
  }
  return out;
}
