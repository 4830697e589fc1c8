/** Skew standard tableaux, rook placements and Tesler matrices of part A against their sources. */
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { conjugateRooks } from '../../objects/transforms/rook-conjugate.js';
import type { RookPlacement } from '../../objects/types.js';
import { Poly } from '../../src/core/poly.js';
import { qInteger, qStirling2 } from '../../src/core/qanalogs.js';
import { statisticById } from '../../statistics/index.js';
import { nabla } from '../../src/symfun/operators.js';
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

/** R_k(B, q) = Σ q^inv over the placements of k rooks on the board of λ. */
async function qRook(shape: number[], k: number): Promise<Poly> {
  return (await dist('rook-placements', { shape, k }, ['rook-inv'])).series;
}

describe('Garsia–Remmel q-rook numbers', () => {
  it('factorization Σ_k R_k(B,q)·[x]_q[x−1]_q…[x−c+k+1]_q = Π_i [x + h_i − i + 1]_q for c columns of heights h_1 ≤ … ≤ h_c, at x = c..c+3 (Garsia–Remmel, J. Combin. Theory Ser. A 41 (1986), the factorization theorem)', async () => {
    for (const shape of [[2, 2, 1], [3, 3, 1], [4, 2, 2, 1], [3, 3, 3], [5, 3, 1], [4, 4, 4, 4]]) {
      const h = [...shape].reverse();
      const c = h.length;
      const R: Poly[] = [];
      for (let k = 0; k <= c; k++) R.push(await qRook(shape, k));
      for (let x = c; x <= c + 3; x++) {
        let left = Poly.zero;
        R.forEach((r, k) => {
          let f = r;
          for (let i = 0; i < c - k; i++) f = f.mul(qInteger(x - i));
          left = left.add(f);
        });
        const right = h.reduce((p, hi, i) => p.mul(qInteger(x + hi - i)), Poly.one);
        expect(left.equals(right), `${shape} x=${x}`).toBe(true);
      }
    }
  });
  it('staircase of size n: R_k = q^{C(n−k,2)}·Stir_q(n, n−k) with the Stir_q of Carlitz (Garsia–Remmel 1986: their q-Stirling numbers, from memory of the normalisation; checked for n ≤ 7)', async () => {
    for (let n = 1; n <= 7; n++) {
      for (let k = 0; k < n; k++) {
        const r = (await dist('rook-placements', { n, k }, ['rook-inv'])).series;
        const m = n - k;
        expect(r.equals(qStirling2(n, m).shift((m * (m - 1)) / 2)), `n=${n} k=${k}`).toBe(true);
      }
    }
  });
  it('the antidiagonal reflection carries the boards of λ to λ′ with the same q-rook numbers (checked here for a few boards)', () => {
    const inv = (x: RookPlacement): number => statisticById('rook-inv').compute(x);
    for (const shape of [[2, 2, 1], [3, 3, 1], [4, 2, 2, 1], [5, 3, 1]]) {
      for (let k = 0; k <= 3; k++) {
        let a = Poly.zero;
        let b = Poly.zero;
        for (const x of familyById('rook-placements').generate({ shape, k })) {
          a = a.add(Poly.monomial(1n, inv(x as RookPlacement)));
          b = b.add(Poly.monomial(1n, inv(conjugateRooks(x as RookPlacement))));
        }
        expect(a.equals(b), `${shape} k=${k}`).toBe(true);
      }
    }
  });
});

function partitionsOf(n: number, max = n): number[][] {
  if (n === 0) return [[]];
  const out: number[][] = [];
  for (let first = Math.min(n, max); first >= 1; first--) for (const rest of partitionsOf(n - first, first)) out.push([first, ...rest]);
  return out;
}

describe("Haglund's Tesler formula", () => {
  /** Haglund's weight (−M)^{pos−n} Π_{a>0} [a]_{q,t}, M = (1−q)(1−t), [a]_{q,t} = (q^a − t^a)/(q − t). */
  function weight(m: readonly (readonly number[])[]): Poly {
    const M = Poly.one.sub(Poly.q).mul(Poly.one.sub(Poly.t));
    let w = Poly.one;
    let pos = 0;
    for (const x of m.flat()) {
      if (x <= 0) continue;
      pos++;
      w = w.mul(Poly.fromTerms(Array.from({ length: x }, (_, i) => [i, x - 1 - i, 1n] as const)));
    }
    return w.mul(M.neg().pow(pos - m.length));
  }
  it('Σ over Tesler matrices of the weight is the Hilbert series of ∇e_n, n ≤ 5 (Haglund, Adv. Math. 227 (2011), main theorem; the right side from the engine)', () => {
    for (let n = 1; n <= 5; n++) {
      let sum = Poly.zero;
      for (const m of familyById('tesler-matrices').generate({ n })) sum = sum.add(weight(m as number[][]));
      expect(sum.equals(nabla(SymFun.basisElement('e', [n])).hilbert().toPoly()), `n=${n}`).toBe(true);
    }
  });
  it('at q = t = 1 only matrices with n positive entries count, and Σ Π a_ij over them is (n+1)^{n−1} (same theorem at q = t = 1; Haiman 2002 for the dimension)', async () => {
    for (let n = 1; n <= 6; n++) {
      let s = 0;
      for (const m of familyById('tesler-matrices').generate({ n })) {
        const pos = (m as number[][]).flat().filter((x) => x > 0);
        if (pos.length === n) s += pos.reduce((a, b) => a * b, 1);
      }
      expect(s).toBe((n + 1) ** (n - 1));
      const d = (await dist('tesler-matrices', { n }, ['tesler-positive-entries'])).series;
      expect(d.coeff(n) > 0n && [...Array(n).keys()].every((j) => d.coeff(j) === 0n)).toBe(true); // each row holds 1 + its inflow, so pos ≥ n
    }
  });
});
