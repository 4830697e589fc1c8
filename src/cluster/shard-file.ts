/**
 * Finished shards and failure notes in the work folder. A finished shard is one JSON file
 * (`gradus-cluster-shard`, version 1) naming its plan, its code and its shard, with a check
 * over its payload tied to the plan; it is written whole (temporary file, then rename), so a
 * killed task leaves either nothing or the complete file. A failure note
 * (`gradus-cluster-failure`) says why a shard stopped; it is removed when the shard finishes.
 */
import { createHash } from 'node:crypto';
import { readFileSync, rmSync, statSync } from 'node:fs';
import { hostname } from 'node:os';
import { z } from 'zod';
import { stableJson } from '../core/stable-json.js';
import { replaceFile } from './atomic-file.js';
import type { ModuleCell } from '../modules/module-cell.js';
import type { CodeVersion } from './code-version.js';
import { CODE, type Manifest } from './manifest.js';
import { RAW_TALLY_JSON } from './raw-tally-json.js';
import type { WorkFolder } from './work-folder.js';

const SHARD_FORMAT = 'gradus-cluster-shard';
const FAILURE_FORMAT = 'gradus-cluster-failure';
/** Far above any shard of a real plan (a tally shard of n = 12 units is a few MB). */
const SHARD_MAX_BYTES = 512 * 1024 * 1024;

const COUNT = z.number().int().min(0).max(2 ** 53);
const PRIME = z.number().int().min(2).max(2 ** 26);
const CELL = z.object({ degree: z.tuple([COUNT, COUNT, COUNT]), dim: COUNT, multiplicities: z.array(z.number().int()).optional() });
// a parameter is a number, or a partition (a shape or a content) as its parts
const PARAMS = z.record(z.string(), z.union([z.number().int(), z.array(z.number().int().min(0)).max(64).readonly()]));

export const SHARD_RESULT = z.discriminatedUnion('type', [
  z.object({ type: z.literal('young'), items: z.array(z.object({ task: COUNT, primes: z.array(PRIME), ranks: z.array(z.array(COUNT)) })) }),
  z.object({ type: z.literal('prime'), prime: PRIME, cells: z.array(CELL) }),
  z.object({
    type: z.literal('tally'),
    pieces: z.array(z.object({ family: z.string(), params: PARAMS, shard: z.object({ index: COUNT, count: COUNT }).optional(), seconds: z.number().min(0), raw: RAW_TALLY_JSON })),
  }),
]);
export type ShardResult = z.infer<typeof SHARD_RESULT>;
type PlainCell = z.infer<typeof CELL>;

/** A module cell as a shard file holds it. */
export function plainCell(c: ModuleCell): PlainCell {
  return { degree: [c.degree[0], c.degree[1], c.degree[2]], dim: c.dim, ...(c.multiplicities ? { multiplicities: [...c.multiplicities] } : {}) };
}

const SHARD_FILE = z.object({
  format: z.literal(SHARD_FORMAT),
  version: z.literal(1),
  plan: z.string(),
  code: CODE,
  shard: COUNT,
  host: z.string().max(300),
  seconds: z.number().min(0),
  finished: z.string().max(40),
  result: SHARD_RESULT,
  check: z.string(),
});
export type ShardFile = z.infer<typeof SHARD_FILE>;

const FAILURE_FILE = z.object({
  format: z.literal(FAILURE_FORMAT),
  version: z.literal(1),
  plan: z.string(),
  shard: COUNT,
  host: z.string().max(300),
  job: z.string().max(100).optional(),
  time: z.string().max(40),
  message: z.string().max(4000),
});
export type FailureNote = z.infer<typeof FAILURE_FILE>;

function checkOf(plan: string, body: Omit<ShardFile, 'check'>): string {
  return createHash('sha256').update(plan).update('\n').update(stableJson(body)).digest('hex').slice(0, 24);
}

export function writeShard(folder: WorkFolder, id: number, code: CodeVersion, seconds: number, result: ShardResult): void {
  const body: Omit<ShardFile, 'check'> = { format: SHARD_FORMAT, version: 1, plan: folder.manifest.id, code, shard: id, host: hostname(), seconds, finished: new Date().toISOString(), result };
  replaceFile(folder.shardPath(id), `${JSON.stringify({ ...body, check: checkOf(body.plan, body) })}\n`);
  // a note of an earlier failure of this shard is ours and now stale
  if (readFailure(folder, id)) rmSync(folder.failedPath(id), { force: true });
}

export type ShardRead = { readonly state: 'missing' } | { readonly state: 'done'; readonly file: ShardFile } | { readonly state: 'invalid'; readonly why: string };

/** The shard file of shard `id` as found: missing, done (checked in full against the plan), or why it cannot be used. */
export function readShard(folder: WorkFolder, id: number): ShardRead {
  const path = folder.shardPath(id);
  let size: number;
  try {
    size = statSync(path).size;
  } catch {
    return { state: 'missing' };
  }
  if (size > SHARD_MAX_BYTES) return { state: 'invalid', why: `${path} has ${size} bytes, more than any shard of gradus` };
  let value: unknown;
  try {
    value = JSON.parse(readFileSync(path, 'utf8'));
  } catch {
    return { state: 'invalid', why: `${path} is not JSON` };
  }
  if ((value as { format?: unknown } | null)?.format !== SHARD_FORMAT) return { state: 'invalid', why: `${path} is not a shard of gradus` };
  const parsed = SHARD_FILE.safeParse(value);
  if (!parsed.success) return { state: 'invalid', why: `${path} does not follow the shard format (${parsed.error.issues[0]?.message ?? 'schema'})` };
  const { check, ...body } = parsed.data;
  if (check !== checkOf(body.plan, body)) return { state: 'invalid', why: `${path} was changed after gradus wrote it (its check does not match)` };
  const m: Manifest = folder.manifest;
  if (body.plan !== m.id) return { state: 'invalid', why: `${path} belongs to another plan (${body.plan}, not ${m.id}): a shard of another request or another planning` };
  if (body.shard !== id) return { state: 'invalid', why: `${path} holds shard ${body.shard}, not ${id}` };
  if (body.code.gradus !== m.code.gradus || body.code.source !== m.code.source) {
    return { state: 'invalid', why: `${path} was computed by gradus ${body.code.gradus} (source ${body.code.source}), the plan by gradus ${m.code.gradus} (source ${m.code.source})` };
  }
  const work = m.shards.find((s) => s.id === id)?.work;
  if (work?.type !== body.result.type) return { state: 'invalid', why: `${path} holds ${body.result.type} work; the plan's shard ${id} is ${work?.type ?? 'absent'}` };
  return { state: 'done', file: parsed.data };
}

export function writeFailure(folder: WorkFolder, id: number, message: string): void {
  const job = process.env['SLURM_ARRAY_JOB_ID'] ? `${process.env['SLURM_ARRAY_JOB_ID']}_${process.env['SLURM_ARRAY_TASK_ID'] ?? ''}` : process.env['SLURM_JOB_ID'];
  const note: FailureNote = { format: FAILURE_FORMAT, version: 1, plan: folder.manifest.id, shard: id, host: hostname(), ...(job ? { job } : {}), time: new Date().toISOString(), message: message.slice(0, 4000) };
  try {
    replaceFile(folder.failedPath(id), `${JSON.stringify(note)}\n`);
  } catch {
    // the note is a courtesy: the missing shard file already says the shard is not done
  }
}

/** The failure note of shard `id` when there is one of ours for this plan. */
export function readFailure(folder: WorkFolder, id: number): FailureNote | undefined {
  try {
    const r = FAILURE_FILE.safeParse(JSON.parse(readFileSync(folder.failedPath(id), 'utf8')));
    return r.success && r.data.plan === folder.manifest.id ? r.data : undefined;
  } catch {
    return undefined;
  }
}
