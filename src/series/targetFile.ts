/**
 * Our target-file format (documented in README.md, "Target files"):
 *   { "format": "gradus-target", "version": 1, "kind": "q" | "qt" | "schur" | "multi",
 *     "label": "…", "entries": [ { "n": 4, "k": 2, "series": <series JSON> }, … ] }
 * where <series JSON> follows src/series/seriesJson.ts.
 */
import { readFileSync } from 'node:fs';
import { InputError } from '../core/errors.js';
import { seriesFromJson, seriesToJson } from './seriesJson.js';
import { makeTarget, type Target } from './target.js';
import type { SeriesKind } from './series.js';

export const TARGET_FORMAT = 'gradus-target';
export const TARGET_VERSION = 1;
const KINDS: readonly SeriesKind[] = ['q', 'qt', 'schur', 'multi'];

export function targetToJson(t: Target): object {
  return {
    format: TARGET_FORMAT,
    version: TARGET_VERSION,
    kind: t.kind,
    label: t.label,
    entries: t.entries.map((e) => ({ n: e.n, ...(e.k === undefined ? {} : { k: e.k }), series: seriesToJson(e.series) })),
  };
}

export function targetFromJson(doc: unknown, where = 'target'): Target {
  if (doc === null || typeof doc !== 'object') throw new InputError(`${where}: expected a JSON object`);
  const o = doc as Record<string, unknown>;
  if (o['format'] !== TARGET_FORMAT) throw new InputError(`${where}: "format" must be "${TARGET_FORMAT}" (got ${JSON.stringify(o['format'])})`);
  if (o['version'] !== TARGET_VERSION) throw new InputError(`${where}: "version" must be ${TARGET_VERSION} (got ${JSON.stringify(o['version'])}); this gradus reads version ${TARGET_VERSION}`);
  const kind = o['kind'];
  if (typeof kind !== 'string' || !KINDS.includes(kind as SeriesKind)) {
    throw new InputError(`${where}: "kind" must be one of ${KINDS.join(', ')} (got ${JSON.stringify(kind)})`);
  }
  if (!Array.isArray(o['entries'])) throw new InputError(`${where}: "entries" must be an array`);
  const entries = (o['entries'] as unknown[]).map((e, i) => {
    const r = e as Record<string, unknown>;
    if (typeof r?.['n'] !== 'number') throw new InputError(`${where}: entries[${i}].n must be an integer`);
    const k = r['k'];
    if (k !== undefined && typeof k !== 'number') throw new InputError(`${where}: entries[${i}].k must be an integer`);
    return { n: r['n'] as number, ...(k === undefined ? {} : { k: k as number }), series: seriesFromJson(r['series'], `${where}: entries[${i}].series`, kind as SeriesKind) };
  });
  const t = makeTarget(typeof o['label'] === 'string' ? o['label'] : where, entries);
  if (t.kind !== kind && !(kind === 'qt' && t.kind === 'q')) {
    throw new InputError(`${where}: "kind" says ${kind} but the entries are ${t.kind}`);
  }
  return { ...t, kind: kind as SeriesKind };
}

export function readTargetFile(path: string): Target {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    throw new InputError(`--target-file: cannot read ${path} (${(e as NodeJS.ErrnoException).code ?? 'error'})`, 'target-file');
  }
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (e) {
    throw new InputError(`--target-file: ${path} is not valid JSON (${(e as Error).message})`, 'target-file');
  }
  return targetFromJson(doc, path);
}
