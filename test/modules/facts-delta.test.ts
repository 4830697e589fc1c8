/**
 * Closures of δ_{n,k} against the symmetric-function engine's Δ'_{e_{k−1}} e_n:
 * - under ∂x, ∂y and the polarizations P_1..P_{n−1}, bigraded by (x, y): Δ'_{e_{k−1}} e_n
 *   (Haiman, Invent. Math. 149 (2002) for k = n; otherwise a conjecture of Rhoades–Wilson,
 *   Vandermondes in superspace, Trans. Amer. Math. Soc. (2020), compared here for n ≤ 4),
 *   q marking x-degree and t marking y-degree, no twist;
 * - under ∂x alone, graded by x-degree: Δ'_{e_{k−1}} e_n at t = 0 with q marking x-degree,
 *   and no further twist (we name no publication for this normalisation: checked here against
 *   the symmetric-function engine).
 */
import { describe, expect, it } from 'vitest';
import { partitionKey, partitionList } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { computeModule } from '../../src/modules/compute-module.js';
import type { ModuleCell } from '../../src/modules/module-cell.js';
import { deltaPrimeOfEn } from '../../src/symfun/operators.js';
import { SymFun } from '../../src/symfun/symfun.js';

function schurOfCells(n: number, cells: readonly ModuleCell[], second: 1 | 2): Map<string, Poly> {
  const out = new Map<string, Poly>();
  partitionList(n).forEach((l, i) => {
    const p = Poly.fromTerms(cells.map((c) => [c.degree[0], c.degree[second], BigInt(c.multiplicities![i]!)] as const));
    if (!p.isZero()) out.set(partitionKey(l), p);
  });
  return out;
}

function deltaPrime(n: number, k: number): Map<string, Poly> {
  const g = k === 1 ? SymFun.one : SymFun.basisElement('e', [k - 1]);
  const out = new Map<string, Poly>();
  for (const [key, c] of deltaPrimeOfEn(g, n).schurTerms()) if (!c.isZero()) out.set(key, c.toPoly());
  return out;
}

const same = (a: Map<string, Poly>, b: Map<string, Poly>) => a.size === b.size && [...a].every(([k, p]) => b.get(k)?.equals(p));

describe("polarized closures of δ_{n,k} equal Δ'_{e_{k−1}} e_n", () => {
  for (let n = 1; n <= 4; n++) {
    for (let k = 1; k <= n; k++) {
      it(`n = ${n}, k = ${k}`, () => {
        const ops = ['x', 'y', ...Array.from({ length: n - 1 }, (_, j) => `polar${j + 1}`)];
        const r = computeModule({ seed: 'superspace-vandermonde', n, k, ops }, { frobenius: true });
        expect(r.axes).toEqual(n - k > 0 ? ['x', 'y', 'theta'] : ['x', 'y']);
        expect(same(schurOfCells(n, r.cells, 1), deltaPrime(n, k))).toBe(true);
      });
    }
  }
});

describe("x-closure of δ_{n,k} equals Δ'_{e_{k−1}} e_n at t = 0 (no twist)", () => {
  for (let n = 1; n <= 5; n++) {
    for (let k = 1; k <= n; k++) {
      it(`n = ${n}, k = ${k}`, () => {
        const r = computeModule({ seed: 'superspace-vandermonde', n, k, ops: ['x'] }, { frobenius: true });
        const atT0 = new Map<string, Poly>();
        for (const [key, p] of deltaPrime(n, k)) {
          const q = p.specialize({ t: 0 });
          if (!q.isZero()) atT0.set(key, q);
        }
        expect(same(schurOfCells(n, r.cells, 1), atT0)).toBe(true);
      });
    }
  }
});
