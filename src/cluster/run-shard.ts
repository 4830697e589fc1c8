/**
 * Run one shard of a plan (what each array task calls): the work goes to the worker pool, so
 * this thread stays free to notice a stop (scancel, the time limit) and leave a failure note.
 * The result is written whole into the work folder; a shard already finished is not redone.
 */
import { InputError } from '../core/errors.js';
import { runTask } from '../pool/pool.js';
import type { ModuleCell } from '../modules/module-cell.js';
import type { RawTally } from '../store/rawTally.js';
import { planUnits } from '../store/planUnits.js';
import { tallyJobOf, type TallyJob } from '../store/tally-task.js';
import { unitKey } from './catalogue-split.js';
import { codeVersion } from './code-version.js';
import type { Manifest, ShardWork } from './manifest.js';
import { youngTaskInputs } from './module-split.js';
import { rawTallyToJson } from './raw-tally-json.js';
import { requestOf } from './request-of.js';
import { plainCell, readShard, writeFailure, writeShard, type ShardResult } from './shard-file.js';
import { checkCode, type WorkFolder } from './work-folder.js';

const RANK_TASK = new URL('../modules/rank-task.ts', import.meta.url);
const MODULE_TASK = new URL('../modules/module-task.ts', import.meta.url);
const TALLY_TASK = new URL('../store/tally-task.ts', import.meta.url);
const QUOTIENT_TASK = new URL('./quotient-task.ts', import.meta.url);

export interface ShardRunOptions {
  readonly log: (text: string) => void;
  readonly signal?: AbortSignal;
  /** Pool threads at once: the CPUs given to this task (default 1). */
  readonly threads?: number;
  readonly cwd: string;
}

export type ShardOutcome = { readonly state: 'already' } | { readonly state: 'done'; readonly seconds: number };

/** `items` through `fn`, at most `threads` at a time, results in order. */
async function limited<T, R>(items: readonly T[], threads: number, fn: (item: T) => Promise<R>): Promise<R[]> {
  const out = new Array<R>(items.length);
  let next = 0;
  const lane = async (): Promise<void> => {
    while (next < items.length) {
      const i = next++;
      out[i] = await fn(items[i]!);
    }
  };
  await Promise.all(Array.from({ length: Math.max(1, Math.min(threads, items.length)) }, lane));
  return out;
}

async function compute(m: Manifest, work: ShardWork, o: ShardRunOptions): Promise<ShardResult> {
  const threads = o.threads ?? 1;
  const hooks = { threads, ...(o.signal ? { signal: o.signal } : {}) };
  const timed = async <R>(label: string, run: () => Promise<R>): Promise<R> => {
    const t0 = performance.now();
    o.log(`${label}: started`);
    const r = await run();
    o.log(`${label}: ${((performance.now() - t0) / 1000).toFixed(1)} s`);
    return r;
  };
  if (work.type === 'tally') {
    if (!m.build) throw new InputError('a tally shard belongs to a catalogue plan, and this plan names no build', 'folder');
    // the pieces name units by family and parameters; the units' statistics and parts come from the plan of this code
    const units = new Map(planUnits(m.build.nMax, m.build.families).units.map((u) => [unitKey(u.family.id, u.params), u]));
    const pieces = await limited(work.pieces, threads, async (p) => {
      const t0 = performance.now();
      const unit = units.get(unitKey(p.family, p.params));
      if (!unit) throw new InputError(`the plan's piece ${p.family} ${JSON.stringify(p.params)} is not a unit of this code's catalogue plan`, 'folder');
      const job: TallyJob = tallyJobOf(unit, p.shard);
      const raw = await timed(`${p.family} ${JSON.stringify(p.params)}${p.shard ? ` piece ${p.shard.index + 1}/${p.shard.count}` : ''}`, () => runTask<RawTally>(TALLY_TASK, 'tallyJob', job, hooks));
      return { family: p.family, params: p.params, ...(p.shard ? { shard: p.shard } : {}), seconds: (performance.now() - t0) / 1000, raw: rawTallyToJson(raw) };
    });
    return { type: 'tally', pieces };
  }
  const request = requestOf(m, o.cwd);
  if (work.type === 'prime') {
    const cells =
      request.kind === 'module'
        ? await timed(`prime ${work.prime}`, () =>
            runTask<ModuleCell[]>(MODULE_TASK, 'modulePrime', { spec: request.spec, options: { frobenius: request.frobenius, method: request.method, maxWork: Infinity, prime: work.prime } }, hooks),
          )
        : request.kind === 'quotient'
        ? await timed(`prime ${work.prime}`, () => runTask<ModuleCell[]>(QUOTIENT_TASK, 'quotientPrime', { spec: request.spec, frobenius: request.frobenius, prime: work.prime }, hooks))
        : undefined;
    if (!cells) throw new Error(`a ${request.kind} plan has no prime shards`);
    return { type: 'prime', prime: work.prime, cells: cells.map(plainCell) };
  }
  if (request.kind !== 'module') throw new Error(`a ${request.kind} plan has no subgroup shards`);
  const inputs = youngTaskInputs(request, work);
  const items = await limited(inputs, threads, ({ label, input }) => timed(label, () => runTask<number[][]>(RANK_TASK, 'youngTaskRanks', input, hooks)));
  return { type: 'young', items: inputs.map(({ input }, i) => ({ task: input.task, primes: [...input.primes], ranks: items[i]! })) };
}

export async function runShard(folder: WorkFolder, id: number, o: ShardRunOptions): Promise<ShardOutcome> {
  const m = folder.manifest;
  const shard = m.shards.find((s) => s.id === id);
  if (!shard) throw new InputError(`--shard: the plan has shards 0 to ${m.shards.length - 1} (got ${id})`, 'shard');
  const code = codeVersion();
  checkCode(m.code, code, `${folder.dir} was planned by`);
  const present = readShard(folder, id);
  if (present.state === 'done') return { state: 'already' };
  if (present.state === 'invalid') throw new InputError(`shard ${id} cannot be written: ${present.why}; gradus leaves that file alone (move it away to recompute the shard)`, 'shard');
  folder.ensureDirs();
  const t0 = performance.now();
  o.log(`shard ${id} of ${m.shards.length} (${shard.label})`);
  let result: ShardResult;
  try {
    result = await compute(m, shard.work, o);
  } catch (e) {
    writeFailure(folder, id, o.signal?.aborted ? `stopped by ${String(o.signal.reason ?? 'a signal')} (scancel, a time limit or the node going down)` : (e as Error).message ?? String(e));
    throw e;
  }
  const seconds = (performance.now() - t0) / 1000;
  writeShard(folder, id, code, seconds, result);
  return { state: 'done', seconds };
}
