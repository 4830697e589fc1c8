/**
 * The catalogue: an embedded SQLite file (one transaction per unit of work) holding
 * distributions, results of data requests and saved searches. Before SQLite opens a path
 * the file is looked at: what gradus did not write is refused and never changed; a file of
 * ours that SQLite finds broken is "damaged", with the command that rebuilds it. Rows are
 * checked against their stored hashes when read.
 */
import Database from 'better-sqlite3';
import { createHash } from 'node:crypto';
import { accessSync, constants, mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { InputError } from '../core/errors.js';
import { toJsonText } from '../core/json-text.js';
import type { Provenance } from '../core/provenance.js';
import { seriesFromJson, seriesToJson } from '../series/seriesJson.js';
import { seriesAtOne, type Series, type SeriesKind } from '../series/series.js';
import { environmentReason, guarded } from '../core/environment-errors.js';
import { GRADUS_APPLICATION_ID, inspectCatalogueFile, notOurs } from './catalogue-file.js';
import { candidateSummary, dropSummaries } from './candidateSummary.js';
import { MIGRATIONS, SCHEMA_VERSION } from './migrations.js';
import { seriesHash } from './seriesHash.js';

export const REBUILD_HINT = 'gradus catalogue rebuild';

/** The Frobenius-level forms: Σ q^stat s_shape, F_Des(word), F_iDes(word), and Σ_μ m_μ Σ_{content μ} q^stat. */
export type SymCombine = 'shape' | 'fundamental' | 'ifundamental' | 'content';
/**
 * How a distribution row was formed from its statistics; `X-t0` is the Frobenius-level form X
 * of a pair (a, b) at t = 0: the objects with b = 0, weighted by q^a.
 */
export type Combine = 'single' | 'joint' | 'sum' | SymCombine | `${SymCombine}-t0`;
/** How a match was formed: a stored combination, or a slice of a joint distribution (k = value of the second statistic). */
export type MatchCombine = Combine | 'slice';

/** The parameters of a unit: integers (n, k) or partitions (shape, content). */
export type PlaceParams = Readonly<Record<string, number | readonly number[]>>;

export interface DistributionRow {
  readonly family: string;
  readonly params: PlaceParams;
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

export function paramsKey(p: PlaceParams): string {
  return JSON.stringify(Object.fromEntries(Object.entries(p).sort(([a], [b]) => (a < b ? -1 : 1))));
}

export function damaged(path: string, why: string): InputError {
  const reason = why.replace(/\s+/g, ' ').trim().slice(0, 200);
  return new InputError(`the catalogue ${path} is damaged (${reason}); rebuild it with \`${REBUILD_HINT} --catalogue ${path}\` (the damaged file is kept aside)`, 'catalogue');
}

/** The state of the last build: unfinished while a build runs, or after one was stopped. */
export interface BuildState {
  readonly state: 'running' | 'done';
  readonly nMax: number;
  readonly families?: readonly string[];
  readonly units: number;
  readonly started: string;
}

export interface OpenOptions {
  /** The catalogue must exist already (search, info, export); otherwise it is created. */
  readonly existing?: boolean;
}

export class Catalogue {
  private constructor(
    readonly path: string,
    readonly db: Database.Database,
    /** False when the file or its folder cannot be written: reads work, writes are refused. */
    readonly writable: boolean,
  ) {}

  /** Open (creating the file and its folder on first use unless `existing`) and migrate. */
  static open(path: string, options: OpenOptions = {}): Catalogue {
    const file = inspectCatalogueFile(path);
    if (file.kind === 'sqlite' && file.applicationId !== 0 && file.applicationId !== GRADUS_APPLICATION_ID) throw notOurs(path, "another program's SQLite database");
    if (file.kind !== 'sqlite' && options.existing) {
      throw new InputError(`no catalogue at ${path}; fill one with \`gradus catalogue build --n-max N --catalogue ${path}\``, 'catalogue');
    }
    if (file.kind === 'missing') {
      try {
        mkdirSync(dirname(path), { recursive: true });
      } catch (e) {
        throw new InputError(`--catalogue: cannot create the folder ${dirname(path)} (${environmentReason(e) ?? (e as Error).message})`, 'catalogue');
      }
    }
    const writable = file.kind === 'missing' ? isWritable(dirname(path)) : isWritable(path) && isWritable(dirname(path));
    if (!writable && !options.existing) throw new InputError(`cannot write the catalogue ${path}: ${file.kind === 'missing' ? 'its folder' : 'it or its folder'} is read-only`, 'catalogue');
    let db: Database.Database;
    try {
      db = new Database(path, writable ? {} : { readonly: true, fileMustExist: true });
    } catch (e) {
      throw new InputError(`cannot open the catalogue ${path} (${environmentReason(e) ?? (e as Error).message})`, 'catalogue');
    }
    try {
      db.pragma('busy_timeout = 10000');
      const appId = db.pragma('application_id', { simple: true }) as number;
      // Before application ids, a catalogue was known by its tables.
      const tables = new Set((db.prepare("SELECT name FROM sqlite_master WHERE type = 'table'").all() as { name: string }[]).map((r) => r.name));
      if (appId === 0 && tables.size > 0 && !(tables.has('units') && tables.has('distributions'))) throw notOurs(path, 'an SQLite database gradus did not write');
      if (writable) {
        // rollback journal, not WAL: a read-only copy then opens without side files
        db.pragma('journal_mode = DELETE');
        db.pragma('synchronous = NORMAL');
      }
      migrate(db, path, writable);
    } catch (e) {
      db.close();
      if (e instanceof InputError) throw e;
      const why = environmentReason(e);
      if (why && !/SQLITE_CORRUPT|SQLITE_NOTADB/.test(String((e as { code?: string }).code))) throw new InputError(`cannot open the catalogue ${path}: ${why}`, 'catalogue');
      throw damaged(path, (e as Error).message);
    }
    return new Catalogue(path, db, writable);
  }

  close(): void {
    this.db.close();
  }

  /** Run a read; a broken page is "damaged", an unreadable file one clear line. */
  private read<T>(fn: () => T): T {
    try {
      return fn();
    } catch (e) {
      const code = String((e as { code?: unknown } | null)?.code ?? '');
      if (code === 'SQLITE_CORRUPT' || code === 'SQLITE_NOTADB') throw damaged(this.path, (e as Error).message);
      const why = environmentReason(e);
      if (why) throw new InputError(`cannot read the catalogue ${this.path}: ${why}`, 'catalogue');
      throw e;
    }
  }

  /** SQLite's own check of every page (slow on a large file: `catalogue info --check`). */
  integrityCheck(): string {
    return this.read(() => String(this.db.pragma('quick_check', { simple: true })));
  }

  /** Run a write; a read-only catalogue or a full disk becomes one clear line. */
  private write<T>(doing: string, fn: () => T): T {
    if (!this.writable) throw new InputError(`cannot ${doing}: the catalogue ${this.path} is read-only`, 'catalogue');
    return guarded(`cannot ${doing} in ${this.path}`, fn);
  }

  /** True when the unit is stored, and (given a statistics signature) was built with the same statistics. */
  isUnitDone(family: string, params: PlaceParams, statistics?: string): boolean {
    const r = this.db.prepare('SELECT statistics FROM units WHERE family = ? AND params = ?').get(family, paramsKey(params)) as { statistics: string } | undefined;
    return r !== undefined && (statistics === undefined || r.statistics === statistics);
  }

  /** All rows of one unit (family × params) and its completion mark, in one transaction. */
  writeUnit(family: string, params: PlaceParams, objects: bigint, seconds: number, rows: readonly DistributionRow[], prov: Provenance, statistics = ''): void {
    this.write('store a unit', () => {
      const ins = this.db.prepare(
        `INSERT OR REPLACE INTO distributions (family, params, n, k, statistics, combine, transform, kind, series, at_one, hash, provenance)
         VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
      );
      const unit = this.db.prepare('INSERT OR REPLACE INTO units (family, params, n, k, objects, seconds, provenance, statistics) VALUES (?, ?, ?, ?, ?, ?, ?, ?)');
      const stale = this.db.prepare('DELETE FROM distributions WHERE family = ? AND params = ?');
      const provText = JSON.stringify(prov);
      this.db.transaction(() => {
        stale.run(family, paramsKey(params)); // rows of an earlier build of this unit
        dropSummaries(this.db);
        for (const r of rows) {
          // each row names its own inputs; the unit row keeps the notes and the full list of statistics
          const rowProv = JSON.stringify({ ...prov, request: `${r.family} ${paramsKey(r.params)} ${r.statistics.join(',')} ${r.combine}${r.transform ? ` via ${r.transform}` : ''}`, notes: [] });
          ins.run(r.family, paramsKey(r.params), r.n, r.k ?? null, r.statistics.join(','), r.combine, r.transform, r.series.kind,
            toJsonText(seriesToJson(r.series)), seriesAtOne(r.series).toString(), seriesHash(r.series), rowProv);
        }
        const { n, k } = placeOf(params);
        unit.run(family, paramsKey(params), n, k ?? null, objects.toString(), seconds, provText, statistics);
      })();
    });
  }

  /** A build starts: until finishBuild, every answer from this catalogue says it is unfinished. */
  beginBuild(state: Omit<BuildState, 'state' | 'started'>): void {
    const value: BuildState = { state: 'running', ...state, started: new Date().toISOString() };
    this.write('start a build', () => this.db.prepare("INSERT OR REPLACE INTO meta (key, value) VALUES ('build', ?)").run(JSON.stringify(value)));
  }

  finishBuild(): void {
    const b = this.buildState();
    if (b) this.write('finish a build', () => this.db.prepare("INSERT OR REPLACE INTO meta (key, value) VALUES ('build', ?)").run(JSON.stringify({ ...b, state: 'done' })));
  }

  buildState(): BuildState | undefined {
    const r = this.db.prepare("SELECT value FROM meta WHERE key = 'build'").get() as { value: string } | undefined;
    if (!r) return undefined;
    try {
      return JSON.parse(r.value) as BuildState;
    } catch {
      throw damaged(this.path, 'its build record is not JSON');
    }
  }

  /** A sentence for answers from a catalogue whose last build did not finish, else undefined. */
  unfinishedNote(): string | undefined {
    const b = this.buildState();
    if (!b || b.state === 'done') return undefined;
    const done = (this.db.prepare('SELECT COUNT(*) AS c FROM units').get() as { c: number }).c;
    return `the catalogue's last build (n ≤ ${b.nMax}, started ${b.started}) is unfinished or still running (${Math.min(done, b.units)} of ${b.units} units stored): answers may miss what it had not reached; finish it with \`gradus catalogue build --n-max ${b.nMax}${b.families ? ` --families ${b.families.join(',')}` : ''} --catalogue ${this.path}\``;
  }

  /** Rows whose series has this hash (exact look-up of a target entry). */
  byHash(hash: string): StoredRow[] {
    return this.read(() => (this.db.prepare('SELECT * FROM distributions WHERE hash = ?').all(hash) as RawRow[]).map((r) => decode(r, this.path)));
  }

  private findStatement: Database.Statement | undefined;

  /**
   * The joint tables of families indexed by n alone, at size n, as stored text (not decoded:
   * a slice search reads thousands; the rows it keeps are read again through `find`, which
   * checks them against their hashes).
   */
  jointTextsAt(n: number): { family: string; statistics: string; transform: string; series: string }[] {
    // family by family, so that SQLite seeks the place index (family, n, k) instead of reading every row
    const families = this.db.prepare('SELECT DISTINCT family FROM units WHERE n = ? AND k IS NULL').pluck().all(n) as string[];
    const at = this.db.prepare("SELECT family, statistics, transform, series FROM distributions WHERE family = ? AND n = ? AND k IS NULL AND combine = 'joint' AND params = ?");
    return this.read(() => families.flatMap((f) => at.all(f, n, paramsKey({ n })) as { family: string; statistics: string; transform: string; series: string }[]));
  }

  /** Joint distributions of families indexed by n alone, at size n (for targets in n and k). */
  jointRowsAt(n: number): StoredRow[] {
    return this.read(() => (this.db.prepare("SELECT * FROM distributions WHERE combine = 'joint' AND n = ? AND k IS NULL").all(n) as RawRow[]).map((r) => decode(r, this.path)));
  }

  /** Frobenius-level rows of pairs of statistics at size n (with ks: only rows without k or with k among them). */
  schurPairRowsAt(n: number, ks?: readonly number[]): StoredRow[] {
    const byK = ks ? ` AND (k IS NULL OR k IN (${ks.map(() => '?').join(',') || 'NULL'}))` : '';
    return this.read(() => (this.db.prepare(`SELECT * FROM distributions WHERE kind = 'schur' AND n = ? AND instr(statistics, ',') > 0${byK}`).all(n, ...(ks ?? [])) as RawRow[]).map((r) => decode(r, this.path)));
  }

  /** The row of one candidate at one place, if stored. */
  find(family: string, params: PlaceParams, statistics: string, combine: string, transform: string): StoredRow | undefined {
    this.findStatement ??= this.db.prepare('SELECT * FROM distributions WHERE family = ? AND params = ? AND statistics = ? AND combine = ? AND transform = ?');
    const r = this.read(() => this.findStatement!.get(family, paramsKey(params), statistics, combine, transform) as RawRow | undefined);
    return r ? decode(r, this.path) : undefined;
  }

  /** Candidate groups (family, statistics, combine, transform) of some kinds at size n, and how many share a count. */
  candidateCounts(kinds: readonly SeriesKind[], n: number, atOne: bigint): { groups: number; sameCount: number; families: string[]; statistics: string[] } {
    return this.read(() => this.countCandidates(kinds, n, atOne));
  }

  private countCandidates(kinds: readonly SeriesKind[], n: number, atOne: bigint): { groups: number; sameCount: number; families: string[]; statistics: string[] } {
    const s = candidateSummary(this.db, kinds, n, this.writable);
    return { groups: s.groups, sameCount: s.byCount[atOne.toString()] ?? 0, families: [...s.families], statistics: [...s.statistics] };
  }

  private maxNCache: number | undefined;

  maxN(): number {
    this.maxNCache ??= (this.db.prepare('SELECT COALESCE(MAX(n), -1) AS m FROM units').get() as { m: number }).m;
    return this.maxNCache;
  }

  info(): CatalogueInfo {
    return this.read(() => this.describe());
  }

  private describe(): CatalogueInfo {
    const one = (sql: string) => (this.db.prepare(sql).get() as { c: number }).c;
    const unfinished = this.unfinishedNote();
    return {
      path: this.path,
      schema: this.db.pragma('user_version', { simple: true }) as number,
      writable: this.writable,
      units: one('SELECT COUNT(*) AS c FROM units'),
      distributions: one('SELECT COUNT(*) AS c FROM distributions'),
      ...(this.buildState() ? { build: this.buildState()! } : {}),
      ...(unfinished ? { unfinished } : {}),
      families: this.db.prepare('SELECT family, MAX(n) AS nMax, COUNT(*) AS rows FROM distributions GROUP BY family ORDER BY family').all() as { family: string; nMax: number; rows: number }[],
      results: this.db.prepare('SELECT kind, COUNT(*) AS count FROM results GROUP BY kind ORDER BY kind').all() as { kind: string; count: number }[],
      searches: one('SELECT COUNT(*) AS c FROM search_results'),
    };
  }

  /** Keep the document of a computed request under its canonical key. */
  saveResult(key: string, kind: string, n: number | undefined, k: number | undefined, document: unknown, prov: Provenance): void {
    const text = toJsonText(document);
    this.write('keep a result', () =>
      this.db.prepare('INSERT OR REPLACE INTO results (key, kind, n, k, document, hash, provenance) VALUES (?, ?, ?, ?, ?, ?, ?)')
        .run(key, kind, n ?? null, k ?? null, text, textHash(text), JSON.stringify(prov)),
    );
  }

  /** The kept document of a request by its canonical key, checked against its hash. */
  getResult(key: string): unknown | undefined {
    const r = this.read(() => this.db.prepare('SELECT id, document, hash FROM results WHERE key = ?').get(key)) as { id: number; document: string; hash: string } | undefined;
    if (!r) return undefined;
    if (textHash(r.document) !== r.hash) throw damaged(this.path, `kept result ${r.id} does not match its hash`);
    return JSON.parse(r.document);
  }

  saveSearch(target: string, result: unknown, prov: Provenance): number {
    const text = toJsonText(result);
    return this.write('keep the search', () => {
      const r = this.db.prepare('INSERT INTO search_results (created, target, result, provenance, hash) VALUES (?, ?, ?, ?, ?)')
        .run(new Date().toISOString(), target, text, JSON.stringify(prov), textHash(text));
      return Number(r.lastInsertRowid);
    });
  }

  getSearch(id: number): unknown | undefined {
    const r = this.read(() => this.db.prepare('SELECT result, hash FROM search_results WHERE id = ?').get(id)) as { result: string; hash: string } | undefined;
    if (!r) return undefined;
    if (r.hash !== '' && textHash(r.result) !== r.hash) throw damaged(this.path, `saved search ${id} does not match its hash`);
    return JSON.parse(r.result);
  }
}

export interface CatalogueInfo {
  readonly path: string;
  readonly schema: number;
  readonly writable: boolean;
  readonly units: number;
  readonly distributions: number;
  readonly build?: BuildState;
  readonly unfinished?: string;
  readonly families: readonly { family: string; nMax: number; rows: number }[];
  readonly results: readonly { kind: string; count: number }[];
  readonly searches: number;
}

/** The size n (an integer n, else the size of the first partition) and k of a unit's parameters. */
export function placeOf(params: PlaceParams): { n: number; k?: number } {
  const n = params['n'];
  const k = params['k'];
  const list = Object.values(params).find((v): v is readonly number[] => typeof v !== 'number');
  return { n: typeof n === 'number' ? n : (list ?? []).reduce((a, b) => a + b, 0), ...(typeof k === 'number' ? { k } : {}) };
}

function isWritable(path: string): boolean {
  try {
    accessSync(path, constants.W_OK);
    return true;
  } catch {
    return false;
  }
}

/**
 * Bring the schema to the current version. Migrations run in one IMMEDIATE transaction that
 * re-reads the version inside, so processes creating the same catalogue at once apply each
 * migration exactly once.
 */
function migrate(db: Database.Database, path: string, writable: boolean): void {
  const version = db.pragma('user_version', { simple: true }) as number;
  if (version > SCHEMA_VERSION) {
    throw new InputError(`the catalogue ${path} has schema version ${version}, newer than this gradus reads (${SCHEMA_VERSION}); use a newer gradus or another --catalogue`, 'catalogue');
  }
  if (version === SCHEMA_VERSION && (db.pragma('application_id', { simple: true }) as number) === GRADUS_APPLICATION_ID) return;
  if (!writable) throw new InputError(`the catalogue ${path} needs an upgrade to schema ${SCHEMA_VERSION}, but it is read-only; open it once with write access`, 'catalogue');
  db.transaction(() => {
    for (let v = db.pragma('user_version', { simple: true }) as number; v < SCHEMA_VERSION; v++) {
      db.exec(MIGRATIONS[v]!);
      db.pragma(`user_version = ${v + 1}`);
    }
    db.pragma(`application_id = ${GRADUS_APPLICATION_ID}`);
  }).immediate();
}

function textHash(text: string): string {
  return createHash('sha1').update(text).digest('hex');
}

/** A stored row, its series checked against the stored hash (an edited digit is caught here). */
function decode(r: RawRow, path: string): StoredRow {
  let series: Series;
  try {
    series = seriesFromJson(JSON.parse(r.series), `catalogue row ${r.id}`, r.kind as SeriesKind);
  } catch {
    throw damaged(path, `row ${r.id} does not hold a series`);
  }
  if (seriesHash(series) !== r.hash || seriesAtOne(series).toString() !== r.at_one) throw damaged(path, `row ${r.id} does not match its hash`);
  return {
    id: r.id,
    family: r.family,
    params: JSON.parse(r.params) as PlaceParams,
    n: r.n,
    ...(r.k === null ? {} : { k: r.k }),
    statistics: r.statistics.split(','),
    combine: r.combine as Combine,
    transform: r.transform,
    series,
    hash: r.hash,
    atOne: BigInt(r.at_one),
  };
}
