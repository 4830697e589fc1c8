/**
 * Our saved-search format ("gradus-search", version 1): the target, what the search
 * found and tried, the recognised formulas, and provenance. `gradus export` reads it.
 */
import { z } from 'zod';
import { parseWith } from '../core/schema.js';
import type { Provenance } from '../core/provenance.js';
import type { Target } from '../series/target.js';
import { targetToJson } from '../series/targetFile.js';
import type { Recognition } from './recognise.js';
import type { SearchOutcome } from './search.js';

export const SEARCH_FORMAT = 'gradus-search';
export const SEARCH_VERSION = 1;

export interface SearchDocument {
  readonly format: typeof SEARCH_FORMAT;
  readonly version: typeof SEARCH_VERSION;
  readonly target: ReturnType<typeof targetToJson>;
  readonly range: string;
  readonly recognition: {
    readonly formula?: string;
    readonly recurrences: readonly { text: string; name?: string; checked: number }[];
    readonly palindromic: boolean;
    readonly unimodal: boolean;
  };
  readonly matches: SearchOutcome['matches'];
  /** Families of the expression library equal to the target (absent in files of older versions). */
  readonly expressions: SearchOutcome['expressions'];
  readonly tried: SearchOutcome['tried'];
  readonly provenance: Provenance;
}

export function searchDocument(target: Target, range: string, rec: Recognition, outcome: SearchOutcome, prov: Provenance): SearchDocument {
  return {
    format: SEARCH_FORMAT,
    version: SEARCH_VERSION,
    target: targetToJson(target),
    range,
    recognition: {
      ...(rec.formula ? { formula: rec.formula.text } : {}),
      recurrences: rec.recurrences.map((r) => ({ text: r.text, ...(r.name ? { name: r.name } : {}), checked: r.checked })),
      palindromic: rec.palindromic,
      unimodal: rec.unimodal,
    },
    matches: outcome.matches,
    expressions: outcome.expressions,
    tried: outcome.tried,
    provenance: prov,
  };
}

const PLACE = z.object({ n: z.number().int().min(0).max(64), k: z.number().int().min(0).max(64).optional() });
const TEXT = z.string().max(100_000);

/** What export reads of a saved search; provenance of older files (inputs, gradusVersion) is read as it is. */
const SAVED_SEARCH = z.object({
  format: z.literal(SEARCH_FORMAT, { error: `not a saved search ("format" must be "${SEARCH_FORMAT}")` }),
  version: z.literal(SEARCH_VERSION, { error: `saved-search version is not read by this gradus (reads ${SEARCH_VERSION})` }),
  target: z.record(z.string(), z.unknown()),
  range: TEXT,
  recognition: z.object({
    formula: TEXT.optional(),
    recurrences: z.array(z.object({ text: TEXT, name: TEXT.optional(), checked: z.number().int().min(0) })).max(1000),
    palindromic: z.boolean(),
    unimodal: z.boolean(),
  }),
  matches: z
    .array(
      z.object({
        family: TEXT,
        statistics: z.array(TEXT).max(10),
        combine: TEXT,
        transform: TEXT,
        variant: TEXT,
        mapping: TEXT,
        formula: TEXT,
        verified: TEXT,
        verifiedEntries: z.array(PLACE).max(10_000),
        unchecked: z.array(PLACE).max(10_000),
        complete: z.boolean(),
        cost: z.number(),
        marker: TEXT.optional(),
      }),
    )
    .max(100_000),
  expressions: z
    .array(
      z.object({
        family: TEXT,
        title: TEXT,
        source: TEXT,
        origin: z.enum(['built-in', 'user']),
        expression: TEXT,
        example: TEXT,
        exampleAt: TEXT,
        specialisation: TEXT,
        projection: z.enum(['frobenius', 'hilbert']),
        variant: TEXT,
        mapping: TEXT,
        verified: TEXT,
        verifiedEntries: z.array(PLACE).max(10_000),
        unchecked: z.array(PLACE).max(10_000),
        complete: z.boolean(),
        cost: z.number(),
        marker: TEXT.optional(),
      }),
    )
    .max(100_000)
    .default([]),
  tried: z.object({
    anchor: PLACE.nullable(),
    catalogueMaxN: z.number().int(),
    candidates: z.number().int().min(0),
    sameCount: z.number().int().min(0),
    exactAtAnchor: z.number().int().min(0),
    families: z.array(TEXT),
    statistics: z.array(TEXT),
    variants: z.array(TEXT),
    combines: z.array(TEXT),
    expressions: z.object({ families: z.number().int().min(0), maxN: z.number().int() }).optional(),
    readings: z.array(TEXT).optional(),
  }),
  provenance: z.looseObject({ method: TEXT, time: TEXT }).transform((p) => ({
    request: typeof p['request'] === 'string' ? p['request'] : JSON.stringify(p['inputs'] ?? {}),
    method: p.method,
    primes: Array.isArray(p['primes']) ? (p['primes'] as number[]) : [],
    confirmation: typeof p['confirmation'] === 'string' ? p['confirmation'] : 'exact integer arithmetic (no modular step)',
    notes: Array.isArray(p['notes']) ? (p['notes'] as string[]) : [],
    seconds: typeof p['seconds'] === 'number' ? p['seconds'] : 0,
    time: p.time,
    version: typeof p['version'] === 'string' ? p['version'] : typeof p['gradusVersion'] === 'string' ? p['gradusVersion'] : 'unknown',
  })),
});

/** A saved search (a file or a catalogue row) checked against our format; InputError names the place. */
export function checkSearchDocument(doc: unknown, where: string): SearchDocument {
  return parseWith(SAVED_SEARCH, doc, where, 'result') as unknown as SearchDocument;
}
