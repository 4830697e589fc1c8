/**
 * Where a plan stands, shard by shard: done (a checked file in the work folder), running or
 * pending (in the scheduler's queue), failed (a failure note, or the final state accounting
 * gives), unusable (a file at the shard's place that is not of this plan) or missing (none of
 * these: never run, or stopped without a word, such as a task killed outright).
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { codeText } from './code-version.js';
import { jobNames, readJobs, type Submission } from './jobs-file.js';
import { readMerged } from './merge.js';
import { readFailure, readShard } from './shard-file.js';
import { accounted, isActive, queued, type QueueEntry } from './slurm.js';
import type { WorkFolder } from './work-folder.js';

export const SHARD_STATES = ['done', 'running', 'pending', 'failed', 'missing', 'unusable'] as const;
export type ShardState = (typeof SHARD_STATES)[number];

export interface ShardStatus {
  readonly id: number;
  readonly label: string;
  readonly state: ShardState;
  readonly detail?: string;
  /** The Slurm job of its last submission ("123_4"), and its log. */
  readonly job?: string;
  readonly log?: string;
}

export interface PlanStatus {
  readonly folder: string;
  readonly plan: { readonly id: string; readonly kind: string; readonly key: string; readonly route: string; readonly code: string; readonly shards: number };
  readonly counts: Readonly<Record<ShardState, number>>;
  readonly shards: readonly ShardStatus[];
  readonly merge: { readonly state: 'merged' | 'queued' | 'running' | 'not submitted' | 'not running'; readonly job?: string; readonly output?: string; readonly detail?: string };
  /** What the scheduler could tell: the queue (squeue) and finished tasks (sacct). */
  readonly scheduler: { readonly queue: boolean; readonly accounting: boolean };
}

const RUNNING = new Set(['RUNNING', 'COMPLETING', 'CONFIGURING', 'STAGE_OUT', 'RESIZING']);

export function planStatus(folder: WorkFolder): PlanStatus {
  const m = folder.manifest;
  const subs = readJobs(folder);
  const names = jobNames(folder);
  const queue = subs.length ? queued([names.shards, names.merge]) : undefined;
  const last = new Map<number, Submission>();
  for (const s of subs) for (const id of s.shards) last.set(id, s);
  const arrays = [...new Set(subs.flatMap((s) => (s.array ? [s.array] : [])))];
  const acct = subs.length ? accounted(arrays) : undefined;
  const shards: ShardStatus[] = m.shards.map((s) => {
    const base = { id: s.id, label: s.label };
    const sub = last.get(s.id);
    const job = sub?.array ? `${sub.array}_${s.id}` : undefined;
    const where: { job?: string; log?: string } = job ? { job, log: join(folder.logsDir, `shard-${job}.out`) } : {};
    const file = readShard(folder, s.id);
    if (file.state === 'done') return { ...base, state: 'done', ...where };
    if (file.state === 'invalid') return { ...base, state: 'unusable', detail: file.why, ...where };
    const q: QueueEntry | undefined = job ? queue?.get(job) ?? (sub?.array ? queue?.get(`${sub.array}_[${s.id}]`) : undefined) : undefined;
    if (q && isActive(q.state)) return { ...base, state: RUNNING.has(q.state) ? 'running' : 'pending', ...(q.reason && q.reason !== 'None' ? { detail: q.reason } : {}), ...where };
    const note = readFailure(folder, s.id);
    const final = job ? acct?.get(job) : undefined;
    if (note) return { ...base, state: 'failed', detail: note.message, ...where };
    if (final && final.state !== 'COMPLETED') return { ...base, state: 'failed', detail: `${final.state} (exit ${final.exit})`, ...where };
    const why = !job ? undefined : existsSync(where.log!) ? 'its task left the queue without a result (killed, or out of time or memory); see its log' : 'its task left the queue before it started (cancelled)';
    return { ...base, state: 'missing', ...(why ? { detail: why } : {}), ...where };
  });
  const counts = Object.fromEntries(SHARD_STATES.map((st) => [st, shards.filter((s) => s.state === st).length])) as Record<ShardState, number>;
  const merged = readMerged(folder);
  const lastMerge = [...subs].reverse().find((s) => s.merge)?.merge;
  const mq = lastMerge ? queue?.get(lastMerge) : undefined;
  const merge: PlanStatus['merge'] = merged
    ? { state: 'merged', output: merged.output }
    : mq && isActive(mq.state)
    ? { state: RUNNING.has(mq.state) ? 'running' : 'queued', job: lastMerge!, ...(mq.reason && mq.reason !== 'None' ? { detail: mq.reason } : {}) }
    : lastMerge
    ? { state: 'not running', job: lastMerge, detail: 'its job left the queue without a merge (a shard failed, or it was cancelled)' }
    : { state: 'not submitted' };
  return {
    folder: folder.dir,
    plan: { id: m.id, kind: m.kind, key: m.key, route: m.route, code: codeText(m.code), shards: m.shards.length },
    counts,
    shards,
    merge,
    scheduler: { queue: queue !== undefined, accounting: acct !== undefined },
  };
}
