/**
 * Quotients against closures where a theorem says they must agree (n ≤ 4 or 5 here; larger n in
 * bench/quotients.bench.ts), and the x, y, θ quotient against the counts of a general
 * commutative-algebra system.
 */
import { describe, expect, it } from 'vitest';
import { conjugate, partitionKey, partitionList } from '../../src/core/partitions.js';
import { computeModule } from '../../src/modules/compute-module.js';
import { computeQuotient } from '../../src/modules/compute-quotient.js';
import type { ModuleCell } from '../../src/modules/module-cell.js';

const table = (cells: readonly ModuleCell[], map: (c: ModuleCell) => string) => cells.filter((c) => c.dim > 0).map(map).sort().join(' | ');

describe('diagonal coinvariants Q[x,y]/⟨invariants⟩ = closure of the Vandermonde under ∂x, ∂y and the polarizations (Haiman, "Vanishing theorems and character formulas for the Hilbert scheme of points in the plane", 2002: the diagonal harmonics, dual to the quotient, are that closure)', () => {
  for (const n of [2, 3, 4]) {
    it(`n = ${n}: every cell and multiplicity; dimension (n+1)^(n−1) (same paper)`, () => {
      const q = computeQuotient({ ideal: 'coinvariant', n, y: true }, { frobenius: true });
      const ops = ['x', 'y', ...Array.from({ length: n - 1 }, (_, j) => `polar${j + 1}`)];
      const m = computeModule({ seed: 'vandermonde', n, ops }, { frobenius: true });
      const key = (c: ModuleCell) => `${c.degree[0]},${c.degree[1]}:${c.multiplicities!.join(' ')}`;
      expect(table(q.cells, key)).toBe(table(m.cells, key));
      expect(q.cells.reduce((s, c) => s + c.dim, 0)).toBe((n + 1) ** (n - 1));
      expect(q.checks.find((c) => c.check.startsWith('Frobenius series equals ∇e'))?.holds).toBe(true);
    });
  }
});

describe('generalized coinvariant ring R_{n,k} = x-closure of δ_{n,k} up to ω and q-reversal (Haglund–Rhoades–Shimozono, "Ordered set partitions, generalized coinvariant algebras, and the Delta Conjecture", Adv. Math. 329 (2018), Frob R_{n,k} = rev_q ω C_{n,k}; Rhoades–Wilson, "Vandermondes in superspace", Trans. Amer. Math. Soc. (2020), whose main theorem gives the x-closure of δ_{n,k} the Frobenius series C_{n,k} — from memory)', () => {
  for (let n = 2; n <= 5; n++)
    for (let k = 1; k <= n; k++)
      it(`n = ${n}, k = ${k}`, () => {
        const q = computeQuotient({ ideal: 'generalized-coinvariant', n, k }, { frobenius: true });
        const m = computeModule({ seed: 'superspace-vandermonde', n, k, ops: ['x'] }, { frobenius: true });
        const shapes = partitionList(n);
        const top = Math.max(...m.cells.map((c) => c.degree[0]));
        const omega = (c: ModuleCell) => {
          const mult = new Map(c.multiplicities!.map((v, i) => [partitionKey(conjugate(shapes[i]!)), v]));
          return `${top - c.degree[0]}:${shapes.map((s) => mult.get(partitionKey(s)) ?? 0).join(' ')}`;
        };
        expect(table(q.cells, (c) => `${c.degree[0]}:${c.multiplicities!.join(' ')}`)).toBe(table(m.cells, omega));
        expect(q.checks.find((c) => c.check.startsWith('Frobenius series equals rev_q'))?.holds).toBe(true);
      });
});

describe('Q[x,y,θ]/⟨invariants⟩', () => {
  it('n = 4: dimension 288 (a general commutative-algebra system, mod 32003, as quoted in issue 13); the comparison with Σ_k z^(n−k) Δ′_{e_(k−1)} e_n ("A module for the Delta conjecture", a conjecture) is reported and holds', () => {
    const q = computeQuotient({ ideal: 'coinvariant', n: 4, y: true, theta: true }, { frobenius: true });
    expect(q.cells.reduce((s, c) => s + c.dim, 0)).toBe(288);
    expect(q.checks.find((c) => c.check.startsWith('Frobenius series equals Σ_k'))?.holds).toBe(true);
  });
  it('n = 3, θ only: Hilbert series Σ_k z^(n−k) [k]_q! Stir_q(n,k) ("The Hilbert series of the superspace coinvariant ring", Rhoades–Wilson — from memory of the title): dimension 13 = Σ_k k!·S(3,k), and the Δ′ finding at t = 0 holds', () => {
    const q = computeQuotient({ ideal: 'coinvariant', n: 3, theta: true }, { frobenius: true });
    expect(q.cells.reduce((s, c) => s + c.dim, 0)).toBe(1 * 1 + 2 * 3 + 6 * 1);
    expect(q.checks.find((c) => c.check.startsWith('Frobenius series equals Σ_k'))?.holds).toBe(true);
  });
});
