/**
 * Our sweep format ("gradus-sweep", version 1): the sweep's canonical command, its state
 * (running while modules are computed, done when every module was tried), the counts of
 * seeds and modules, the ranked rows with their findings and the commands reproducing them,
 * the isomorphism candidates and provenance. Kept in the catalogue; checked (zod) when read.
 */
import { createHash } from 'node:crypto';
import { z } from 'zod';
import { parseWith } from '../core/schema.js';
import type { Provenance } from '../core/provenance.js';
import type { SweepAnalysis, SweepRow } from './analyse.js';
import { FINDING_KINDS } from './findings.js';
import type { IsomorphismGroup } from './isomorphism.js';
import type { SweepCounts } from './plan.js';

export const SWEEP_FORMAT = 'gradus-sweep';
export const SWEEP_VERSION = 1;

export interface SweepDocument {
  readonly format: typeof SWEEP_FORMAT;
  readonly version: typeof SWEEP_VERSION;
  readonly id: string;
  readonly key: string;
  readonly state: 'running' | 'done';
  readonly counts: SweepCounts & { readonly kept: number; readonly computed: number; readonly skipped: number; readonly failed: number };
  readonly rows: readonly SweepRow[];
  readonly isomorphism: readonly IsomorphismGroup[];
  readonly catalogueNote?: string;
  readonly provenance: Provenance;
}

/** A short id of a sweep: the first 8 hex digits of the hash of its canonical command. */
export function sweepId(key: string): string {
  return createHash('sha1').update(key).digest('hex').slice(0, 8);
}

export function sweepDocument(key: string, state: SweepDocument['state'], counts: SweepDocument['counts'], a: SweepAnalysis, provenance: Provenance): SweepDocument {
  return {
    format: SWEEP_FORMAT,
    version: SWEEP_VERSION,
    id: sweepId(key),
    key,
    state,
    counts,
    rows: a.rows,
    isomorphism: a.isomorphism,
    ...(a.catalogueNote ? { catalogueNote: a.catalogueNote } : {}),
    provenance,
  };
}

const TEXT = z.string().max(200_000);
const PLACE = { n: z.number().int().min(1).max(64), k: z.number().int().min(0).max(64).optional() };
const COUNT = z.string().regex(/^\d+$/);
const FINDING = z.object({ kind: z.enum(FINDING_KINDS), claim: TEXT, verified: TEXT, places: z.array(z.object(PLACE)).max(100_000) });

const SCHEMA = z.object({
  format: z.literal(SWEEP_FORMAT, { error: `not a sweep ("format" must be "${SWEEP_FORMAT}")` }),
  version: z.literal(SWEEP_VERSION, { error: `sweep version is not read by this gradus (reads ${SWEEP_VERSION})` }),
  id: z.string().regex(/^[0-9a-f]{8}$/),
  key: TEXT,
  state: z.enum(['running', 'done']),
  counts: z.object({
    raw: COUNT,
    vanishing: COUNT,
    duplicates: COUNT,
    undefinedPlaces: z.number().int().min(0),
    modules: z.number().int().min(0),
    kept: z.number().int().min(0),
    computed: z.number().int().min(0),
    skipped: z.number().int().min(0),
    failed: z.number().int().min(0),
  }),
  rows: z
    .array(
      z.object({
        rank: z.number().int().min(0),
        id: z.string().max(20),
        seed: TEXT,
        ops: z.array(z.string().max(20)).max(40),
        places: z.array(z.object({ ...PLACE, key: TEXT, dimension: COUNT, hilbert: TEXT })).max(100_000),
        left: z.array(z.object({ ...PLACE, why: TEXT })).max(100_000),
        missing: z.array(z.object({ ...PLACE, key: TEXT, why: TEXT })).max(100_000),
        findings: z.array(FINDING).max(1000),
        reproduce: z.array(TEXT).max(100_000),
      }),
    )
    .max(1_000_000),
  isomorphism: z.array(z.object({ n: z.number().int(), what: TEXT, modules: z.array(TEXT), lines: z.array(z.string().max(20)) })).max(1_000_000),
  catalogueNote: TEXT.optional(),
  provenance: z.object({
    request: TEXT,
    method: TEXT,
    primes: z.array(z.number().int()),
    confirmation: TEXT,
    notes: z.array(TEXT),
    seconds: z.number(),
    time: z.string().max(40),
    version: z.string().max(100),
  }),
});

/** A kept sweep checked against our format; InputError names the place. */
export function checkSweepDocument(doc: unknown, where: string): SweepDocument {
  return parseWith(SCHEMA, doc, where, 'sweep') as unknown as SweepDocument;
}
