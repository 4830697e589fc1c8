/**
 * What a search reports as "tried" at size n — candidate groups (family, statistics, combine,
 * transform) of some kinds, how many share each count at q = 1, their families and statistics —
 * summarised once and kept in the catalogue's meta table: counting it from the rows reads every
 * row of that size, most of a second on a catalogue of n ≤ 8. A summary is dropped whenever a
 * unit is written, and recomputed when rows were added since (their largest id tells).
 */
import type Database from 'better-sqlite3';

export interface CandidateSummary {
  readonly groups: number;
  /** Number of groups by count at q = 1. */
  readonly byCount: Readonly<Record<string, number>>;
  readonly families: readonly string[];
  readonly statistics: readonly string[];
}

const PREFIX = 'summary:';

function lastId(db: Database.Database): number {
  return (db.prepare('SELECT COALESCE(MAX(id), 0) AS m FROM distributions').get() as { m: number }).m;
}

function compute(db: Database.Database, kinds: readonly string[], n: number): CandidateSummary {
  // family by family, so that SQLite seeks the place index (family, n, k) instead of reading every row
  const names = db.prepare('SELECT DISTINCT family FROM distributions').pluck().all() as string[];
  const at = db.prepare(`SELECT family, statistics, combine, transform, at_one FROM distributions WHERE family = ? AND n = ? AND kind IN (${kinds.map(() => '?').join(',')})`).raw();
  const rows = names.flatMap((f) => at.all(f, n, ...kinds) as [string, string, string, string, string][]);
  const groups = new Map<string, Set<string>>();
  const families = new Set<string>();
  const statistics = new Set<string>();
  for (const [family, stats, combine, transform, atOne] of rows) {
    const g = `${family}|${stats}|${combine}|${transform}`;
    let counts = groups.get(g);
    if (!counts) groups.set(g, (counts = new Set()));
    counts.add(atOne);
    families.add(family);
    if (combine === 'single' || combine === 'shape') statistics.add(stats);
  }
  const byCount: Record<string, number> = {};
  for (const counts of groups.values()) for (const c of counts) byCount[c] = (byCount[c] ?? 0) + 1;
  return { groups: groups.size, byCount, families: [...families].sort(), statistics: [...statistics].sort() };
}

/** The summary at n for these kinds, from meta when current (kept there when the file can be written). */
export function candidateSummary(db: Database.Database, kinds: readonly string[], n: number, writable: boolean): CandidateSummary {
  const key = `${PREFIX}${kinds.join(',')}:${n}`;
  const last = lastId(db);
  const kept = db.prepare('SELECT value FROM meta WHERE key = ?').get(key) as { value: string } | undefined;
  if (kept) {
    try {
      const v = JSON.parse(kept.value) as { last: number; summary: CandidateSummary };
      if (v.last === last) return v.summary;
    } catch {
      // a summary that does not parse is recomputed below
    }
  }
  const summary = compute(db, kinds, n);
  if (writable) {
    try {
      db.prepare('INSERT OR REPLACE INTO meta (key, value) VALUES (?, ?)').run(key, JSON.stringify({ last, summary }));
    } catch {
      // a busy or full catalogue answers without keeping the summary
    }
  }
  return summary;
}

/** Drops every kept summary (inside the transaction that writes a unit). */
export function dropSummaries(db: Database.Database): void {
  db.prepare(`DELETE FROM meta WHERE key LIKE '${PREFIX}%'`).run();
}
