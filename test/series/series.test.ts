import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Poly } from '../../src/core/poly.js';
import { qBinomial, qFactorial, qStirling2 } from '../../src/core/qanalogs.js';
import { seriesFromDocument } from '../../src/series/fromDocument.js';
import { parseCoeffs } from '../../src/series/parseCoeffs.js';
import { hilbertOfSchur, qSeries, qtSeries, schurSeries, seriesAtOne, seriesEquals } from '../../src/series/series.js';
import { seriesFromJson, seriesToJson } from '../../src/series/seriesJson.js';
import { isPalindromic, isUnimodal, omegaSeries, reverseSeries, swapSeries } from '../../src/series/seriesOps.js';
import { makeTarget, rangeText } from '../../src/series/target.js';
import { targetFromJson, targetToJson } from '../../src/series/targetFile.js';

const smallPoly = fc
  .array(fc.tuple(fc.nat(6), fc.nat(4), fc.bigInt(-5n, 5n)), { maxLength: 8 })
  .map((ts) => Poly.fromTerms(ts.map(([i, j, c]) => [i, j, c] as const)));

describe('series', () => {
  it('JSON round trip for q,t series and Frobenius series (property)', () => {
    fc.assert(
      fc.property(smallPoly, smallPoly, (a, b) => {
        const s = qtSeries(a);
        expect(seriesEquals(seriesFromJson(seriesToJson(s), 't'), s)).toBe(true);
        const f = schurSeries([[[2, 1], a], [[3], b]]);
        expect(seriesEquals(seriesFromJson(seriesToJson(f), 't'), f)).toBe(true);
      }),
    );
  });
  it('reversal, ω and swap are involutions (property)', () => {
    fc.assert(
      fc.property(smallPoly, smallPoly, (a, b) => {
        const f = schurSeries([[[2, 1], a], [[1, 1, 1], b]]);
        expect(seriesEquals(omegaSeries(omegaSeries(f)), f)).toBe(true);
        expect(seriesEquals(swapSeries(swapSeries(f)), f)).toBe(true);
        const g = qtSeries(a.shift(0, 0));
        if (!a.isZero() && a.minDegQ() === 0) expect(seriesEquals(reverseSeries(reverseSeries(g)), g)).toBe(true);
      }),
    );
  });
  it('ω conjugates partitions: ω(s_3 + q s_21) = s_111 + q s_21 (Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., ch. I)', () => {
    const f = schurSeries([[[3], Poly.one], [[2, 1], Poly.q]]);
    const g = schurSeries([[[1, 1, 1], Poly.one], [[2, 1], Poly.q]]);
    expect(seriesEquals(omegaSeries(f), g)).toBe(true);
  });
  it('count at one and Hilbert series of a Frobenius series: s_21 has f = 2 (common practice)', () => {
    const f = schurSeries([[[3], Poly.one], [[2, 1], Poly.q.add(Poly.q.pow(2))], [[1, 1, 1], Poly.q.pow(3)]]);
    // Σ_T q^maj(T) s_shape for n = 3 gives [3]_q! (Lusztig–Stanley; Stanley, Bull. Amer. Math. Soc. 1 (1979) — from memory)
    expect(seriesEquals(hilbertOfSchur(f), qSeries(qFactorial(3)))).toBe(true);
    expect(seriesAtOne(f)).toBe(6n);
  });
  it('flags: q-binomials are palindromic and unimodal (Sylvester; common practice); 1+q^2 is not unimodal', () => {
    expect(isPalindromic(qBinomial(6, 3))).toBe(true);
    expect(isUnimodal(qBinomial(6, 3))).toBe(true);
    expect(isUnimodal(Poly.fromQCoeffs([1, 0, 1]))).toBe(false);
    expect(isPalindromic(Poly.fromQCoeffs([1, 2]))).toBe(false);
    expect(isUnimodal(Poly.fromQCoeffs([1, 3, 2, 4]))).toBe(false);
    // Stir_q(4,2) = 3 + 3q + q^2: unimodal, not palindromic (Carlitz's q-Stirling recurrence, by hand)
    expect(isUnimodal(qStirling2(4, 2))).toBe(true);
    expect(isPalindromic(qStirling2(4, 2))).toBe(false);
  });
  it('typed coefficients and the target-file format round trip', () => {
    const t = parseCoeffs('n=2:1,1; n=3:1,2,2,1');
    expect(t.kind).toBe('q');
    expect(rangeText(t.entries)).toBe('n = 2..3');
    const back = targetFromJson(JSON.parse(JSON.stringify(targetToJson(t))));
    expect(back.entries.length).toBe(2);
    expect(seriesEquals(back.entries[1]!.series, qSeries(qFactorial(3)))).toBe(true);
    const qt = parseCoeffs('n=2,k=1:0,1|1');
    expect(qt.kind).toBe('qt');
    expect(() => parseCoeffs('n=2:1,x')).toThrow(/integers/);
    expect(() => targetFromJson({ format: 'other', version: 1 })).toThrow(/format/);
    expect(() => targetFromJson({ format: 'gradus-target', version: 9, kind: 'q', entries: [] })).toThrow(/version/);
  });
  it('range text says "all k" only when every k = 1..n is there', () => {
    const e = (n: number, k: number) => ({ n, k, series: qSeries(Poly.one) });
    expect(rangeText(makeTarget('x', [e(1, 1), e(2, 1), e(2, 2)]).entries)).toBe('n = 1..2, all k = 1..n');
    expect(rangeText([e(1, 1), e(2, 2)])).toBe('(1,1) (2,2)');
  });
  it('reads the three data documents (dist, sym, module)', () => {
    const sym = { expression: 'x', degree: 2, basis: 's', terms: { '2': [[1]], '1,1': [[0, 1], [1]] } };
    expect(seriesFromDocument(sym, 'auto', 'sym').kind).toBe('schur');
    // ⟨∇e_2, e_2⟩ = q + t (∇e_2 = s_2 + (q+t) s_11: Haglund, AMS 2008, ch. 2 — from memory)
    expect(seriesEquals(seriesFromDocument(sym, 'sign', 'sym'), qtSeries(Poly.q.add(Poly.t)))).toBe(true);
    const mod = { axes: ['x'], hilbertSeries: [1, 1], schur: { '2': [1], '1,1': [0, 1] } };
    expect(seriesEquals(seriesFromDocument(mod, 'hilbert', 'm'), qSeries(Poly.fromQCoeffs([1, 1])))).toBe(true);
    const dist = { family: 'f', params: { n: 2 }, statistics: ['s'], series: [1, 1], count: 2 };
    expect(seriesFromDocument(dist, 'auto', 'd').kind).toBe('q');
    expect(() => seriesFromDocument(dist, 'sign', 'd')).toThrow(/Frobenius/);
  });
});

describe('module tables with three axes', () => {
  it('drops axes held at one degree; three varying axes stay a multigraded table', async () => {
    const { gradedFromTable } = await import('../../src/series/fromDocument.js');
    // x, y, θ with θ always 1: a q,t series q + t (made up for the test)
    const s = gradedFromTable([[[0, 0], [0, 1]], [[0, 1], [0, 0]]], ['x', 'y', 'theta'], 'm');
    expect(seriesEquals(s, qtSeries(Poly.q.add(Poly.t)))).toBe(true);
    const m = gradedFromTable([[[1, 0], [0, 0]], [[0, 0], [0, 1]]], ['x', 'y', 'theta'], 'm');
    expect(m.kind).toBe('multi');
  });
});
