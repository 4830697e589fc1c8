/**
 * A second route to H̃_μ, independent of the filling formula: at numeric q = q0, t = t0 the
 * characterisation (Haiman, Hilbert schemes, polygraphs, and the Macdonald positivity
 * conjecture, J. Amer. Math. Soc. 14 (2001); Haglund, The q,t-Catalan numbers and the space
 * of diagonal harmonics, AMS 2008, ch. 2 — from memory)
 *   H̃_μ[X(1−q)] ∈ span{s_λ : λ ≥ μ},  H̃_μ[X(1−t)] ∈ span{s_λ : λ ≥ μ′},  ⟨H̃_μ, s_(n)⟩ = 1
 * is a linear system over Q in the Schur coefficients; it is solved exactly by Gaussian
 * elimination, and its solution must be unique. Used to cross-check macdonald.ts.
 */
import { ArithmeticError } from '../core/errors.js';
import { conjugate, dominates, partitionKey, partitionList, size, type Partition } from '../core/partitions.js';
import { Poly } from '../core/poly.js';
import { Fraction, frac } from '../core/rational.js';
import { plethysmTimes } from './plethysm.js';
import { SymFun } from './symfun.js';

/** Rows ν: the Schur coefficients of s_ν[X·A] at (q0, t0), columns in partitionList order. */
function plethysmMatrix(n: number, a: Poly, q0: Fraction, t0: Fraction): Fraction[][] {
  const ps = partitionList(n);
  const col = new Map(ps.map((p, i) => [partitionKey(p), i]));
  return ps.map((nu) => {
    const row = ps.map(() => frac(0n));
    for (const [k, c] of plethysmTimes(SymFun.basisElement('s', nu), a).schurTerms()) row[col.get(k)!] = c.evaluate(q0, t0);
    return row;
  });
}

/** Exact solution of an (over-determined, consistent) system rows·x = rhs; null unless unique. */
export function solveUnique(rows: Fraction[][], rhs: Fraction[]): Fraction[] | null {
  const m = rows.map((r, i) => [...r, rhs[i]!]);
  const N = rows[0]?.length ?? 0;
  let r = 0;
  const pivots: number[] = [];
  for (let c = 0; c < N && r < m.length; c++) {
    const p = m.findIndex((row, i) => i >= r && !row[c]!.equals(0));
    if (p < 0) continue;
    [m[r], m[p]] = [m[p]!, m[r]!];
    const pr = m[r]!;
    const inv = frac(1n).div(pr[c]!);
    for (let j = c; j <= N; j++) pr[j] = pr[j]!.mul(inv);
    for (let i = 0; i < m.length; i++) {
      if (i === r || m[i]![c]!.equals(0)) continue;
      const f = m[i]![c]!;
      for (let j = c; j <= N; j++) m[i]![j] = m[i]![j]!.sub(f.mul(pr[j]!));
    }
    pivots.push(c);
    r++;
  }
  if (pivots.length < N) return null;
  for (let i = r; i < m.length; i++) if (!m[i]![N]!.equals(0)) throw new ArithmeticError('the triangularity system is inconsistent');
  return pivots.map((_, i) => m[i]![N]!);
}

/** The Schur coefficients of H̃_μ at (q0, t0), partitionList order, from the characterisation. */
export function macdonaldByTriangularity(mu: Partition, q0: Fraction, t0: Fraction): Fraction[] | null {
  const n = size(mu);
  const ps = partitionList(n);
  const Aq = plethysmMatrix(n, Poly.one.sub(Poly.q), q0, t0);
  const At = plethysmMatrix(n, Poly.one.sub(Poly.t), q0, t0);
  const rows: Fraction[][] = [];
  const rhs: Fraction[] = [];
  const muConj = conjugate(mu);
  ps.forEach((lambda, j) => {
    // coefficient of s_λ in H̃[X(1−q)] is Σ_ν c_ν Aq[ν][λ]; it vanishes unless λ ≥ μ
    if (!dominates(lambda, mu)) {
      rows.push(ps.map((_, nu) => Aq[nu]![j]!));
      rhs.push(frac(0n));
    }
    if (!dominates(lambda, muConj)) {
      rows.push(ps.map((_, nu) => At[nu]![j]!));
      rhs.push(frac(0n));
    }
  });
  rows.push(ps.map((p) => frac(partitionKey(p) === String(n) ? 1n : 0n)));
  rhs.push(frac(1n));
  return solveUnique(rows, rhs);
}
