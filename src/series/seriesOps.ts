/**
 * Operations on series used as a target's variants: q-reversal, ω on Frobenius series
 * (s_λ -> s_λ'), swapping q and t; and the palindromic / unimodal flags.
 */
import { conjugate } from '../core/partitions.js';
import { Poly } from '../core/poly.js';
import { keyToPartition, schurSeries, type Series } from './series.js';

/**
 * rev_q: q^D f(1/q). For a Frobenius series D is the largest q-degree over all its
 * coefficients, so the whole series is reversed as one (as for a graded module).
 */
export function reverseSeries(s: Series): Series {
  switch (s.kind) {
    case 'q':
    case 'qt':
      return { kind: s.kind, poly: s.poly.reverseQ() };
    case 'schur': {
      const d = Math.max(-1, ...[...s.terms.values()].map((c) => c.degQ()));
      return schurSeries([...s.terms].map(([k, c]) => [k, reverseTo(c, d)] as const));
    }
    case 'multi':
      throw new Error('q-reversal of a multigraded table is not defined here');
  }
}

function reverseTo(p: Poly, d: number): Poly {
  return Poly.fromTerms(p.sortedTerms().map(([i, j, c]) => [d - i, j, c] as const));
}

/** ω(s_λ) = s_λ' (Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., ch. I). Only for Frobenius series. */
export function omegaSeries(s: Series): Series {
  if (s.kind !== 'schur') throw new Error('ω applies to Frobenius series only');
  return schurSeries([...s.terms].map(([k, c]) => [conjugate(keyToPartition(k)), c] as const));
}

export function swapSeries(s: Series): Series {
  switch (s.kind) {
    case 'q':
    case 'qt': {
      const p = s.poly.swapQT();
      return p.isUnivariate() ? { kind: 'q', poly: p } : { kind: 'qt', poly: p };
    }
    case 'schur':
      return schurSeries([...s.terms].map(([k, c]) => [k, c.swapQT()] as const));
    case 'multi':
      throw new Error('swapping q and t of a multigraded table is not defined here');
  }
}

/** Dense coefficient list of a q-polynomial between its lowest and highest degree. */
function span(p: Poly): bigint[] {
  const a = p.toQArray();
  const lo = p.minDegQ();
  return lo < 0 ? [] : a.slice(lo);
}

/** Coefficients read the same both ways (from the lowest to the highest degree). */
export function isPalindromic(p: Poly): boolean {
  if (!p.isUnivariate()) return isPalindromicQT(p);
  const a = span(p);
  return a.every((c, i) => c === a[a.length - 1 - i]);
}

/** Symmetric under (i,j) -> (D_q − i, D_t − j) about the bidegree box. */
function isPalindromicQT(p: Poly): boolean {
  const dq = p.degQ();
  const dt = p.degT();
  for (const [i, j, c] of p.terms()) if (p.coeff(dq - i, dt - j) !== c) return false;
  return true;
}

/** Weakly increasing then weakly decreasing, with no inner zeros (q alone). */
export function isUnimodal(p: Poly): boolean {
  if (!p.isUnivariate()) return false;
  const a = span(p);
  let i = 0;
  while (i + 1 < a.length && a[i]! <= a[i + 1]!) i++;
  while (i + 1 < a.length && a[i]! >= a[i + 1]!) i++;
  return i >= a.length - 1 && a.every((c) => c > 0n);
}

export interface SeriesFlags {
  readonly palindromic: boolean;
  readonly unimodal: boolean;
}

/** Flags of a q or q,t series (a Frobenius series is flagged through its graded dimension). */
export function flagsOf(p: Poly): SeriesFlags {
  return { palindromic: isPalindromic(p), unimodal: isUnimodal(p) };
}
