/** Skew standard tableaux, rook placements and Tesler matrices of part A against their sources. */
import { describe, expect, it } from 'vitest';
import { Poly } from '../../src/core/poly.js';
import { fundamentalToSchur } from '../../src/symfun/quasisym.js';
import { SymFun } from '../../src/symfun/symfun.js';
import { dist } from './dist-helper.js';

describe('skew standard tableaux', () => {
  it('Σ_T F_{Des T} = s_{λ/μ} = Σ_ν ⟨s_λ, s_μ s_ν⟩ s_ν, read through the reading word (Stanley, EC2 §7.19; the right side by the Littlewood–Richardson rule of the engine)', async () => {
    for (const [outer, inner] of [[[3, 2], [1]], [[3, 3, 1], [2, 1]], [[4, 3, 2], [2, 1]], [[3, 2, 2], [1, 1]], [[2, 2], [2]]] as const) {
      const n = outer.reduce((a, b) => a + b, 0) - inner.reduce((a, b) => a + b, 0);
      const d = await dist('skew-standard-tableaux', { outer: [...outer], inner: [...inner] }, ['skew-major-index'], { frobenius: 'descents' });
      const coeffs = new Map<number, Poly>(d.frobenius!.terms.map((t) => [t.set!.reduce((m, i) => m + 2 ** (i - 1), 0), t.series.specialize({ q: 1 })]));
      const side = fundamentalToSchur(n, coeffs);
      const sl = SymFun.basisElement('s', [...outer]);
      const smu = SymFun.basisElement('s', [...inner]);
      let skew = SymFun.zero;
      for (const nu of partitionsOf(n)) {
        const c = sl.hallInner(smu.mul(SymFun.basisElement('s', nu)));
        skew = skew.add(SymFun.basisElement('s', nu).scale(c));
      }
      expect(side.equals(skew), `${outer}/${inner}`).toBe(true);
    }
  });
});

function partitionsOf(n: number, max = n): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (let first = Math.min(n, max); first >= 1; first--) for (const rest of partitionsOf(n - first, first)) out.push([first, ...rest]);
  return out;
}
