/**
 * One Series type for every source: a polynomial in q, in q and t, a Frobenius series
 * (Schur expansion with polynomial coefficients) or a multigraded table with more axes.
 * Series are plain readonly data; a target is a family of them over (n, k).
 */
import { fLambda, parsePartition, partitionKey, type Partition } from '../core/partitions.js';
import { Poly } from '../core/poly.js';

export type SeriesKind = 'q' | 'qt' | 'schur' | 'multi';

export type Series =
  | { readonly kind: 'q'; readonly poly: Poly }
  | { readonly kind: 'qt'; readonly poly: Poly }
  /** Σ_λ c_λ(q,t) s_λ, keyed by the partition written "3,1" (the empty partition is ""). */
  | { readonly kind: 'schur'; readonly terms: ReadonlyMap<string, Poly> }
  /** Multigraded table: exponent vectors "i,j,l" (one per axis) -> coefficient. */
  | { readonly kind: 'multi'; readonly axes: readonly string[]; readonly terms: ReadonlyMap<string, bigint> };

export function qSeries(poly: Poly): Series {
  return { kind: 'q', poly };
}

/** A q,t series; one without any t is kept as a series in q alone (the simpler kind). */
export function qtSeries(poly: Poly): Series {
  return poly.isUnivariate() ? { kind: 'q', poly } : { kind: 'qt', poly };
}

export function schurSeries(terms: Iterable<readonly [Partition | string, Poly]>): Series {
  const m = new Map<string, Poly>();
  for (const [l, c] of terms) {
    const key = typeof l === 'string' ? partitionKey(parsePartition(l)) : partitionKey(l);
    const sum = (m.get(key) ?? Poly.zero).add(c);
    if (sum.isZero()) m.delete(key);
    else m.set(key, sum);
  }
  return { kind: 'schur', terms: new Map([...m].sort(byPartitionKey)) };
}

/** Partitions in reverse-lex order (the core order): (3) before (2,1) before (1,1,1). */
export function byPartitionKey(a: readonly [string, unknown], b: readonly [string, unknown]): number {
  const x = a[0] === '' ? [] : a[0].split(',').map(Number);
  const y = b[0] === '' ? [] : b[0].split(',').map(Number);
  for (let i = 0; i < Math.max(x.length, y.length); i++) {
    const d = (y[i] ?? 0) - (x[i] ?? 0);
    if (d !== 0) return d;
  }
  return 0;
}

/** Equality of series; a q,t series without t equals the same q-series. */
export function seriesEquals(a: Series, b: Series): boolean {
  if ((a.kind === 'q' || a.kind === 'qt') && (b.kind === 'q' || b.kind === 'qt')) return a.poly.equals(b.poly);
  if (a.kind !== b.kind) return false;
  if (a.kind === 'schur' && b.kind === 'schur') {
    if (a.terms.size !== b.terms.size) return false;
    for (const [k, c] of a.terms) if (!b.terms.get(k)?.equals(c)) return false;
    return true;
  }
  if (a.kind === 'multi' && b.kind === 'multi') {
    if (a.axes.join() !== b.axes.join() || a.terms.size !== b.terms.size) return false;
    for (const [k, c] of a.terms) if (b.terms.get(k) !== c) return false;
    return true;
  }
  return false;
}

/**
 * The value at q = t = 1 of the graded dimension: the count used to filter candidates
 * before exact comparison. For a Frobenius series it is Σ f^λ c_λ(1,1).
 */
export function seriesAtOne(s: Series): bigint {
  switch (s.kind) {
    case 'q':
    case 'qt':
      return s.poly.sumCoefficients();
    case 'schur': {
      let total = 0n;
      for (const [k, c] of s.terms) total += fLambda(keyToPartition(k)) * c.sumCoefficients();
      return total;
    }
    case 'multi': {
      let total = 0n;
      for (const c of s.terms.values()) total += c;
      return total;
    }
  }
}

/** The graded dimension ⟨F, p_1^n⟩ = Σ f^λ c_λ of a Frobenius series (Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., ch. I §7). */
export function hilbertOfSchur(s: Series): Series {
  if (s.kind !== 'schur') return s;
  let h = Poly.zero;
  for (const [k, c] of s.terms) h = h.add(c.scale(fLambda(keyToPartition(k))));
  return qtSeries(h);
}

/** The coefficient of one Schur function, as a q or q,t series. */
export function schurCoefficient(s: Series, lambda: Partition): Series {
  if (s.kind !== 'schur') throw new Error('schurCoefficient needs a Frobenius series');
  return qtSeries(s.terms.get(partitionKey(lambda)) ?? Poly.zero);
}

export function keyToPartition(key: string): Partition {
  return key === '' ? [] : key.split(',').map(Number);
}

/** True when no coefficient involves t (q alone). */
export function seriesIsUnivariate(s: Series): boolean {
  if (s.kind === 'q') return true;
  if (s.kind === 'qt') return false;
  if (s.kind === 'schur') return [...s.terms.values()].every((c) => c.isUnivariate());
  return s.axes.length <= 1;
}

/** A canonical text for hashing and exact look-up (equal series give equal text). */
export function seriesCanonical(s: Series): string {
  switch (s.kind) {
    case 'q':
    case 'qt':
      // one prefix for both: a q,t series without t equals the q-series
      return `poly:${polyCanonical(s.poly)}`;
    case 'schur':
      return `schur:${[...s.terms].sort(byPartitionKey).map(([k, c]) => `${k}=${polyCanonical(c)}`).join(';')}`;
    case 'multi':
      return `multi:${s.axes.join(',')}:${[...s.terms].sort((a, b) => (a[0] < b[0] ? -1 : 1)).map(([k, c]) => `${k}=${c}`).join(';')}`;
  }
}

function polyCanonical(p: Poly): string {
  return p.sortedTerms().map(([i, j, c]) => `${i}.${j}.${c}`).join(' ');
}
