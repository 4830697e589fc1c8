/**
 * The plan of a sharded run, in our own format (`gradus-cluster-plan`, version 1), kept as
 * gradus-cluster.json in the work folder: what is computed (the canonical request), by which
 * code, and the list of shards with the work of each. Checked against its schema when read.
 */
import { createHash } from 'node:crypto';
import { z } from 'zod';
import { parseWith } from '../core/schema.js';
import { stableJson } from '../core/stable-json.js';
import type { CodeVersion } from './code-version.js';

export const PLAN_FORMAT = 'gradus-cluster-plan';
export const PLAN_VERSION = 1;
/** Array indices are shard ids; Slurm's default MaxArraySize allows 0..1000. */
export const MAX_SHARDS = 1000;

const INT = z.number().int().min(0).max(2 ** 53);
const PRIME = z.number().int().min(2).max(2 ** 26);
// a parameter is a number, or a partition (a shape or a content) as its parts
const PARAMS = z.record(z.string(), z.union([z.number().int(), z.array(z.number().int().min(0)).max(64).readonly()]));

export const CODE = z.object({ gradus: z.string().max(100), source: z.string().regex(/^[0-9a-f]{8,64}$/) });

const YOUNG_WORK = z.object({
  type: z.literal('young'),
  items: z.array(z.object({ task: INT, label: z.string().max(200), primes: z.array(PRIME).min(1).max(2) })).min(1),
});
const PRIME_WORK = z.object({ type: z.literal('prime'), prime: PRIME });
const PIECE = z.object({ family: z.string().max(200), params: PARAMS, shard: z.object({ index: INT, count: INT.min(1) }).optional() });
const TALLY_WORK = z.object({ type: z.literal('tally'), pieces: z.array(PIECE).min(1) });

export const SHARD_WORK = z.discriminatedUnion('type', [YOUNG_WORK, PRIME_WORK, TALLY_WORK]);
export type ShardWork = z.infer<typeof SHARD_WORK>;
export type TallyPiece = z.infer<typeof PIECE>;

const SHARD = z.object({ id: INT.max(MAX_SHARDS), label: z.string().max(2000), work: SHARD_WORK });
export type ShardSpec = z.infer<typeof SHARD>;

const UNIT = z.object({ family: z.string().max(200), params: PARAMS, statistics: z.string().max(64), objects: z.string().regex(/^\d+$/), pieces: INT.min(1) });
export type PlannedUnit = z.infer<typeof UNIT>;

export const MANIFEST = z.object({
  format: z.literal(PLAN_FORMAT),
  version: z.literal(PLAN_VERSION),
  id: z.string().regex(/^[0-9a-f]{16}$/),
  kind: z.enum(['module', 'quotient', 'catalogue']),
  /** The canonical request: a gradus command line (catalogue: `catalogue build --n-max N …`). */
  key: z.string().max(20_000),
  code: CODE,
  created: z.string().max(40),
  /** How the work was split, in words. */
  route: z.string().max(400),
  primes: z.tuple([PRIME, PRIME]).optional(),
  /** Catalogue builds: where the merge writes, the build's size and families, and its units. */
  catalogue: z.string().max(4096).optional(),
  build: z.object({ nMax: INT.min(1).max(12), families: z.array(z.string().max(200)).optional() }).optional(),
  units: z.array(UNIT).optional(),
  shards: z.array(SHARD).min(1).max(MAX_SHARDS),
});
export type Manifest = z.infer<typeof MANIFEST>;

export type ManifestBody = Omit<Manifest, 'format' | 'version' | 'id' | 'created' | 'code'>;

/** A new manifest: its id is a hash of everything in it, so shards name the exact plan they belong to. */
export function makeManifest(body: ManifestBody, code: CodeVersion, created = new Date().toISOString()): Manifest {
  const rest = { format: PLAN_FORMAT, version: PLAN_VERSION, created, code, ...body } as const;
  const id = createHash('sha256').update(stableJson(rest)).digest('hex').slice(0, 16);
  return { ...rest, id };
}

export function readManifest(value: unknown, where: string): Manifest {
  return parseWith(MANIFEST, value, where);
}

/** A statistics signature as the manifest keeps it (the list itself can be long). */
export function signatureHash(signature: string): string {
  return createHash('sha256').update(signature).digest('hex').slice(0, 16);
}
