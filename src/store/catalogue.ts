/**
 * The catalogue: an embedded SQLite file (WAL, one transaction per unit of work) holding
 * distributions, module results, symmetric-function results and saved searches.
 * A damaged file is reported as an InputError naming the command that rebuilds it.
 */
import Database from 'better-sqlite3';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { InputError } from '../core/errors.js';
import { toJsonText } from '../core/json-text.js';
import { seriesFromJson, seriesToJson } from '../series/seriesJson.js';
import { seriesAtOne, type Series, type SeriesKind } from '../series/series.js';
import { MIGRATIONS, SCHEMA_VERSION } from './migrations.js';
import type { Provenance } from './provenance.js';
import { seriesHash } from './seriesHash.js';

export const REBUILD_HINT = 'gradus catalogue rebuild';

/** How a distribution row was formed from its statistics. */
export type Combine = 'single' | 'joint' | 'sum' | 'shape' | 'fundamental' | 'ifundamental';
/** How a match was formed: a stored combination, or a slice of a joint distribution (k = value of the second statistic). */
export type MatchCombine = Combine | 'slice';

export interface DistributionRow {
  readonly family: string;
  readonly params: Readonly<Record<string, number>>;
  readonly n: number;
  readonly k?: number;
  readonly statistics: readonly string[];
  readonly combine: Combine;
  readonly transform: string;
  readonly series: Series;
}

export interface StoredRow extends DistributionRow {
  readonly id: number;
  readonly hash: string;
  readonly atOne: bigint;
}

interface RawRow {
  id: number;
  family: string;
  params: string;
  n: number;
  k: number | null;
  statistics: string;
  combine: string;
  transform: string;
  kind: string;
  series: string;
  at_one: string;
  hash: string;
}

export function paramsKey(p: Readonly<Record<string, number>>): string {
  return JSON.stringify(Object.fromEntries(Object.entries(p).sort(([a], [b]) => (a < b ? -1 : 1))));
}

function damaged(path: string, why: string): InputError {
  return new InputError(`the catalogue ${path} is damaged (${why}); rebuild it with \`${REBUILD_HINT} --catalogue ${path}\` (the damaged file is kept aside)`, 'catalogue');
}

export class Catalogue {
  private constructor(readonly path: string, readonly db: Database.Database) {}

  /** Open (creating the file and its folder on first use) and migrate to the current schema. */
  static open(path: string, options: { readonly?: boolean } = {}): Catalogue {
    const exists = existsSync(path);
    if (options.readonly && !exists) {
      throw new InputError(`no catalogue at ${path}; fill one with \`gradus catalogue build --n-max N --catalogue ${path}\``, 'catalogue');
    }
    if (!exists) mkdirSync(dirname(path), { recursive: true });
    let db: Database.Database;
    try {
      db = new Database(path);
      db.pragma('journal_mode = WAL');
      db.pragma('synchronous = NORMAL');
      db.pragma('busy_timeout = 5000');
      const check = db.pragma('quick_check', { simple: true });
      if (check !== 'ok') throw damaged(path, String(check));
    } catch (e) {
      if (e instanceof InputError) throw e;
      throw damaged(path, (e as Error).message);
    }
    const version = db.pragma('user_version', { simple: true }) as number;
    if (version > SCHEMA_VERSION) {
      db.close();
      throw new InputError(`the catalogue ${path} has schema version ${version}, newer than this gradus reads (${SCHEMA_VERSION}); use a newer gradus or another --catalogue`, 'catalogue');
    }
    try {
      for (let v = version; v < SCHEMA_VERSION; v++) {
        db.transaction(() => {
          db.exec(MIGRATIONS[v]!);
          db.pragma(`user_version = ${v + 1}`);
        })();
      }
    } catch (e) {
      db.close();
      throw damaged(path, (e as Error).message);
    }
    return new Catalogue(path, db);
  }

  close(): void {
    this.db.close();
  }

  /** True when the unit is stored, and (given a statistics signature) was built with the same statistics. */
  isUnitDone(family: string, params: Readonly<Record<string, number>>, statistics?: string): boolean {
    const r = this.db.prepare('SELECT statistics FROM units WHERE family = ? AND params = ?').get(family, paramsKey(params)) as { statistics: string } | undefined;
    return r !== undefined && (statistics === undefined || r.statistics === statistics);
  }

  /** All rows of one unit (family × params) and its completion mark, in one transaction. */
  writeUnit(family: string, params: Readonly<Record<string, number>>, objects: bigint, seconds: number, rows: readonly DistributionRow[], prov: Provenance, statistics = ''): void {
    const ins = this.db.prepare(
      `INSERT OR REPLACE INTO distributions (family, params, n, k, statistics, combine, transform, kind, series, at_one, hash, provenance)
       VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
    );
    const unit = this.db.prepare('INSERT OR REPLACE INTO units (family, params, n, k, objects, seconds, provenance, statistics) VALUES (?, ?, ?, ?, ?, ?, ?, ?)');
    const stale = this.db.prepare('DELETE FROM distributions WHERE family = ? AND params = ?');
    const provText = JSON.stringify(prov);
    this.db.transaction(() => {
      stale.run(family, paramsKey(params)); // rows of an earlier build of this unit
      for (const r of rows) {
        // each row carries its own inputs; the unit row keeps the full list of statistics
        const rowProv = JSON.stringify({ ...prov, inputs: { family: r.family, params: r.params, statistics: r.statistics, combine: r.combine, transform: r.transform } });
        ins.run(r.family, paramsKey(r.params), r.n, r.k ?? null, r.statistics.join(','), r.combine, r.transform, r.series.kind,
          toJsonText(seriesToJson(r.series)), seriesAtOne(r.series).toString(), seriesHash(r.series), rowProv);
      }
      unit.run(family, paramsKey(params), params['n'] ?? 0, params['k'] ?? null, objects.toString(), seconds, provText, statistics);
    })();
  }

  /** Rows whose series has this hash (exact look-up of a target entry). */
  byHash(hash: string): StoredRow[] {
    return (this.db.prepare('SELECT * FROM distributions WHERE hash = ?').all(hash) as RawRow[]).map(decode);
  }

  private findStatement: Database.Statement | undefined;

  /** Joint distributions of families indexed by n alone, at size n (for targets in n and k). */
  jointRowsAt(n: number): StoredRow[] {
    return (this.db.prepare("SELECT * FROM distributions WHERE combine = 'joint' AND n = ? AND k IS NULL").all(n) as RawRow[]).map(decode);
  }

  /** The row of one candidate at one place, if stored. */
  find(family: string, params: Readonly<Record<string, number>>, statistics: string, combine: string, transform: string): StoredRow | undefined {
    this.findStatement ??= this.db.prepare('SELECT * FROM distributions WHERE family = ? AND params = ? AND statistics = ? AND combine = ? AND transform = ?');
    const r = this.findStatement.get(family, paramsKey(params), statistics, combine, transform) as RawRow | undefined;
    return r ? decode(r) : undefined;
  }

  /** Candidate groups (family, statistics, combine, transform) of some kinds at size n, and how many share a count. */
  candidateCounts(kinds: readonly SeriesKind[], n: number, atOne: bigint): { groups: number; sameCount: number; families: string[]; statistics: string[] } {
    const where = `kind IN (${kinds.map(() => '?').join(',')}) AND n = ?`;
    const args: unknown[] = [...kinds, n];
    const groups = (this.db.prepare(`SELECT COUNT(*) AS c FROM (SELECT DISTINCT family, statistics, combine, transform FROM distributions WHERE ${where})`).get(...args) as { c: number }).c;
    const sameCount = (this.db.prepare(`SELECT COUNT(*) AS c FROM (SELECT DISTINCT family, statistics, combine, transform FROM distributions WHERE ${where} AND at_one = ?)`).get(...args, atOne.toString()) as { c: number }).c;
    const families = (this.db.prepare(`SELECT DISTINCT family FROM distributions WHERE ${where} ORDER BY family`).all(...args) as { family: string }[]).map((r) => r.family);
    const statistics = (this.db.prepare(`SELECT DISTINCT statistics FROM distributions WHERE ${where} AND combine IN ('single', 'shape') ORDER BY statistics`).all(...args) as { statistics: string }[]).map((r) => r.statistics);
    return { groups, sameCount, families, statistics };
  }

  private maxNCache: number | undefined;

  maxN(): number {
    this.maxNCache ??= (this.db.prepare('SELECT COALESCE(MAX(n), -1) AS m FROM units').get() as { m: number }).m;
    return this.maxNCache;
  }

  info(): { path: string; schema: number; units: number; distributions: number; families: { family: string; nMax: number; rows: number }[]; modules: number; syms: number; searches: number } {
    const one = (sql: string) => (this.db.prepare(sql).get() as { c: number }).c;
    return {
      path: this.path,
      schema: this.db.pragma('user_version', { simple: true }) as number,
      units: one('SELECT COUNT(*) AS c FROM units'),
      distributions: one('SELECT COUNT(*) AS c FROM distributions'),
      families: this.db.prepare('SELECT family, MAX(n) AS nMax, COUNT(*) AS rows FROM distributions GROUP BY family ORDER BY family').all() as { family: string; nMax: number; rows: number }[],
      modules: one('SELECT COUNT(*) AS c FROM module_results'),
      syms: one('SELECT COUNT(*) AS c FROM sym_results'),
      searches: one('SELECT COUNT(*) AS c FROM search_results'),
    };
  }

  saveModuleResult(inputs: string, n: number | undefined, k: number | undefined, result: unknown, prov: Provenance): void {
    const text = toJsonText(result);
    this.db.prepare('INSERT OR REPLACE INTO module_results (inputs, n, k, result, hash, provenance) VALUES (?, ?, ?, ?, ?, ?)')
      .run(inputs, n ?? null, k ?? null, text, textHash(text), JSON.stringify(prov));
  }

  saveSymResult(expression: string, degree: number | undefined, result: unknown, prov: Provenance): void {
    const text = toJsonText(result);
    this.db.prepare('INSERT OR REPLACE INTO sym_results (expression, degree, result, hash, provenance) VALUES (?, ?, ?, ?, ?)')
      .run(expression, degree ?? null, text, textHash(text), JSON.stringify(prov));
  }

  /** A stored module result by its command line, if any. */
  getModuleResult(inputs: string): unknown | undefined {
    const r = this.db.prepare('SELECT result FROM module_results WHERE inputs = ?').get(inputs) as { result: string } | undefined;
    return r ? JSON.parse(r.result) : undefined;
  }

  getSymResult(expression: string): unknown | undefined {
    const r = this.db.prepare('SELECT result FROM sym_results WHERE expression = ?').get(expression) as { result: string } | undefined;
    return r ? JSON.parse(r.result) : undefined;
  }

  saveSearch(target: string, result: unknown, prov: Provenance): number {
    const r = this.db.prepare('INSERT INTO search_results (created, target, result, provenance) VALUES (?, ?, ?, ?)')
      .run(new Date().toISOString(), target, toJsonText(result), JSON.stringify(prov));
    return Number(r.lastInsertRowid);
  }

  getSearch(id: number): unknown | undefined {
    const r = this.db.prepare('SELECT result FROM search_results WHERE id = ?').get(id) as { result: string } | undefined;
    return r ? JSON.parse(r.result) : undefined;
  }
}

function textHash(text: string): string {
  return createHash('sha1').update(text).digest('hex');
}

function decode(r: RawRow): StoredRow {
  return {
    id: r.id,
    family: r.family,
    params: JSON.parse(r.params) as Record<string, number>,
    n: r.n,
    ...(r.k === null ? {} : { k: r.k }),
    statistics: r.statistics.split(','),
    combine: r.combine as Combine,
    transform: r.transform,
    series: seriesFromJson(JSON.parse(r.series), `catalogue row ${r.id}`, r.kind as SeriesKind),
    hash: r.hash,
    atOne: BigInt(r.at_one),
  };
}
