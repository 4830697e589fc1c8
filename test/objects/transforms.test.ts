/**
 * Transforms: examples hold, images land in the target family, involutions are
 * involutions; Foata carries maj to inv; RSK is a bijection onto pairs of SYT of one
 * shape; the zeta map carries (dinv, area) to (area, bounce). Statistics are computed
 * inline from their definitions so these tests do not lean on statistics/.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { familyById } from '../../objects/index.js';
import { composeStatistic } from '../../objects/transforms/compose-statistic.js';
import { foata, foataInverse, foataMap } from '../../objects/transforms/foata.js';
import { InputError } from '../../src/core/errors.js';
import type { Statistic } from '../../src/enumerate/plugin.js';
import { TRANSFORMS } from '../../objects/transforms/index.js';
import { evacuate } from '../../objects/transforms/evacuation.js';
import { rsk, rskInverse } from '../../objects/transforms/rsk.js';
import { standardizeWord } from '../../objects/transforms/standardize.js';
import { zetaMap } from '../../objects/transforms/zeta.js';
import type { DyckPath } from '../../objects/types.js';

const maj = (w: readonly number[]): number => w.reduce((s, x, i) => (i + 1 < w.length && x > w[i + 1]! ? s + i + 1 : s), 0);
function inv(w: readonly number[]): number {
  let s = 0;
  for (let i = 0; i < w.length; i++) for (let j = i + 1; j < w.length; j++) if (w[i]! > w[j]!) s++;
  return s;
}
function area(p: DyckPath): number {
  let s = 0;
  let east = 0;
  let row = 0;
  for (const x of p) x === 1 ? (s += row++ - east) : east++;
  return s;
}
function areaSeq(p: DyckPath): number[] {
  const a: number[] = [];
  let east = 0;
  for (const x of p) x === 1 ? a.push(a.length - east) : east++;
  return a;
}
function dinv(p: DyckPath): number {
  const a = areaSeq(p);
  let s = 0;
  for (let i = 0; i < a.length; i++) for (let j = i + 1; j < a.length; j++) if (a[i] === a[j] || a[i] === a[j]! + 1) s++;
  return s;
}
/** Haglund's bounce: the bounce path touches the diagonal at j1 < j2 < …; bounce = Σ (n − j_i). */
function bounce(p: DyckPath): number {
  const cols = areaSeq(p).map((a, r) => r - a);
  const n = cols.length;
  let j = 0;
  let s = 0;
  for (;;) {
    const next = cols.filter((c) => c <= j).length;
    if (next >= n) return s;
    s += n - next;
    j = next;
  }
}
const permArb = (max: number) => fc.integer({ min: 0, max }).chain((n) => fc.shuffledSubarray(Array.from({ length: n }, (_, i) => i + 1), { minLength: n, maxLength: n }));
const wordArb = fc.array(fc.integer({ min: 1, max: 4 }), { maxLength: 9 });

describe.each(TRANSFORMS.map((t) => [t.id, t] as const))('transform %s', (_id, t) => {
  it('examples hold and images are objects of the target family', () => {
    expect(t.examples.length).toBeGreaterThan(0);
    for (const [a, b] of t.examples) expect(t.apply(a)).toEqual(b);
    const from = familyById(t.from);
    const to = familyById(t.to);
    for (const p of from.testParams) {
      let seen = 0;
      for (const x of from.generate(p)) {
        if (seen++ > 200) break;
        const y = t.apply(x);
        expect(to.key(y).length + to.render(y).length).toBeGreaterThan(0);
        if (t.involution) expect(from.key(t.apply(y))).toBe(from.key(x));
      }
    }
  });
});

describe('specific transforms', () => {
  it('Foata: maj(w) = inv(Φ(w)), same last letter and content, Φ⁻¹Φ = id (permutations and words, fast-check)', () => {
    for (const arb of [permArb(9), wordArb]) {
      fc.assert(
        fc.property(arb, (w) => {
          const f = foataMap(w);
          expect(inv(f)).toBe(maj(w));
          expect(f[f.length - 1]).toBe(w[w.length - 1]);
          expect([...f].sort()).toEqual([...w].sort());
          expect(foataInverse(f)).toEqual(w);
        }),
      );
    }
  });
  it('Foata is a bijection on S_6 (all 720 images distinct)', () => {
    const images = new Set<string>();
    for (const w of familyById('permutations').generate({ n: 6 })) images.add(foataMap(w as number[]).join(','));
    expect(images.size).toBe(720);
  });
  it('RSK is a bijection from S_n onto pairs of SYT of the same shape, n ≤ 6 (Stanley EC2 §7.11, theorem numbers from memory)', () => {
    const syt = familyById('standard-tableaux');
    for (let n = 0; n <= 6; n++) {
      const pairs = new Set<string>();
      for (const w of familyById('permutations').generate({ n })) {
        const [p, q] = rsk(w as number[]);
        expect(p.map((r) => r.length)).toEqual(q.map((r) => r.length));
        const keys = new Set([...syt.generate({ shape: p.map((r) => r.length) })].map((t) => syt.key(t)));
        expect(keys.has(syt.key(p)) && keys.has(syt.key(q))).toBe(true);
        expect(rskInverse(p, q)).toEqual(w);
        pairs.add(`${syt.key(p)}|${syt.key(q)}`);
      }
      // As many pairs as permutations, and Σ_λ (f^λ)² of them exist: the map is onto.
      let squares = 0n;
      for (const l of familyById('partitions').generate({ n })) squares += syt.count({ shape: l as number[] }) ** 2n;
      expect(BigInt(pairs.size)).toBe(squares);
    }
  });
  it('RSK: Q(w) = P(w⁻¹) (Stanley EC2 §7.13, from memory; checked against the inverse computed here), fast-check', () => {
    fc.assert(
      fc.property(permArb(8), (w) => {
        const winv = w.map((_, i) => w.indexOf(i + 1) + 1);
        expect(rsk(w)[1]).toEqual(rsk(winv)[0]);
      }),
    );
  });
  it('zeta: dinv(π) = area(ζπ), area(π) = bounce(ζπ), and ζ is a bijection, n ≤ 8', () => {
    for (let n = 0; n <= 8; n++) {
      const images = new Set<string>();
      for (const p of familyById('dyck-paths').generate({ n })) {
        const z = zetaMap(p as DyckPath);
        expect(area(z)).toBe(dinv(p as DyckPath));
        expect(bounce(z)).toBe(area(p as DyckPath));
        images.add(z.join(''));
      }
      expect(BigInt(images.size)).toBe(familyById('dyck-paths').count({ n }));
    }
  });
  it('Dyck reversal keeps the area (fast-check over sampled paths)', () => {
    const t = TRANSFORMS.find((x) => x.id === 'dyck-reverse')!;
    const fam = familyById('dyck-paths');
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 12 }), fc.integer(), (n, seed) => {
        let s = seed >>> 0;
        const p = fam.sample({ n }, () => ((s = (s * 1103515245 + 12345) >>> 0) / 2 ** 32)) as DyckPath;
        expect(area(t.apply(p) as DyckPath)).toBe(area(p));
      }),
    );
  });
  it('composeStatistic reads a statistic after a transform: inv after Foata is maj (Foata 1968)', () => {
    const invStat: Statistic<readonly number[]> = {
      id: 'inv-here',
      family: 'permutations',
      description: 'inversions, computed in this test',
      source: 'common practice',
      examples: [],
      compute: inv,
    };
    const composed = composeStatistic(foata, invStat);
    expect(composed.id).toBe('foata:inv-here');
    expect(composed.family).toBe('permutations');
    for (const w of familyById('permutations').generate({ n: 5 })) expect(composed.compute(w as number[])).toBe(maj(w as number[]));
    for (const [a, v] of composed.examples) expect(v).toBe(inv(foataMap(a)));
    expect(() => composeStatistic(foata, { ...invStat, family: 'words' })).toThrow(InputError);
  });
  it('evacuation: P(w^#) = evac(P(w)) for w^# the reverse complement (Schützenberger; Stanley EC2 §A1.2), all of S_6', () => {
    for (const w of familyById('permutations').generate({ n: 6 })) {
      const sharp = [...(w as number[])].reverse().map((x) => 7 - x);
      expect(rsk(sharp)[0]).toEqual(evacuate(rsk(w as number[])[0]));
    }
  });
  it('standardization keeps inversions and the major index, and gives a permutation (fast-check)', () => {
    fc.assert(
      fc.property(wordArb, (w) => {
        const p = standardizeWord(w);
        expect([...p].sort((a, b) => a - b)).toEqual(w.map((_, i) => i + 1));
        expect(inv(p)).toBe(inv(w));
        expect(maj(p)).toBe(maj(w));
      }),
    );
  });
});
