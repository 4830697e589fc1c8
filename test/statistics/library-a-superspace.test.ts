/** The superspace families of part A against the module engine (MATH.md §4). */
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
