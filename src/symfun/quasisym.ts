/**
 * Gessel's fundamental quasisymmetric functions F_{n,S}, S ⊆ [n−1], written as bit masks
 * (bit i−1 set ⇔ i ∈ S). A symmetric function given as Σ c_S F_{n,S} is converted to the
 * Schur basis through the monomial quasisymmetric basis: F_S = Σ_{T ⊇ S} M_T, so the
 * coefficient of M_T is Σ_{S ⊆ T} c_S; that of M_λ is the m_λ coefficient, and inverse
 * Kostka numbers give the Schur expansion. Symmetry is checked on every composition.
 */
import { InputError } from '../core/errors.js';
import { partitionKey, partitionList, type Partition } from '../core/partitions.js';
import { Poly } from '../core/poly.js';
import { PolyQ } from '../core/polyq.js';
import { inverseKostkaMatrix } from './kostka.js';
import { SymFun } from './symfun.js';

/** The descent-set mask of a composition's partial sums: α = (α_1,…) ↦ {α_1, α_1+α_2, …}. */
export function compositionMask(alpha: readonly number[]): number {
  let mask = 0;
  let s = 0;
  for (let i = 0; i < alpha.length - 1; i++) {
    s += alpha[i]!;
    mask |= 1 << (s - 1);
  }
  return mask;
}

/** The composition of n whose partial sums are the set S. */
export function maskComposition(n: number, mask: number): number[] {
  const out: number[] = [];
  let last = 0;
  for (let i = 1; i < n; i++) {
    if (mask & (1 << (i - 1))) {
      out.push(i - last);
      last = i;
    }
  }
  if (n > 0) out.push(n - last);
  return out;
}

/** Set notation {1,3} for messages. */
export function maskText(mask: number): string {
  const out: number[] = [];
  for (let i = 0; mask >> i; i++) if (mask & (1 << i)) out.push(i + 1);
  return `{${out.join(',')}}`;
}

/**
 * Σ_S c_S F_{n,S} → Schur expansion. coeffs maps a mask to its coefficient; masks must be
 * below 2^(n−1). InputError when the sum is not symmetric (names the first composition
 * whose monomial coefficient differs from that of its sorted rearrangement).
 */
export function fundamentalToSchur(n: number, coeffs: ReadonlyMap<number, Poly>): SymFun {
  if (!Number.isInteger(n) || n < 0 || n > 20) throw new InputError(`n must be an integer from 0 to 20 (got ${n})`, 'n');
  const size = n === 0 ? 1 : 1 << (n - 1);
  const m: Poly[] = new Array<Poly>(size).fill(Poly.zero);
  for (const [mask, c] of coeffs) {
    if (!Number.isInteger(mask) || mask < 0 || mask >= size) {
      throw new InputError(`descent set ${maskText(mask)} is not a subset of {1,…,${n - 1}}`, 'coeffs');
    }
    m[mask] = m[mask]!.add(c);
  }
  // zeta transform over subsets: m[T] = Σ_{S ⊆ T} c_S
  for (let b = 0; b < n - 1; b++)
    for (let T = 0; T < size; T++) if (T & (1 << b)) m[T] = m[T]!.add(m[T ^ (1 << b)]!);
  const ps = partitionList(n);
  const partMask = new Map(ps.map((p) => [partitionKey(p), compositionMask(p)]));
  for (let T = 0; T < size; T++) {
    const alpha = maskComposition(n, T);
    const sorted = [...alpha].sort((a, b) => b - a);
    const ref = partMask.get(partitionKey(sorted))!;
    if (!m[T]!.equals(m[ref]!)) {
      throw new InputError(
        `the F-expansion is not symmetric: the coefficient of the monomial quasisymmetric M_(${alpha.join(',')}) is ` +
          `${m[T]!.toString()}, but that of M_(${sorted.join(',')}) is ${m[ref]!.toString()} ` +
          `(M_(${alpha.join(',')}) collects the F_S with S ⊆ ${maskText(T)})`,
        'coeffs',
      );
    }
  }
  const d = ps.map((p) => m[compositionMask(p)]!);
  const Ki = inverseKostkaMatrix(n);
  const terms: [Partition, PolyQ][] = ps.map((l, j) => {
    let a = Poly.zero;
    d.forEach((dm, i) => {
      const k = Ki[i]![j]!;
      if (k !== 0n && !dm.isZero()) a = a.add(dm.scale(k));
    });
    return [l, PolyQ.of(a)];
  });
  return SymFun.fromBasis('s', terms);
}
