/** The superspace families of part A against the module engine (Rhoades–Wilson, Forum Math. Sigma 10 (2022)). */
import { describe, expect, it } from 'vitest';
import { computeModule } from '../../src/modules/compute-module.js';
import { dist } from './dist-helper.js';

describe('ordered set superpartitions and the superspace module of δ_{n,k}', () => {
  it('the objects with j bars are as many as the θ-degree-j part of the closure of δ_{n,k} under ∂x and ∂θ (Rhoades–Wilson, Forum Math. Sigma 10 (2022): a basis indexed by ordered set superpartitions; the dimensions computed here by the module engine)', async () => {
    for (const [n, k] of [[3, 2], [4, 2], [4, 3], [5, 3]] as const) {
      const r = computeModule({ seed: 'superspace-vandermonde', n, k, ops: ['x', 'theta'] }, { frobenius: false });
      const bars = (await dist('ordered-set-superpartitions', { n, k }, ['ossp-bars'])).series;
      for (let j = 0; j <= n - k; j++) {
        const dim = r.cells.filter((c) => c.degree[2] === j).reduce((s, c) => s + c.dim, 0);
        expect(bars.coeff(j), `n=${n} k=${k} θ-degree ${j}`).toBe(BigInt(dim));
      }
    }
  });
});

describe('superpartitions', () => {
  it('Σ z^m over superpartitions of degree n, m the fermionic degree, is the coefficient of q^n in Π_{i≥0}(1 + z q^i) / Π_{i≥1}(1 − q^i), n ≤ 10 (Desrosiers–Lapointe–Mathieu, J. Algebraic Combin. 24 (2006) §2, from memory; the product expanded here)', async () => {
    const N = 10;
    // table[m][n] of the product, truncated at q^N.
    let table: number[][] = [[1, ...new Array<number>(N).fill(0)]];
    for (let i = 0; i <= N; i++) {
      const next = Array.from({ length: table.length + 1 }, () => new Array<number>(N + 1).fill(0));
      table.forEach((row, m) => row.forEach((c, n) => {
        next[m]![n]! += c;
        if (n + i <= N) next[m + 1]![n + i]! += c;
      }));
      table = next;
    }
    for (let i = 1; i <= N; i++) {
      // Multiply by 1/(1 − q^i): a running sum with step i.
      for (const row of table) for (let n = i; n <= N; n++) row[n]! += row[n - i]!;
    }
    for (let n = 0; n <= N; n++) {
      const d = (await dist('superpartitions', { n }, ['superpartition-fermionic-degree'])).series;
      table.forEach((row, m) => expect(d.coeff(m), `n=${n} m=${m}`).toBe(BigInt(row[n]!)));
    }
  });
});
