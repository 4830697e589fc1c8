/**
 * What the catalogue holds for the Delta family and the shape- and content-indexed families,
 * checked against the symmetric-function engine on a catalogue of n ≤ 4 built here, and found
 * again by the search.
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FAMILIES } from '../../objects/index.js';
import { silentProgress } from '../../src/core/progress.js';
import { searchCatalogue } from '../../src/match/search.js';
import { compute, requestFromWords } from '../../src/requests/index.js';
import { seriesFromDocument } from '../../src/series/fromDocument.js';
import { seriesEquals, type Series } from '../../src/series/series.js';
import { makeTarget } from '../../src/series/target.js';
import { buildCatalogue } from '../../src/store/buildCatalogue.js';
import { Catalogue, type PlaceParams } from '../../src/store/catalogue.js';
import { coverage, planUnits } from '../../src/store/planUnits.js';

const N = 4;
let cat: Catalogue;

async function sym(expression: string): Promise<Series> {
  return seriesFromDocument((await compute(requestFromWords(['sym', expression], process.cwd()))).document, 'auto', expression);
}

function row(family: string, params: PlaceParams, statistics: string, combine: string): Series {
  const r = cat.find(family, params, statistics, combine, '');
  expect(r, `${family} ${JSON.stringify(params)} ${statistics} ${combine}`).toBeDefined();
  return r!.series;
}

beforeAll(() => {
  cat = Catalogue.open(join(mkdtempSync(join(tmpdir(), 'gradus-contents-')), 'c.sqlite'));
  const families = ['decorated-dyck-paths', 'valley-decorated-dyck-paths', 'ordered-multiset-partitions', 'fillings', 'words', 'semistandard-tableaux'];
  buildCatalogue(cat, { nMax: N, maxObjects: 10_000_000n, families, progress: silentProgress });
}, 120_000);

afterAll(() => cat.close());

describe('catalogue contents', () => {
  it('plans every family or names why it is left out; decorated-dyck-paths (k or d required) gets a unit per k', () => {
    const { planned, skipped } = coverage();
    for (const f of FAMILIES) expect(planned.includes(f) !== skipped.some((s) => s.family === f.id), f.id).toBe(true);
    for (const s of skipped) expect(s.why.length).toBeGreaterThan(10);
    const plan = planUnits(3, ['decorated-dyck-paths']);
    expect(plan.units.filter((u) => u.family.id === 'decorated-dyck-paths' && u.n === 3).map((u) => u.k)).toEqual([1, 2, 3]);
  });

  it('decorated labelled Dyck paths, n = 4, every k: Σ q^area t^dinv F_iDes = Δ′_{e_{k−1}} e_n, and the slice at dinv = 0 is its t = 0 specialisation', async () => {
    // Rise version: conjectured in Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. AMS 370 (2018);
    // proved by D'Adderio–Mellit, "A proof of the compositional Delta conjecture", Adv. Math. 402 (2022) (from memory).
    for (let k = 1; k <= N; k++) {
      const delta = await sym(`deltaprime(e(${k - 1}), e(${N}))`);
      expect(seriesEquals(row('decorated-dyck-paths', { n: N, k }, 'decorated-area,decorated-dinv', 'ifundamental'), delta), `k = ${k}`).toBe(true);
      const atT0 = await sym(`subs(deltaprime(e(${k - 1}), e(${N})), t=0)`);
      expect(seriesEquals(row('decorated-dyck-paths', { n: N, k }, 'decorated-area,decorated-dinv', 'ifundamental-t0'), atT0), `k = ${k}`).toBe(true);
    }
  });

  it('valley version compared with Δ′_{e_{k−1}} e_n at n = 4 (a conjecture of Haglund–Remmel–Wilson 2018: compared, not assumed)', async () => {
    for (let k = 1; k <= N; k++) {
      const delta = await sym(`deltaprime(e(${k - 1}), e(${N}))`);
      const valley = row('valley-decorated-dyck-paths', { n: N, k }, 'valley-decorated-area,valley-decorated-dinv', 'ifundamental');
      expect(seriesEquals(valley, delta), `k = ${k}: the valley version differs from Δ′ here`).toBe(true);
    }
  });

  it('ordered multiset partitions: Σ_μ m_μ Σ_{content μ, k blocks} q^stat = Δ′_{e_{k−1}} e_n at t = 0 for inv, maj, dinv and minimaj, n = 4', async () => {
    // Haglund–Remmel–Wilson, Trans. AMS 370 (2018), §4 (the t = 0 case, with Wilson's and Rhoades's equidistribution results; from memory)
    for (let k = 1; k <= N; k++) {
      const atT0 = await sym(`subs(deltaprime(e(${k - 1}), e(${N})), t=0)`);
      for (const s of ['omp-inv', 'omp-maj', 'omp-dinv', 'omp-minimaj']) {
        expect(seriesEquals(row('ordered-multiset-partitions', { n: N, k }, s, 'content'), atT0), `${s}, k = ${k}`).toBe(true);
      }
    }
  });

  it('fillings of μ: Σ q^inv t^maj F_iDes = H̃_μ; words and tableaux of content μ by cocharge: the modified Hall–Littlewood function, every μ ⊢ 4', async () => {
    // Haglund–Haiman–Loehr, "A combinatorial formula for Macdonald polynomials", J. AMS 18 (2005), Thm 2.2;
    // Lascoux–Schützenberger (charge), as in Macdonald, Symmetric Functions and Hall Polynomials, III.6 (from memory)
    for (const mu of [[4], [3, 1], [2, 2], [2, 1, 1], [1, 1, 1, 1]]) {
      const text = mu.join(',');
      expect(seriesEquals(row('fillings', { shape: mu }, 'filling-inv,filling-maj', 'ifundamental'), await sym(`H(${text})`)), text).toBe(true);
      const hl = await sym(`swap(HL(${text}))`); // our rows weight by q
      expect(seriesEquals(row('words', { content: mu }, 'word-cocharge', 'fundamental'), hl), text).toBe(true);
      expect(seriesEquals(row('semistandard-tableaux', { content: mu }, 'tableau-cocharge', 'shape'), hl), text).toBe(true);
    }
  });

  it('the search finds them: Δ′_{e_{k−1}} e_n at t = 0 (n ≤ 4, all k) and H̃_(n−1,1) (n = 3, 4) by shape template', async () => {
    const entries = [];
    for (let n = 1; n <= N; n++) for (let k = 1; k <= n; k++) entries.push({ n, k, series: await sym(`subs(deltaprime(e(${k - 1}), e(${n})), t=0)`) });
    const found = searchCatalogue(cat, makeTarget('delta t=0', entries)).matches;
    expect(found.some((m) => m.family === 'ordered-multiset-partitions' && m.combine === 'content' && m.statistics[0] === 'omp-inv' && m.complete)).toBe(true);
    expect(found.some((m) => m.family === 'decorated-dyck-paths' && m.combine === 'ifundamental-t0' && m.complete)).toBe(true);
    const hooks = makeTarget('H', [{ n: 3, series: await sym('H(2,1)') }, { n: 4, series: await sym('H(3,1)') }]);
    const m = searchCatalogue(cat, hooks).matches.find((x) => x.family === 'fillings');
    expect(m?.mapping).toBe('n ↦ n, shape = (n−1,1)');
    expect(m?.verified).toBe('n = 3..4');
  });
});
