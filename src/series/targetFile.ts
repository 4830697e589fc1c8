/**
 * Our target-file format (documented in README.md, "Target files"):
 *   { "format": "gradus-target", "version": 1, "kind": "q" | "qt" | "schur" | "multi",
 *     "label": "…", "entries": [ { "n": 4, "k": 2, "series": <series JSON> }, … ] }
 * where <series JSON> follows src/series/seriesJson.ts.
 */
import { z } from 'zod';
import { parseWith, readJsonFile } from '../core/schema.js';
import { InputError } from '../core/errors.js';
import { seriesFromJson, seriesToJson } from './seriesJson.js';
import { makeTarget, type Target } from './target.js';
import type { SeriesKind } from './series.js';

export const TARGET_FORMAT = 'gradus-target';
export const TARGET_VERSION = 1;
const KINDS: readonly SeriesKind[] = ['q', 'qt', 'schur', 'multi'];
/** Sizes n of a target entry: far beyond what any engine computes, small enough to be a number. */
const MAX_N = 64;

export function targetToJson(t: Target): object {
  return {
    format: TARGET_FORMAT,
    version: TARGET_VERSION,
    kind: t.kind,
    label: t.label,
    ...(t.marked ? { marked: t.marked } : {}),
    entries: t.entries.map((e) => ({ n: e.n, ...(e.k === undefined ? {} : { k: e.k }), series: seriesToJson(e.series) })),
  };
}

const ENTRY = z.object({
  n: z.number().int().min(0).max(MAX_N),
  k: z.number().int().min(0).max(MAX_N).optional(),
  series: z.unknown(),
});

const TARGET = z.object({
  format: z.literal(TARGET_FORMAT, { error: `"format" must be "${TARGET_FORMAT}"` }),
  version: z.literal(TARGET_VERSION, { error: `"version" must be ${TARGET_VERSION} (the version this gradus reads)` }),
  kind: z.enum(KINDS as [SeriesKind, ...SeriesKind[]]),
  label: z.string().max(1000).optional(),
  marked: z.string().max(200).optional(),
  entries: z.array(ENTRY).min(1).max(10_000),
});

export function targetFromJson(doc: unknown, where = 'target', option?: string): Target {
  const o = parseWith(TARGET, doc, where, option);
  const kind = o.kind;
  const entries = o.entries.map((r, i) => ({ n: r.n, ...(r.k === undefined ? {} : { k: r.k }), series: seriesFromJson(r.series, `${where}: entries[${i}].series`, kind) }));
  const t = makeTarget(o.label ?? where, entries, o.marked);
  if (t.kind !== kind && !(kind === 'qt' && t.kind === 'q')) {
    throw new InputError(`${where}: "kind" says ${kind} but the entries are ${t.kind}`, option);
  }
  return { ...t, kind };
}

/** A target file is small (series for small n): larger files are refused before reading. */
export const MAX_TARGET_BYTES = 16 * 1024 * 1024;

export function readTargetFile(path: string): Target {
  return targetFromJson(readJsonFile(path, 'target-file', MAX_TARGET_BYTES, 'a target file'), path, 'target-file');
}
