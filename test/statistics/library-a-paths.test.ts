/** Schröder and Motzkin paths of part A: classical distributions against their sources. */
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
