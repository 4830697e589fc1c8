/** Schröder paths, Motzkin paths and noncrossing partitions of part A: classical distributions against their sources. */
import { catalan, combinations } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { nabla } from '../../src/symfun/operators.js';
import { SymFun } from '../../src/symfun/symfun.js';
import { dist } from './dist-helper.js';

const e = (k: number): SymFun => (k === 0 ? SymFun.one : SymFun.basisElement('e', [k]));
const h = (k: number): SymFun => (k === 0 ? SymFun.one : SymFun.basisElement('h', [k]));

describe('q,t-Schröder polynomials', () => {
  it('Σ q^area t^bounce = Σ q^dinv t^area = ⟨∇e_n, e_{n−d}h_d⟩ over paths with d diagonal steps, n ≤ 6 (Haglund, AMS 2008, ch. 4; the q,t-Schröder theorem, Haglund, IMRN 2004)', async () => {
    for (let n = 1; n <= 6; n++) {
      const nab = nabla(e(n));
      for (let d = 0; d <= n; d++) {
        const target = nab.hallInner(e(n - d).mul(h(d))).toPoly();
        const ab = (await dist('schroder-paths', { n, d }, ['schroder-area', 'schroder-bounce'])).series;
        const da = (await dist('schroder-paths', { n, d }, ['schroder-dinv', 'schroder-area'])).series;
        expect(ab.equals(target), `area/bounce n=${n} d=${d}`).toBe(true);
        expect(da.equals(target), `dinv/area n=${n} d=${d}`).toBe(true);
        expect(target.equals(target.swapQT())).toBe(true); // the q,t-symmetry the theorem implies
      }
    }
  });
});

describe('Motzkin paths', () => {
  it("Touchard's identity: Σ_k C(n,2k)·2^{n−2k}·Cat(k) = Cat(n+1), i.e. the level-step distribution at q = 2 is a Catalan number, n ≤ 10 (Touchard 1924, from memory; mathjs catalan)", async () => {
    for (let n = 0; n <= 10; n++) {
      const d = (await dist('motzkin-paths', { n }, ['motzkin-level-steps'])).series;
      expect(d.evaluate(2n)).toBe(BigInt(catalan(n + 1)));
    }
  });
  it('paths with no level step at height 0 are the Riordan numbers r_n, with M_n = r_n + r_{n+1} (from memory; checked against the counts)', async () => {
    const riordan = [1, 0, 1, 1, 3, 6, 15, 36, 91, 232]; // from memory
    for (let n = 0; n <= 9; n++) {
      const d = (await dist('motzkin-paths', { n }, ['motzkin-ground-levels'])).series;
      expect(d.coeff(0), `n=${n}`).toBe(BigInt(riordan[n]!));
      if (n < 9) expect(d.sumCoefficients()).toBe(BigInt(riordan[n]! + riordan[n + 1]!));
    }
  });
  it('reversal keeps area, height and up steps (their distributions are unchanged), n ≤ 8 (common practice)', async () => {
    for (const s of ['motzkin-area', 'motzkin-height', 'motzkin-up-steps', 'motzkin-peaks']) {
      const a = (await dist('motzkin-paths', { n: 8 }, [s])).series;
      const b = (await dist('motzkin-paths', { n: 8 }, [s], { transform: 'motzkin-reverse' })).series;
      expect(a.equals(b), s).toBe(true);
    }
  });
});

describe('noncrossing partitions', () => {
  it('blocks: Narayana numbers C(n,k)C(n,k−1)/n; partitions without singletons: Riordan numbers r_n, n ≤ 9 (Kreweras 1972; Riordan numbers from memory)', async () => {
    const riordan = [1, 0, 1, 1, 3, 6, 15, 36, 91, 232];
    for (let n = 1; n <= 9; n++) {
      const blocks = (await dist('noncrossing-partitions', { n }, ['nc-blocks'])).series;
      for (let k = 1; k <= n; k++) expect(blocks.coeff(k)).toBe(BigInt((combinations(n, k) * combinations(n, k - 1)) / n));
      const singles = (await dist('noncrossing-partitions', { n }, ['nc-singletons'])).series;
      expect(singles.coeff(0), `n=${n}`).toBe(BigInt(riordan[n]!));
    }
  });
});

describe('parallelogram polyominoes', () => {
  it('the total area of those of semiperimeter n is 4^{n−2}, n ≤ 10 (a classical identity, from memory)', async () => {
    for (let n = 2; n <= 10; n++) {
      const d = (await dist('parallelogram-polyominoes', { n }, ['polyomino-area'])).series;
      let total = 0n;
      for (const [i, , c] of d.sortedTerms()) total += BigInt(i) * c;
      expect(total, `n=${n}`).toBe(4n ** BigInt(n - 2));
    }
  });
  it('reflection in y = x swaps width and height and keeps the area: (width, area) and (height, area) are equidistributed, n ≤ 9 (common practice)', async () => {
    for (let n = 2; n <= 9; n++) {
      const wa = (await dist('parallelogram-polyominoes', { n }, ['polyomino-width', 'polyomino-area'])).series;
      const ha = (await dist('parallelogram-polyominoes', { n }, ['polyomino-height', 'polyomino-area'])).series;
      const viaMap = (await dist('parallelogram-polyominoes', { n }, ['polyomino-height', 'polyomino-area'], { transform: 'polyomino-transpose' })).series;
      expect(wa.equals(ha)).toBe(true);
      expect(viaMap.equals(wa)).toBe(true);
    }
  });
});
