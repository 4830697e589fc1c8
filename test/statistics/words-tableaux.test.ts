/** Words (MacMahon), tableaux (q-hook formula) and charge (Kostka–Foulkes polynomials). */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { transformById } from '../../objects/transforms/index.js';
import { hookLengths, nStat, partitions, size } from '../../src/core/partitions.js';
import { Poly } from '../../src/core/poly.js';
import { qFactorial, qInteger, qMultinomial } from '../../src/core/qanalogs.js';
import { kostkaNumber } from '../../src/symfun/kostka.js';
import { wordCharge, wordCocharge } from '../../statistics/charge.js';
import { wordInversions } from '../../statistics/word-inversions.js';
import { wordMajorIndex } from '../../statistics/word-major-index.js';
import { dist } from './dist-helper.js';

/** q^{n(λ)} [n]_q! / Π_c [h(c)]_q (Stanley, EC2 Cor. 7.21.5). */
function qHook(l: readonly number[]): Poly {
  let den = Poly.one;
  for (const row of hookLengths(l)) for (const h of row) den = den.mul(qInteger(h));
  return qFactorial(size(l)).divExact(den).shift(nStat(l));
}

const arbContent = fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 1, maxLength: 4 }).filter((c) => c.reduce((a, b) => a + b, 0) <= 8);

describe('statistics on words', () => {
  it('inv and maj on words of any content have the q-multinomial distribution (MacMahon 1915; Stanley, EC1 §1.7)', async () => {
    await fc.assert(
      fc.asyncProperty(arbContent, async (content) => {
        const target = qMultinomial(content);
        expect((await dist('words', { content }, ['word-inversions'])).series.equals(target)).toBe(true);
        expect((await dist('words', { content }, ['word-major-index'])).series.equals(target)).toBe(true);
      }),
      { numRuns: 25 },
    );
  });

  it('Foata\'s map on words carries maj to inv, word by word (Foata 1968; Lothaire §10.6)', () => {
    const phi = transformById('word-foata');
    for (const content of [[2, 1, 1], [2, 2, 1], [1, 3, 2]]) {
      for (const w of familyById('words').generate({ content })) {
        expect(wordInversions.compute(phi.apply(w) as number[])).toBe(wordMajorIndex.compute(w as number[]));
      }
    }
  });

  it('charge + cocharge = n(μ) on words of partition content μ (Lascoux–Schützenberger)', () => {
    for (const mu of [[2, 1], [2, 2], [3, 2, 1], [2, 1, 1], [1, 1, 1, 1]]) {
      for (const w of familyById('words').generate({ content: mu })) {
        expect(wordCharge.compute(w as number[]) + wordCocharge.compute(w as number[])).toBe(nStat(mu));
      }
    }
  });
});

describe('statistics on tableaux', () => {
  it('Σ_{T ∈ SYT(λ)} q^{maj T} is the q-hook formula for every λ ⊢ n ≤ 7 (Stanley, EC2 Cor. 7.21.5)', async () => {
    for (let n = 0; n <= 7; n++) {
      for (const l of partitions(n)) {
        expect((await dist('standard-tableaux', { shape: l }, ['tableau-major-index'])).series.equals(qHook(l)), `λ=${l.join(',')}`).toBe(true);
      }
    }
  });

  it('Σ_λ f^λ Σ_{T ∈ SYT(λ)} q^{maj T} = [n]_q! for n ≤ 6 (RSK and descents; Stanley, EC2 §7.23)', async () => {
    // RSK: Σ_w q^{imaj w} = Σ_λ f^λ Σ_{T∈SYT(λ)} q^{maj T} (Stanley, EC2 §7.23), and imaj is Mahonian.
    for (let n = 1; n <= 6; n++) {
      let sum = Poly.zero;
      for (const l of partitions(n)) {
        const f = (await dist('standard-tableaux', { shape: l }, ['tableau-major-index'])).count;
        sum = sum.add(qHook(l).scale(f));
      }
      expect(sum.equals(qFactorial(n))).toBe(true);
    }
  });

  it('Σ over SSYT(λ, μ) of q^charge: Kostka numbers at q = 1 (src/symfun kostkaNumber), K_{(n),μ} = q^{n(μ)}, K_{λλ} = 1 (Macdonald III.6, from memory)', async () => {
    for (let n = 1; n <= 6; n++) {
      for (const l of partitions(n)) {
        for (const mu of partitions(n)) {
          const k = kostkaNumber(l, mu);
          if (k === 0n) continue;
          const d = await dist('semistandard-tableaux', { shape: l, content: mu }, ['tableau-charge', 'tableau-cocharge']);
          expect(d.series.sumCoefficients()).toBe(k);
          for (const [c, cc] of d.series.terms()) expect(c + cc).toBe(nStat(mu));
          if (l.length === 1) expect(d.series.equals(Poly.monomial(1n, nStat(mu), 0))).toBe(true);
          if (l.join() === mu.join()) expect(d.series.equals(Poly.monomial(1n, 0, nStat(mu)))).toBe(true); // charge 0
        }
      }
    }
  });

  it('cocharge on SSYT(λ, 1^n) has the distribution of maj on SYT(λ) (Lascoux–Schützenberger; EC2 Cor. 7.21.5)', async () => {
    for (let n = 1; n <= 6; n++) {
      for (const l of partitions(n)) {
        const d = await dist('semistandard-tableaux', { shape: l, content: new Array<number>(n).fill(1) }, ['tableau-cocharge']);
        expect(d.series.equals(qHook(l)), `λ=${l.join(',')}`).toBe(true);
      }
    }
    // K_{(2,1),(1,1,1)}(q) = q + q^2 (Macdonald III.6 table, from memory; the hook formula above is the independent check)
    expect((await dist('semistandard-tableaux', { shape: [2, 1], content: [1, 1, 1] }, ['tableau-charge'])).series.toQArray()).toEqual([0n, 1n, 1n]);
  });
});
