/**
 * The expression library in process: templates with {λ} and arithmetic, values stored once by
 * hash and checked when read, the search writing a match back as an expression that evaluates
 * to the target, marked unions, and a failing family storing nothing.
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { InputError, LimitError } from '../../src/core/errors.js';
import { Poly } from '../../src/core/poly.js';
import { silentProgress } from '../../src/core/progress.js';
import { qOrderedStirling } from '../../src/core/qanalogs.js';
import { addExpressionFamily, buildExpressionLibrary } from '../../src/match/buildExpressions.js';
import { userFamily } from '../../src/match/expressionFamilies.js';
import { searchCatalogue } from '../../src/match/search.js';
import { instantiate, substituteTemplate } from '../../src/requests/template.js';
import { qtSeries, schurSeries, seriesAtOne, seriesEquals, type Series } from '../../src/series/series.js';
import { makeTarget } from '../../src/series/target.js';
import { omegaSeries, reverseSeries } from '../../src/series/seriesOps.js';
import { buildCatalogue } from '../../src/store/buildCatalogue.js';
import { Catalogue } from '../../src/store/catalogue.js';
import { expressionAt, expressionCounts, expressionFamilies, placeKey } from '../../src/store/expressionStore.js';
import { evaluateExpression } from '../../src/symfun/expression.js';

const frob = (text: string): Series => {
  const f = evaluateExpression(text).value;
  return schurSeries([...f.schurTerms()].map(([k, c]) => [k, c.toPoly()] as const));
};

let cat: Catalogue;
beforeAll(async () => {
  cat = Catalogue.open(join(mkdtempSync(join(tmpdir(), 'gradus-expr-')), 'c.sqlite'));
  await buildExpressionLibrary(cat, { nMax: 4, families: ['deltaprime-e', 'nabla-e', 'macdonald', 'nabla-s'], workers: 1, progress: silentProgress });
  buildCatalogue(cat, { nMax: 4, maxObjects: 10_000_000n, families: ['ordered-set-partitions'], progress: silentProgress });
}, 120_000);

describe('templates', () => {
  it('work out {n}, {k} arithmetic and {λ}, and rewrite a template under a parameter mapping', () => {
    expect(instantiate('deltaprime(e({k}-1), e({n}))', { n: 5, k: 2 })).toBe('deltaprime(e(1), e(5))');
    expect(instantiate('H({λ}) - HL({lambda})', { n: 4, lambda: [3, 1] })).toBe('H(3,1) - HL(3,1)');
    expect(() => instantiate('H({λ})', { n: 4 })).toThrow(/no partition here/);
    // k ↦ n − k + 1 turns e_{k−1} into e_{n−k}
    expect(substituteTemplate('deltaprime(e({k}-1), e({n}))', { k: { n: 1, k: -1, c: 1 } })).toBe('deltaprime(e({n}-{k}), e({n}))');
    expect(substituteTemplate('subs(nabla(e({n})), t=0)', { n: { n: 1, k: 0, c: 1 } })).toBe('subs(nabla(e({n}+1)), t=0)');
  });
});

describe('the library in the catalogue', () => {
  it('stores every place with its specialisations once by hash; ∇e_n has dimension (n+1)^{n−1} (Haiman, Invent. Math. 149 (2002))', () => {
    const c = expressionCounts(cat);
    expect(c.series).toBeLessThan(c.values); // equal specialisations share one stored series
    const fams = expressionFamilies(cat);
    expect(fams.find((f) => f.id === 'nabla-e')!.sizes).toEqual([1, 2, 3, 4]);
    for (let n = 1; n <= 4; n++) {
      expect(seriesEquals(expressionAt(cat, 'nabla-e', placeKey(n), 'none', 'frobenius')!.series, frob(`nabla(e(${n}))`))).toBe(true);
      expect(seriesAtOne(expressionAt(cat, 'nabla-e', placeKey(n), 'q=1', 'hilbert')!.series), `n=${n}`).toBe(BigInt((n + 1) ** (n - 1)));
    }
  });
  it('writes a match back as an expression that evaluates to the target: R_{n,k} as revq ω of Δ′_{e_{k−1}} e_n at t = 0', () => {
    // built here from the engine, then searched: the twist and the specialisation must come back
    const entries = [];
    for (let n = 1; n <= 4; n++) for (let k = 1; k <= n; k++) entries.push({ n, k, series: reverseSeries(omegaSeries(frob(`subs(deltaprime(e(${k - 1}), e(${n})), t=0)`))) });
    const out = searchCatalogue(cat, makeTarget('twisted', entries));
    const m = out.expressions[0]!;
    expect([m.family, m.specialisation, m.variant, m.mapping, m.verified]).toEqual(['deltaprime-e', 't=0', 'omega-q-reversed', 'n ↦ n, k ↦ k', 'n = 1..4, all k = 1..n']);
    expect(m.expression).toBe('revq(omega(subs(deltaprime(e({k}-1), e({n})), t=0)))');
    for (const e of entries) expect(seriesEquals(frob(instantiate(m.expression, e)), e.series), `n=${e.n} k=${e.k}`).toBe(true);
  });
  it('finds a family indexed by a partition through a shape rule: H̃_(n−1,1), and ±∇s_λ with its sign', () => {
    const hooks = [2, 3, 4].map((n) => ({ n, series: frob(`H(${n - 1},1)`) }));
    const m = searchCatalogue(cat, makeTarget('hooks', hooks)).expressions.find((x) => x.family === 'macdonald');
    expect(m?.mapping).toBe('λ = (n−1, 1)');
    expect(m?.verified).toBe('n = 2..4');
    const minus = searchCatalogue(cat, makeTarget('one', [{ n: 4, series: omegaSeries(frob('-nabla(s(2,2))')) }])).expressions.find((x) => x.family === 'nabla-s');
    // −∇s_(2,2) is Schur positive (the sign conjecture of Bergeron–Garsia–Haiman–Tesler, Methods Appl. Anal. 6 (1999), from memory; compared here)
    expect(minus?.example).toBe('omega(-nabla(s(2,2)))');
  });
  it('reads a q,t-series over n as a marked union: Σ_k t^{n−k} [k]_q! Stir_q(n,k) is ordered set partitions by inv ("The Hilbert series of the superspace coinvariant ring", Rhoades–Wilson, from memory)', () => {
    const entries = [1, 2, 3, 4].map((n) => {
      let p = Poly.zero;
      for (let k = 1; k <= n; k++) p = p.add(qOrderedStirling(n, k).mul(Poly.monomial(1n, 0, n - k)));
      return { n, series: qtSeries(p) };
    });
    const out = searchCatalogue(cat, makeTarget('superspace coinvariant Hilbert series', entries));
    const m = out.matches.find((x) => x.family === 'ordered-set-partitions' && x.marker === 't^{n−k}' && x.statistics.join() === 'osp-inv');
    expect(m?.verified).toBe('n = 1..4, all k = 1..n'); // the zero slices k = 0 agree with a family that has none there
    expect(out.tried.readings?.[0]).toMatch(/marked union/);
  });
});

describe('a family that fails', () => {
  it('names the place and the reason, and stores nothing (division by zero; a degree above the limit)', async () => {
    const before = expressionCounts(cat);
    const bad = userFamily('my-ratio', '6*e({n})/(3-{n})', undefined, undefined);
    await expect(addExpressionFamily(cat, bad, 4, 1, silentProgress)).rejects.toThrow(/my-ratio fails at n = 3 \(6\*e\(3\)\/\(0\)\): .*division is only by a non-zero integer/);
    const big = userFamily('my-big', 'e({n}+16)', undefined, undefined);
    await expect(addExpressionFamily(cat, big, 3, 1, silentProgress)).rejects.toBeInstanceOf(LimitError);
    await expect(addExpressionFamily(cat, big, 3, 1, silentProgress)).rejects.toThrow(/my-big fails at n = 1 \(e\(17\)\): .*degree 17 is above 16/);
    expect(expressionCounts(cat)).toEqual(before);
    expect(expressionFamilies(cat).map((f) => f.id)).not.toContain('my-ratio');
    expect(() => userFamily('nabla-e', 'nabla(e({n}))', undefined, undefined)).toThrow(InputError);
    await expect(addExpressionFamily(cat, userFamily('my-typo', 'nabla(ee({n}))', undefined, undefined), 2, 1, silentProgress)).rejects.toThrow(/my-typo fails at n = 1 .*unknown function "ee"/);
  });
});

describe('reading the library back', () => {
  it('an edited series is caught by its hash, as a damaged catalogue with the command that rebuilds it', async () => {
    const path = join(mkdtempSync(join(tmpdir(), 'gradus-expr-bad-')), 'c.sqlite');
    const c = Catalogue.open(path);
    await buildExpressionLibrary(c, { nMax: 3, families: ['pleth-h-q'], workers: 1, progress: silentProgress });
    c.db.prepare("UPDATE expression_series SET series = replace(series, '[0,1,1]', '[0,1,2]') WHERE series LIKE '%[0,1,1]%'").run();
    expect(() => expressionAt(c, 'pleth-h-q', placeKey(3), 'none', 'frobenius')).toThrow(/damaged .*gradus catalogue rebuild/);
    c.close();
  });
});
