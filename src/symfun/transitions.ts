/**
 * Transition matrices between the Schur basis and the bases m, e, h, p of degree n, with
 * exact rational entries, cached per (basis, n). All come from Kostka numbers (and their
 * inverse) and the character table:
 *   s_λ = Σ_μ K_{λμ} m_μ,  h_μ = Σ_λ K_{λμ} s_λ,  e_μ = Σ_λ K_{λ'μ} s_λ,  p_ρ = Σ_λ χ^λ(ρ) s_λ.
 */
import { conjugate, partitionKey, partitionList, zee } from '../core/partitions.js';
import { Fraction, frac } from '../core/rational.js';
import { characterTable } from './characters.js';
import { inverseKostkaMatrix, kostkaMatrix } from './kostka.js';

export type Basis = 's' | 'm' | 'e' | 'h' | 'p';
export const BASES: readonly Basis[] = ['s', 'm', 'e', 'h', 'p'];

/** A sparse matrix row: column index and entry. */
export type SparseRow = readonly (readonly [number, Fraction])[];

const toSchurCache = new Map<string, readonly SparseRow[]>();
const fromSchurCache = new Map<string, readonly SparseRow[]>();

function indexOfConjugates(n: number): number[] {
  const ps = partitionList(n);
  const pos = new Map(ps.map((p, i) => [partitionKey(p), i]));
  return ps.map((p) => pos.get(partitionKey(conjugate(p)))!);
}

function sparse(dense: readonly (readonly Fraction[])[]): SparseRow[] {
  return dense.map((row) => row.flatMap((v, j) => (v.equals(0) ? [] : [[j, v] as const])));
}

/** Row ν = the Schur expansion of the basis element b_ν (indices in partitionList(n) order). */
export function basisToSchur(basis: Basis, n: number): readonly SparseRow[] {
  const key = `${basis}${n}`;
  let hit = toSchurCache.get(key);
  if (hit) return hit;
  const N = partitionList(n).length;
  const range = [...Array(N).keys()];
  const K = kostkaMatrix(n);
  const conj = indexOfConjugates(n);
  let dense: Fraction[][];
  switch (basis) {
    case 's':
      dense = range.map((i) => range.map((j) => frac(i === j ? 1n : 0n)));
      break;
    case 'm': {
      const Ki = inverseKostkaMatrix(n);
      dense = range.map((mu) => range.map((l) => frac(Ki[mu]![l]!)));
      break;
    }
    case 'h':
      dense = range.map((mu) => range.map((l) => frac(K[l]![mu]!)));
      break;
    case 'e':
      dense = range.map((mu) => range.map((l) => frac(K[conj[l]!]![mu]!)));
      break;
    case 'p': {
      const X = characterTable(n);
      dense = range.map((rho) => range.map((l) => frac(X[l]![rho]!)));
      break;
    }
  }
  hit = sparse(dense);
  toSchurCache.set(key, hit);
  return hit;
}

/** Row λ = the expansion of s_λ in the basis b. */
export function schurToBasis(basis: Basis, n: number): readonly SparseRow[] {
  const key = `${basis}${n}`;
  let hit = fromSchurCache.get(key);
  if (hit) return hit;
  const ps = partitionList(n);
  const N = ps.length;
  const range = [...Array(N).keys()];
  const conj = indexOfConjugates(n);
  let dense: Fraction[][];
  switch (basis) {
    case 's':
      dense = range.map((i) => range.map((j) => frac(i === j ? 1n : 0n)));
      break;
    case 'm': {
      const K = kostkaMatrix(n);
      dense = range.map((l) => range.map((mu) => frac(K[l]![mu]!)));
      break;
    }
    case 'h': {
      const Ki = inverseKostkaMatrix(n);
      dense = range.map((l) => range.map((mu) => frac(Ki[mu]![l]!)));
      break;
    }
    case 'e': {
      const Ki = inverseKostkaMatrix(n);
      dense = range.map((l) => range.map((mu) => frac(Ki[mu]![conj[l]!]!)));
      break;
    }
    case 'p': {
      const X = characterTable(n);
      dense = range.map((l) => range.map((rho) => frac(X[l]![rho]!, zee(ps[rho]!))));
      break;
    }
  }
  hit = sparse(dense);
  fromSchurCache.set(key, hit);
  return hit;
}
