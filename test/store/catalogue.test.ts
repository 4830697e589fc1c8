import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { Poly } from '../../src/core/poly.js';
import { qFactorial } from '../../src/core/qanalogs.js';
import { qSeries } from '../../src/series/series.js';
import { Catalogue } from '../../src/store/catalogue.js';
import { cataloguePath } from '../../src/store/cataloguePath.js';
import { catalogueResultCache } from '../../src/match/resultCache.js';
import { MIGRATIONS, SCHEMA_VERSION } from '../../src/store/migrations.js';
import { makeProvenance } from '../../src/core/provenance.js';
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
    const again = Catalogue.open(p, { existing: true });
    expect(again.info().units).toBe(0);
    again.close();
  });
  it('writes a unit in one transaction and finds rows by hash and by place', () => {
    const c = Catalogue.open(join(dir(), 'c.sqlite'));
    const s = qSeries(qFactorial(3));
    c.writeUnit('permutations', { n: 3 }, 6n, 0.1, [
      { family: 'permutations', params: { n: 3 }, n: 3, statistics: ['inversions'], combine: 'single', transform: '', series: s },
    ], makeProvenance({ request: 'test', method: 'test', seconds: 0 }));
    expect(c.isUnitDone('permutations', { n: 3 })).toBe(true);
    const rows = c.byHash(seriesHash(s));
    expect(rows.length).toBe(1);
    expect(rows[0]!.atOne).toBe(6n);
    expect(c.find('permutations', { n: 3 }, 'inversions', 'single', '')?.series.kind).toBe('q');
    expect(c.find('permutations', { n: 4 }, 'inversions', 'single', '')).toBeUndefined();
    c.close();
  });
  it('keeps module, quotient and sym results by their canonical request key, with provenance', () => {
    const c = Catalogue.open(join(dir(), 'c.sqlite'));
    const cache = catalogueResultCache(c);
    const prov = makeProvenance({ request: 'module --seed vandermonde --n 3 --ops x', method: 'test', seconds: 0 });
    cache.put('module --seed vandermonde --n 3 --ops x', 'module', { hilbertSeries: [1, 2], provenance: prov }, 3, undefined);
    cache.put('sym e(2)', 'sym', { terms: { '1,1': [[1]] }, provenance: prov }, 2, undefined);
    cache.put('qanalog integer --n 1', 'qanalog', { series: [1], provenance: prov }, 1, undefined);
    expect(cache.get('module --seed vandermonde --n 3 --ops x')).toEqual({ hilbertSeries: [1, 2], provenance: prov });
    expect(cache.get('sym e(2)')).toMatchObject({ terms: { '1,1': [[1]] } });
    expect(cache.get('qanalog integer --n 1')).toBeUndefined();
    expect(cache.get('module --seed vandermonde --n 4 --ops x')).toBeUndefined();
    const p = c.db.prepare('SELECT provenance FROM results WHERE kind = ?').get('module') as { provenance: string };
    expect(JSON.parse(p.provenance).version).toMatch(/^\d+\.\d+/);
    c.close();
  });
  it('a failing write leaves nothing of the unit behind', () => {
    const c = Catalogue.open(join(dir(), 'c.sqlite'));
    const bad = { family: 'f', params: { n: 1 }, n: 1, statistics: ['s'], combine: 'single' as const, transform: '', series: qSeries(Poly.one) };
    expect(() => c.writeUnit('f', { n: 1 }, 1n, 0, [bad, { ...bad, series: undefined as never }], makeProvenance({ request: 'test', method: 'test', seconds: 0 }))).toThrow();
    expect(c.info().distributions).toBe(0);
    expect(c.isUnitDone('f', { n: 1 })).toBe(false);
    c.close();
  });
  it('a file gradus did not write is refused and left alone; a broken catalogue of ours is "damaged" with the rebuild command', () => {
    const p = join(dir(), 'bad.sqlite');
    const text = 'this is not a database file, just some bytes '.repeat(100);
    writeFileSync(p, text);
    expect(() => Catalogue.open(p)).toThrow(/not an SQLite database, not a gradus catalogue; gradus leaves it alone/);
    expect(readFileSync(p, 'utf8')).toBe(text);
    const q = join(dir(), 'broken.sqlite');
    Catalogue.open(q).close();
    const bytes = readFileSync(q);
    bytes.fill(0x5a, 100, 4096);
    writeFileSync(q, bytes);
    expect(() => Catalogue.open(q)).toThrow(/damaged.*gradus catalogue rebuild/);
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
    c.writeUnit('f', { n: 1 }, 1n, 0, [], makeProvenance({ request: 'test', method: 'test', seconds: 0 }), 'a,b');
    expect(c.isUnitDone('f', { n: 1 }, 'a,b')).toBe(true);
    expect(c.isUnitDone('f', { n: 1 }, 'a,b,c')).toBe(false);
    c.close();
  });
  it('a file from a newer gradus is refused with a clear message', () => {
    const p = join(dir(), 'new.sqlite');
    Catalogue.open(p).close();
    const db = new Database(p);
    db.pragma(`user_version = ${SCHEMA_VERSION + 5}`);
    db.close();
    expect(() => Catalogue.open(p)).toThrow(/newer than this gradus/);
  });
  it('reading a catalogue that does not exist says how to fill one', () => {
    expect(() => Catalogue.open(join(dir(), 'none.sqlite'), { existing: true })).toThrow(/catalogue build --n-max/);
  });
});
