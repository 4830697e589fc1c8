/** The generated registries are up to date, and their lookups name the nearest ids. */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { FAMILIES, familyById } from '../../objects/index.js';
import { TRANSFORMS, transformById } from '../../objects/transforms/index.js';
import { exportsOf, PROJECT_ROOT, renderRegistries } from '../../scripts/gen-registry.js';
import { InputError } from '../../src/core/errors.js';
import { statisticById, statisticsOfFamily, STATISTICS } from '../../statistics/index.js';

describe('registries', () => {
  it('every registry on disk equals what scripts/gen-registry.ts writes (run `npm run registry` if not)', () => {
    for (const [path, text] of renderRegistries(PROJECT_ROOT)) {
      expect(readFileSync(join(PROJECT_ROOT, path), 'utf8'), `${path} is stale: run npm run registry`).toBe(text);
    }
  });
  it('finds typed exports, several per file, and skips arrays and other types', () => {
    const src = [
      'export const a: Statistic<Permutation> = {',
      'export const b : Statistic<readonly [number, number]> = {',
      'export const c: Statistic<Word>[] = [',
      'export const d: Family<Word> = {',
      'const e: Statistic<Word> = {',
    ].join('\n');
    expect(exportsOf(src, 'Statistic')).toEqual(['a', 'b']);
    expect(exportsOf(src, 'Family')).toEqual(['d']);
  });
  it('ids are unique within each registry', () => {
    for (const list of [FAMILIES, TRANSFORMS, STATISTICS]) {
      const ids = list.map((x) => x.id);
      expect(new Set(ids).size).toBe(ids.length);
    }
  });
  it('unknown ids raise InputError naming the nearest valid ids', () => {
    expect(() => familyById('permutation')).toThrow(InputError);
    expect(() => familyById('permutation')).toThrow(/nearest: permutations/);
    expect(() => transformById('no-such-transform')).toThrow(InputError);
    expect(() => statisticById('no-such-statistic')).toThrow(InputError);
    expect(familyById('permutations').id).toBe('permutations');
  });
  it('statisticsOfFamily returns only statistics of that family', () => {
    for (const f of FAMILIES) for (const s of statisticsOfFamily(f.id)) expect(s.family).toBe(f.id);
    expect(statisticsOfFamily('no-such-family')).toEqual([]);
  });
  it('every statistic and transform refers to a registered family', () => {
    const ids = new Set(FAMILIES.map((f) => f.id));
    for (const s of STATISTICS) expect(ids.has(s.family), `${s.id} → ${s.family}`).toBe(true);
    for (const t of TRANSFORMS) expect(ids.has(t.from) && ids.has(t.to), t.id).toBe(true);
  });
});
