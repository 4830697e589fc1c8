/**
 * Published facts on x-derivative closures and the coinvariant quotient, each with its source.
 */
import { stirlingS2 } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { partitionKey, partitionList, type Partition } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { computeModule } from '../../src/modules/compute-module.js';
import { computeQuotient } from '../../src/modules/compute-quotient.js';
import type { ModuleCell } from '../../src/modules/module-cell.js';
import { majFrobenius } from '../helpers/maj-frobenius.js';

/** [n]_q! computed here by multiplying out (common practice). */
function qFact(n: number): Poly {
  let r = Poly.one;
  for (let i = 1; i <= n; i++) r = r.mul(Poly.fromQCoeffs(new Array<number>(i).fill(1)));
  return r;
}
/** Stir_q(n,k) by Carlitz's q-Stirling recurrence, computed here. */
function qStir(n: number, k: number): Poly {
  if (n === 0 && k === 0) return Poly.one;
  if (n === 0 || k === 0) return Poly.zero;
  return qStir(n - 1, k - 1).add(Poly.fromQCoeffs(new Array<number>(k).fill(1)).mul(qStir(n - 1, k)));
}
function hilbert(cells: readonly ModuleCell[]): Poly {
  return Poly.fromTerms(cells.map((c) => [c.degree[0], 0, BigInt(c.dim)] as const));
}

describe('x-closure of the Vandermonde (Lusztig–Stanley; Stanley, Invariants of finite groups and their applications to combinatorics, Bull. Amer. Math. Soc. 1 (1979) — from memory)', () => {
  for (const n of [1, 2, 3, 4, 5]) {
    it(`n = ${n}: Hilbert series [n]_q!, Frobenius Σ_T q^maj(T) s_shape(T)`, () => {
      const r = computeModule({ seed: 'vandermonde', n, ops: ['x'] }, { frobenius: true });
      expect(hilbert(r.cells).equals(qFact(n))).toBe(true);
      const expected = majFrobenius(n);
      const shapes = partitionList(n);
      shapes.forEach((l: Partition, i) => {
        const got = Poly.fromTerms(r.cells.map((c) => [c.degree[0], 0, BigInt(c.multiplicities![i]!)] as const));
        expect(got.equals(expected.get(partitionKey(l)) ?? Poly.zero)).toBe(true);
      });
      expect(r.provenance.primes.length).toBeGreaterThanOrEqual(2);
      expect(r.provenance.confirmation).toMatch(/confirmed/);
    });
  }
});

describe('x-closure of δ_{n,k} (Rhoades–Wilson, Vandermondes in superspace, Trans. Amer. Math. Soc. (2020) — from memory; dimension against mathjs stirlingS2)', () => {
  for (let n = 1; n <= 5; n++) {
    for (let k = 1; k <= n; k++) {
      it(`n = ${n}, k = ${k}: dimension k!·S(n,k), Hilbert [k]_q!·Stir_q(n,k)`, () => {
        const r = computeModule({ seed: 'superspace-vandermonde', n, k, ops: ['x'] }, { frobenius: true });
        const fact = [1, 1, 2, 6, 24, 120][k]!;
        expect(r.cells.reduce((s, c) => s + c.dim, 0)).toBe(fact * Number(stirlingS2(n, k)));
        // the x-closure has θ-degree n−k throughout; its x-grading is the q-count of ordered set partitions
        expect(hilbert(r.cells).equals(qFact(k).mul(qStir(n, k)))).toBe(true);
        expect(r.checks.find((c) => c.check === 'Schur positivity')?.holds).toBe(true);
      });
    }
  }
});

describe('coinvariant quotient Q[x]/⟨invariants⟩ (Hilbert [n]_q!, Frobenius = the Vandermonde closure: harmonics, common practice)', () => {
  for (const n of [2, 3, 4, 5]) {
    it(`n = ${n}`, () => {
      const q = computeQuotient({ ideal: 'coinvariant', n }, { frobenius: true });
      expect(hilbert(q.cells).equals(qFact(n))).toBe(true);
      const m = computeModule({ seed: 'vandermonde', n, ops: ['x'] }, { frobenius: true });
      const byDeg = (cells: readonly ModuleCell[]) => JSON.stringify([...cells].sort((a, b) => a.degree[0] - b.degree[0]).map((c) => c.multiplicities));
      expect(byDeg(q.cells)).toBe(byDeg(m.cells));
    });
  }
});
