import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { Poly } from '../../src/core/poly.js';
import { qFactorial } from '../../src/core/qanalogs.js';
import { qSeries } from '../../src/series/series.js';
import { Catalogue } from '../../src/store/catalogue.js';
import { cataloguePath } from '../../src/store/cataloguePath.js';
import { commandResultCache } from '../../src/store/commandResultCache.js';
import { MIGRATIONS, SCHEMA_VERSION } from '../../src/store/migrations.js';
import { provenance } from '../../src/store/provenance.js';
import { seriesHash } from '../../src/store/seriesHash.js';

const dir = () => mkdtempSync(join(tmpdir(), 'gradus-store-'));

describe('catalogue', () => {
  it('default path: option, then GRADUS_CATALOGUE, then XDG_DATA_HOME, then ~/.local/share', () => {
    expect(cataloguePath('x.sqlite', {}, '/w')).toBe('/w/x.sqlite');
    expect(cataloguePath(undefined, { GRADUS_CATALOGUE: '/a/b.sqlite' }, '/w')).toBe('/a/b.sqlite');
    expect(cataloguePath(undefined, { XDG_DATA_HOME: '/xdg' }, '/w')).toBe('/xdg/gradus/catalogue.sqlite');
    expect(cataloguePath(undefined, { HOME: '/h' }, '/w')).toBe('/h/.local/share/gradus/catalogue.sqlite');
  });
  it('is created on first use with the current schema, and reopens', () => {
    const p = join(dir(), 'sub', 'c.sqlite');
    const c = Catalogue.open(p);
    expect(c.info().schema).toBe(SCHEMA_VERSION);
    c.close();
    const again = Catalogue.open(p, { readonly: true });
    expect(again.info().units).toBe(0);
    again.close();
  });
  it('writes a unit in one transaction and finds rows by hash and by place', () => {
    const c = Catalogue.open(join(dir(), 'c.sqlite'));
    const s = qSeries(qFactorial(3));
    c.writeUnit('permutations', { n: 3 }, 6n, 0.1, [
      { family: 'permutations', params: { n: 3 }, n: 3, statistics: ['inversions'], combine: 'single', transform: '', series: s },
    ], provenance({}, 'test'));
    expect(c.isUnitDone('permutations', { n: 3 })).toBe(true);
    const rows = c.byHash(seriesHash(s));
    expect(rows.length).toBe(1);
    expect(rows[0]!.atOne).toBe(6n);
    expect(c.find('permutations', { n: 3 }, 'inversions', 'single', '')?.series.kind).toBe('q');
    expect(c.find('permutations', { n: 4 }, 'inversions', 'single', '')).toBeUndefined();
    c.close();
  });
  it('keeps module and symmetric-function results by their command line, with provenance', () => {
    const c = Catalogue.open(join(dir(), 'c.sqlite'));
    const cache = commandResultCache(c);
    cache.put(['module', '--n', '3'], { hilbertSeries: [1, 2] }, 3, undefined);
    cache.put(['sym', 'e(2)'], { terms: { '1,1': [[1]] } }, 2, undefined);
    cache.put(['qseries', 'integer'], { series: [1] }, 1, undefined);
    expect(cache.get(['module', '--n', '3'])).toEqual({ hilbertSeries: [1, 2] });
    expect(cache.get(['sym', 'e(2)'])).toEqual({ terms: { '1,1': [[1]] } });
    expect(cache.get(['qseries', 'integer'])).toBeUndefined();
    expect(cache.get(['module', '--n', '4'])).toBeUndefined();
    const p = c.db.prepare('SELECT provenance FROM module_results').get() as { provenance: string };
    expect(JSON.parse(p.provenance).gradusVersion).toMatch(/^\d+\.\d+/);
    c.close();
  });
  it('a failing write leaves nothing of the unit behind', () => {
    const c = Catalogue.open(join(dir(), 'c.sqlite'));
    const bad = { family: 'f', params: { n: 1 }, n: 1, statistics: ['s'], combine: 'single' as const, transform: '', series: qSeries(Poly.one) };
    expect(() => c.writeUnit('f', { n: 1 }, 1n, 0, [bad, { ...bad, series: undefined as never }], provenance({}, 'test'))).toThrow();
    expect(c.info().distributions).toBe(0);
    expect(c.isUnitDone('f', { n: 1 })).toBe(false);
    c.close();
  });
  it('a damaged file is an InputError naming the rebuild command', () => {
    const p = join(dir(), 'bad.sqlite');
    writeFileSync(p, 'this is not a database file, just some bytes '.repeat(100));
    expect(() => Catalogue.open(p)).toThrow(/damaged.*gradus catalogue rebuild/);
  });
  it('migrates a version-1 file: its units count as stale for a build with a statistics signature', () => {
    const p = join(dir(), 'v1.sqlite');
    const db = new Database(p);
    db.exec(MIGRATIONS[0]!);
    db.prepare("INSERT INTO units (family, params, n, k, objects, seconds, provenance) VALUES ('f', '{\"n\":1}', 1, NULL, '1', 0, '{}')").run();
    db.pragma('user_version = 1');
    db.close();
    const c = Catalogue.open(p);
    expect(c.info().schema).toBe(SCHEMA_VERSION);
    expect(SCHEMA_VERSION).toBeGreaterThanOrEqual(2);
    expect(c.isUnitDone('f', { n: 1 })).toBe(true);
    expect(c.isUnitDone('f', { n: 1 }, 'a,b')).toBe(false);
    c.writeUnit('f', { n: 1 }, 1n, 0, [], provenance({}, 'test'), 'a,b');
    expect(c.isUnitDone('f', { n: 1 }, 'a,b')).toBe(true);
    expect(c.isUnitDone('f', { n: 1 }, 'a,b,c')).toBe(false);
    c.close();
  });
  it('a file from a newer gradus is refused with a clear message', () => {
    const p = join(dir(), 'new.sqlite');
    const db = new Database(p);
    db.pragma(`user_version = ${SCHEMA_VERSION + 5}`);
    db.close();
    expect(() => Catalogue.open(p)).toThrow(/newer than this gradus/);
  });
  it('reading a catalogue that does not exist says how to fill one', () => {
    expect(() => Catalogue.open(join(dir(), 'none.sqlite'), { readonly: true })).toThrow(/catalogue build --n-max/);
  });
});
