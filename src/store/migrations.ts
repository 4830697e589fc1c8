/**
 * Versioned schema of the catalogue: migration i takes PRAGMA user_version from i to i+1.
 * Each runs in one transaction with the version bump, so a file is never half-migrated.
 */
export const MIGRATIONS: readonly string[] = [
  `CREATE TABLE meta (key TEXT PRIMARY KEY, value TEXT NOT NULL);
   CREATE TABLE units (
     family TEXT NOT NULL, params TEXT NOT NULL, n INTEGER NOT NULL, k INTEGER,
     objects TEXT NOT NULL, seconds REAL NOT NULL, provenance TEXT NOT NULL,
     PRIMARY KEY (family, params));
   CREATE TABLE distributions (
     id INTEGER PRIMARY KEY,
     family TEXT NOT NULL, params TEXT NOT NULL, n INTEGER NOT NULL, k INTEGER,
     statistics TEXT NOT NULL, combine TEXT NOT NULL, transform TEXT NOT NULL DEFAULT '',
     kind TEXT NOT NULL, series TEXT NOT NULL, at_one TEXT NOT NULL, hash TEXT NOT NULL,
     provenance TEXT NOT NULL,
     UNIQUE (family, params, statistics, combine, transform));
   CREATE INDEX distributions_hash ON distributions (hash);
   CREATE INDEX distributions_place ON distributions (family, n, k);
   CREATE TABLE module_results (
     id INTEGER PRIMARY KEY, inputs TEXT NOT NULL, n INTEGER, k INTEGER,
     result TEXT NOT NULL, hash TEXT NOT NULL, provenance TEXT NOT NULL, UNIQUE (inputs));
   CREATE TABLE sym_results (
     id INTEGER PRIMARY KEY, expression TEXT NOT NULL, degree INTEGER,
     result TEXT NOT NULL, hash TEXT NOT NULL, provenance TEXT NOT NULL, UNIQUE (expression));
   CREATE TABLE search_results (
     id INTEGER PRIMARY KEY, created TEXT NOT NULL, target TEXT NOT NULL,
     result TEXT NOT NULL, provenance TEXT NOT NULL);`,
  // 2: the statistics a unit was built with, so that a build redoes units whose set changed
  `ALTER TABLE units ADD COLUMN statistics TEXT NOT NULL DEFAULT '';`,
  // 3: results of data requests by their canonical key (replacing the argv-keyed module and
  // symmetric-function tables, which are no longer read), and hashes of saved searches
  `CREATE TABLE results (
     id INTEGER PRIMARY KEY, key TEXT NOT NULL UNIQUE, kind TEXT NOT NULL, n INTEGER, k INTEGER,
     document TEXT NOT NULL, hash TEXT NOT NULL, provenance TEXT NOT NULL);
   CREATE INDEX results_place ON results (kind, n, k);
   ALTER TABLE search_results ADD COLUMN hash TEXT NOT NULL DEFAULT '';`,
  // 4: the expression library: families of symmetric-function expressions (built in or added by
  // the user), one unit per (family, n); every value (a place, a specialisation, a projection)
  // points at its series, each distinct series stored once under its hash; and an index by size
  // for the search's counts of candidates
  `CREATE TABLE expression_families (
     id TEXT PRIMARY KEY, template TEXT NOT NULL, indexing TEXT NOT NULL, k_min INTEGER NOT NULL,
     title TEXT NOT NULL, source TEXT NOT NULL, origin TEXT NOT NULL, sign TEXT NOT NULL, created TEXT NOT NULL);
   CREATE TABLE expression_units (
     family TEXT NOT NULL, n INTEGER NOT NULL, seconds REAL NOT NULL, provenance TEXT NOT NULL,
     PRIMARY KEY (family, n));
   CREATE TABLE expression_series (hash TEXT PRIMARY KEY, kind TEXT NOT NULL, series TEXT NOT NULL, at_one TEXT NOT NULL);
   CREATE TABLE expression_values (
     id INTEGER PRIMARY KEY, family TEXT NOT NULL, n INTEGER NOT NULL, k INTEGER, partition TEXT NOT NULL,
     place TEXT NOT NULL, specialisation TEXT NOT NULL, projection TEXT NOT NULL, expression TEXT NOT NULL,
     hash TEXT NOT NULL, UNIQUE (family, place, specialisation, projection));
   CREATE INDEX expression_values_hash ON expression_values (hash);
   CREATE INDEX distributions_size ON distributions (n, kind, at_one);`,
];

export const SCHEMA_VERSION = MIGRATIONS.length;
