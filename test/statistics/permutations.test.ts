/** Classical distributions of permutation statistics, by exhaustive enumeration. */
import { catalan, stirlingS2 } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import { Poly } from '../../src/core/poly.js';
import { qFactorial, qInteger } from '../../src/core/qanalogs.js';
import { inversions } from '../../statistics/inversions.js';
import { majorIndex } from '../../statistics/major-index.js';
import { dist } from './dist-helper.js';

const swap = (p: Poly): Poly => p.swapQT();

describe('permutation statistics', () => {
  it('inv, maj, imaj and den are Mahonian: Σ q^stat = [n]_q! for n ≤ 7 (MacMahon 1915; Stanley, EC1 §1.3–1.4)', async () => {
    for (let n = 0; n <= 7; n++) {
      for (const s of ['inversions', 'major-index', 'inverse-major-index', 'denert']) {
        expect((await dist('permutations', { n }, [s])).series.equals(qFactorial(n)), `${s}, n=${n}`).toBe(true);
      }
    }
  });

  it('(exc, den) has the joint distribution of (des, maj) for n ≤ 7 (Foata–Zeilberger 1990)', async () => {
    for (let n = 1; n <= 7; n++) {
      const a = await dist('permutations', { n }, ['excedances', 'denert']);
      const b = await dist('permutations', { n }, ['descents', 'major-index']);
      expect(a.series.equals(b.series), `n=${n}`).toBe(true);
    }
  });

  it('des and exc are Eulerian: equidistributed, with A(4,·) = 1, 11, 11, 1 (Stanley EC1 §1.4, from memory)', async () => {
    for (let n = 0; n <= 7; n++) {
      const d = await dist('permutations', { n }, ['descents']);
      expect(d.series.equals((await dist('permutations', { n }, ['excedances'])).series), `n=${n}`).toBe(true);
      // weak excedances are distributed as descents shifted by one (n ≥ 1)
      if (n >= 1) expect((await dist('permutations', { n }, ['weak-excedances'])).series.equals(d.series.shift(1))).toBe(true);
    }
    expect((await dist('permutations', { n: 4 }, ['descents'])).series.toQArray()).toEqual([1n, 11n, 11n, 1n]);
  });

  it('cycles and left-to-right minima have distribution q(q+1)…(q+n−1) (Stanley, EC1 §1.3)', async () => {
    for (let n = 1; n <= 7; n++) {
      let rising = Poly.one;
      for (let i = 0; i < n; i++) rising = rising.mul(Poly.q.add(Poly.constant(i)));
      for (const s of ['cycles', 'left-to-right-minima', 'left-to-right-maxima', 'right-to-left-minima', 'right-to-left-maxima']) {
        expect((await dist('permutations', { n }, [s])).series.equals(rising), `${s}, n=${n}`).toBe(true);
      }
    }
  });

  it('(inv, maj) is symmetric (Foata–Schützenberger, Math. Nachr. 1978) and so is (maj, imaj) (by w ↦ w⁻¹), n ≤ 6', async () => {
    for (let n = 1; n <= 6; n++) {
      const a = (await dist('permutations', { n }, ['inversions', 'major-index'])).series;
      expect(a.equals(swap(a))).toBe(true);
      const b = (await dist('permutations', { n }, ['major-index', 'inverse-major-index'])).series;
      expect(b.equals(swap(b))).toBe(true);
    }
  });

  it("Foata's bijection carries maj to inv, object by object (n ≤ 6) and so in distribution (Foata 1968)", async () => {
    const foata = transformById('foata');
    for (let n = 0; n <= 6; n++) {
      for (const w of familyById('permutations').generate({ n })) {
        expect(inversions.compute(foata.apply(w) as number[])).toBe(majorIndex.compute(w as number[]));
      }
      // jointly: Σ q^{maj w} t^{inv Φ(w)} lies on the diagonal, and Σ q^{inv Φ(w)} = [n]_q!
      const joint = await dist('permutations', { n }, ['major-index', 'foata:inversions']);
      for (const [i, j] of joint.series.terms()) expect(i).toBe(j);
      expect((await dist('permutations', { n }, ['inversions'], { transform: 'foata' })).series.equals(qFactorial(n))).toBe(true);
    }
  });

  it('fixed points: derangements D_n = (n−1)(D_{n−1} + D_{n−2}) (common practice), D_5 = 44 (from memory)', async () => {
    const d: bigint[] = [1n, 0n];
    for (let n = 2; n <= 7; n++) d.push(BigInt(n - 1) * (d[n - 1]! + d[n - 2]!));
    for (let n = 0; n <= 7; n++) expect((await dist('permutations', { n }, ['fixed-points'])).series.coeff(0)).toBe(d[n]);
    expect(d[5]).toBe(44n);
  });

  it('permutations with no increasing subsequence of length 3 are counted by Catalan numbers (mathjs catalan)', async () => {
    for (let n = 1; n <= 7; n++) {
      const s = (await dist('permutations', { n }, ['longest-increasing-subsequence'])).series;
      expect(s.coeff(1) + s.coeff(2)).toBe(BigInt(catalan(n)));
    }
  });

  it('peaks + valleys and ascents + descents fit their totals; [n]_q-weighted checks (common practice)', async () => {
    for (let n = 2; n <= 6; n++) {
      const a = (await dist('permutations', { n }, ['ascents', 'descents'])).series;
      for (const [i, j] of a.terms()) expect(i + j).toBe(n - 1);
    }
    // peaks on S_3: 132 and 231 have a peak: 2 of 6
    expect((await dist('permutations', { n: 3 }, ['peaks'])).series.toQArray()).toEqual([4n, 2n]);
    expect(qInteger(3).sumCoefficients()).toBe(3n);
    expect(stirlingS2(3, 2)).toBe(3); // sanity of the reference library import
  });
});
