/**
 * The expression library in the catalogue: families of symmetric-function expressions (built
 * in, or added by the user) and their values, looked up by series hash like distributions.
 * A unit is (family, n); units are written in one transaction with their family row, and each
 * distinct series is stored once under its hash (checked again when read).
 */
import { InputError } from '../core/errors.js';
import { guarded } from '../core/environment-errors.js';
import { toJsonText } from '../core/json-text.js';
import type { Provenance } from '../core/provenance.js';
import { seriesAtOne, type Series, type SeriesKind } from '../series/series.js';
import { seriesFromJson, seriesToJson } from '../series/seriesJson.js';
import { damaged, type Catalogue } from './catalogue.js';
import { seriesHash } from './seriesHash.js';

/** How a family is indexed: by n, by (n, k), or by a partition λ of n. */
export type ExpressionIndex = 'n' | 'n,k' | 'partition';

export interface ExpressionFamily {
  readonly id: string;
  /** The expression with {n}, {k} or {λ}, in the language of `gradus sym`. */
  readonly template: string;
  readonly index: ExpressionIndex;
  /** The smallest k (0 or 1; k runs up to n). */
  readonly kMin: number;
  readonly title: string;
  /** Where the family is defined or studied (a published title, or the user's words). */
  readonly source: string;
  readonly origin: 'built-in' | 'user';
  /** 'positive': each value is multiplied by ±1 so that its leading Schur coefficient is positive. */
  readonly sign: '' | 'positive';
}

/** One place of a family with one specialisation and one projection (the Frobenius series or its Hilbert series). */
export interface ExpressionValue {
  readonly family: string;
  readonly n: number;
  readonly k?: number;
  readonly partition?: readonly number[];
  readonly specialisation: string;
  readonly projection: 'frobenius' | 'hilbert';
  /** The value as an expression `gradus sym` evaluates again. */
  readonly expression: string;
  readonly series: Series;
}

export interface ExpressionUnit {
  readonly n: number;
  readonly values: readonly ExpressionValue[];
  readonly seconds: number;
  readonly provenance: Provenance;
}

export function placeKey(n: number, k?: number, partition?: readonly number[]): string {
  return partition ? `n=${n},λ=${partition.join(',')}` : k === undefined ? `n=${n}` : `n=${n},k=${k}`;
}

interface RawValue {
  family: string;
  n: number;
  k: number | null;
  partition: string;
  specialisation: string;
  projection: string;
  expression: string;
  hash: string;
  kind: string | null;
  series: string | null;
  at_one: string | null;
}

const VALUE_SELECT = 'SELECT v.family, v.n, v.k, v.partition, v.specialisation, v.projection, v.expression, v.hash, s.kind, s.series, s.at_one FROM expression_values v LEFT JOIN expression_series s ON s.hash = v.hash';

function read<T>(cat: Catalogue, fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    const code = String((e as { code?: unknown } | null)?.code ?? '');
    if (code === 'SQLITE_CORRUPT' || code === 'SQLITE_NOTADB') throw damaged(cat.path, (e as Error).message);
    throw e;
  }
}

function write<T>(cat: Catalogue, doing: string, fn: () => T): T {
  if (!cat.writable) throw new InputError(`cannot ${doing}: the catalogue ${cat.path} is read-only`, 'catalogue');
  return guarded(`cannot ${doing} in ${cat.path}`, fn);
}

function decodeValue(cat: Catalogue, r: RawValue): ExpressionValue {
  if (r.series === null || r.kind === null) throw damaged(cat.path, `expression value ${r.family} ${r.expression} has no stored series`);
  let series: Series;
  try {
    series = seriesFromJson(JSON.parse(r.series), 'expression series', r.kind as SeriesKind);
  } catch {
    throw damaged(cat.path, `the series of ${r.expression} is not a series`);
  }
  if (seriesHash(series) !== r.hash || seriesAtOne(series).toString() !== r.at_one) throw damaged(cat.path, `the series of ${r.expression} does not match its hash`);
  return {
    family: r.family,
    n: r.n,
    ...(r.k === null ? {} : { k: r.k }),
    ...(r.partition === '' ? {} : { partition: r.partition.split(',').map(Number) }),
    specialisation: r.specialisation,
    projection: r.projection as ExpressionValue['projection'],
    expression: r.expression,
    series,
  };
}

/**
 * Write a family row and some of its units in one transaction (a unit written again replaces
 * its values). With `replaceAll`, the family's earlier units are dropped first.
 */
export function writeExpressionUnits(cat: Catalogue, family: ExpressionFamily, units: readonly ExpressionUnit[], replaceAll = false): void {
  write(cat, 'store expression values', () => {
    const db = cat.db;
    const fam = db.prepare('INSERT OR REPLACE INTO expression_families (id, template, indexing, k_min, title, source, origin, sign, created) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)');
    const dropUnit = db.prepare('DELETE FROM expression_values WHERE family = ? AND n = ?');
    const unit = db.prepare('INSERT OR REPLACE INTO expression_units (family, n, seconds, provenance) VALUES (?, ?, ?, ?)');
    const series = db.prepare('INSERT OR IGNORE INTO expression_series (hash, kind, series, at_one) VALUES (?, ?, ?, ?)');
    const value = db.prepare('INSERT INTO expression_values (family, n, k, partition, place, specialisation, projection, expression, hash) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)');
    db.transaction(() => {
      if (replaceAll) {
        db.prepare('DELETE FROM expression_values WHERE family = ?').run(family.id);
        db.prepare('DELETE FROM expression_units WHERE family = ?').run(family.id);
      }
      fam.run(family.id, family.template, family.index, family.kMin, family.title, family.source, family.origin, family.sign, new Date().toISOString());
      for (const u of units) {
        dropUnit.run(family.id, u.n);
        for (const v of u.values) {
          const hash = seriesHash(v.series);
          series.run(hash, v.series.kind, toJsonText(seriesToJson(v.series)), seriesAtOne(v.series).toString());
          value.run(v.family, v.n, v.k ?? null, v.partition?.join(',') ?? '', placeKey(v.n, v.k, v.partition), v.specialisation, v.projection, v.expression, hash);
        }
        unit.run(family.id, u.n, u.seconds, JSON.stringify(u.provenance));
      }
    })();
  });
}

/** The family rows stored, with the sizes n built for each. */
export function expressionFamilies(cat: Catalogue): (ExpressionFamily & { readonly sizes: readonly number[]; readonly values: number })[] {
  return read(cat, () => {
    const rows = cat.db.prepare('SELECT id, template, indexing, k_min, title, source, origin, sign FROM expression_families ORDER BY origin, id').all() as {
      id: string; template: string; indexing: string; k_min: number; title: string; source: string; origin: string; sign: string;
    }[];
    const sizes = cat.db.prepare('SELECT n FROM expression_units WHERE family = ? ORDER BY n');
    const count = cat.db.prepare('SELECT COUNT(*) AS c FROM expression_values WHERE family = ?');
    return rows.map((r) => ({
      id: r.id,
      template: r.template,
      index: r.indexing as ExpressionIndex,
      kMin: r.k_min,
      title: r.title,
      source: r.source,
      origin: r.origin === 'user' ? 'user' : 'built-in',
      sign: r.sign === 'positive' ? 'positive' : '',
      sizes: (sizes.all(r.id) as { n: number }[]).map((x) => x.n),
      values: (count.get(r.id) as { c: number }).c,
    }));
  });
}

/** Remove a family, its units and values, and the series no other value points at (one transaction). */
export function removeExpressionFamily(cat: Catalogue, id: string): void {
  write(cat, 'remove an expression family', () => {
    cat.db.transaction(() => {
      cat.db.prepare('DELETE FROM expression_values WHERE family = ?').run(id);
      cat.db.prepare('DELETE FROM expression_units WHERE family = ?').run(id);
      cat.db.prepare('DELETE FROM expression_families WHERE id = ?').run(id);
      cat.db.prepare('DELETE FROM expression_series WHERE hash NOT IN (SELECT hash FROM expression_values)').run();
    })();
  });
}

/** Values whose series has this hash. */
export function expressionsByHash(cat: Catalogue, hash: string): ExpressionValue[] {
  return read(cat, () => (cat.db.prepare(`${VALUE_SELECT} WHERE v.hash = ?`).all(hash) as RawValue[]).map((r) => decodeValue(cat, r)));
}

/** The value of a family at one place, specialisation and projection, if stored. */
export function expressionAt(cat: Catalogue, family: string, place: string, specialisation: string, projection: string): ExpressionValue | undefined {
  const r = read(cat, () => cat.db.prepare(`${VALUE_SELECT} WHERE v.family = ? AND v.place = ? AND v.specialisation = ? AND v.projection = ?`).get(family, place, specialisation, projection) as RawValue | undefined);
  return r ? decodeValue(cat, r) : undefined;
}

/** The largest n of a unit of each family (a family's values exist for n = 1..max). */
export function expressionSizes(cat: Catalogue): Map<string, number> {
  return read(cat, () => new Map((cat.db.prepare('SELECT family, MAX(n) AS m FROM expression_units GROUP BY family').all() as { family: string; m: number }[]).map((r) => [r.family, r.m])));
}

/** How many values and distinct series the library holds. */
export function expressionCounts(cat: Catalogue): { families: number; values: number; series: number } {
  return read(cat, () => {
    const one = (sql: string) => (cat.db.prepare(sql).get() as { c: number }).c;
    return { families: one('SELECT COUNT(*) AS c FROM expression_families'), values: one('SELECT COUNT(*) AS c FROM expression_values'), series: one('SELECT COUNT(*) AS c FROM expression_series') };
  });
}
