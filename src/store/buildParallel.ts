/**
 * The catalogue build on worker threads: units (and shards of the large ones) are tallied in
 * workers; the main thread merges shards, forms the distributions and writes each unit in
 * its own transaction, as the single-thread build does.
 */
import { setMaxListeners } from 'node:events';
import { InputError, LimitError } from '../core/errors.js';
import { runTask } from '../pool/pool.js';
import { pendingWork, type BuildOptions, type BuildReport } from './buildCatalogue.js';
import type { Catalogue } from './catalogue.js';
import { statsSignature, unitProvenance, type Unit } from './planUnits.js';
import { mergeRaw, type RawTally } from './rawTally.js';
import { rowsOfTally } from './tallyUnit.js';
import { tallyJobOf, type TallyJob } from './tally-task.js';

const TASK = new URL('./tally-task.ts', import.meta.url);
/** Units with at least this many objects are split into one shard per worker. */
const SHARD_MIN = 200_000n;

export async function buildCatalogueParallel(cat: Catalogue, o: BuildOptions & { readonly workers: number; readonly shardMin?: bigint }): Promise<BuildReport> {
  const { plan, todo, total } = pendingWork(cat, o);
  cat.beginBuild({ nMax: o.nMax, ...(o.families ? { families: o.families } : {}), units: plan.units.length });
  const t0 = Date.now();
  const jobs: { unit: Unit; job: TallyJob }[] = [];
  for (const unit of todo) {
    const shards = unit.objects >= (o.shardMin ?? SHARD_MIN) && unit.family.visit ? o.workers : 1;
    for (let index = 0; index < shards; index++) {
      jobs.push({ unit, job: tallyJobOf(unit, { index, count: shards }) });
    }
  }
  const pending = new Map<Unit, { left: number; raw?: RawTally; started: number }>();
  for (const { unit } of jobs) {
    const p = pending.get(unit) ?? { left: 0, started: 0 };
    p.left++;
    pending.set(unit, p);
  }
  let done = 0n;
  let rows = 0;
  o.progress.start(`catalogue build (n ≤ ${o.nMax}, ${o.workers} workers)`, Number(total));
  const finishUnit = (unit: Unit, raw: RawTally, started: number): void => {
    const r = rowsOfTally(unit, unit.stats, raw);
    const seconds = (Date.now() - started) / 1000;
    cat.writeUnit(unit.family.id, unit.params, r.objects, seconds, r.rows,
      unitProvenance(unit, `exhaustive enumeration, exact integer tallies (${o.workers} worker threads)`, seconds), statsSignature(unit));
    rows += r.rows.length;
    done += r.objects;
    o.progress.update(Number(done));
    o.onUnit?.(`${unit.family.id} ${JSON.stringify(unit.params)}: ${r.objects} objects, ${r.rows.length} distributions`);
  };
  const stop = new AbortController();
  setMaxListeners(0, stop.signal); // one listener per task in the pool // the first failure stops the other jobs
  try {
    // the pool runs `workers` jobs at once, in this order; each unit is written when its last shard is in
    await Promise.all(
      jobs.map(async ({ unit, job }) => {
        const state = pending.get(unit)!;
        if (!state.started) state.started = Date.now();
        let raw: RawTally;
        try {
          raw = await runTask<RawTally>(TASK, 'tallyJob', job, { threads: o.workers, signal: stop.signal });
        } catch (e) {
          stop.abort();
          throw e instanceof InputError || e instanceof LimitError ? e : new Error(`catalogue worker, ${unit.family.id} ${JSON.stringify(unit.params)}: ${(e as Error).message}`);
        }
        state.raw = state.raw ? mergeRaw(state.raw, raw) : raw;
        if (--state.left === 0) {
          finishUnit(unit, state.raw, state.started);
          state.raw = undefined;
        }
      }),
    );
  } finally {
    o.progress.finish();
  }
  cat.finishBuild();
  return { units: todo.length, skippedDone: plan.units.length - todo.length, rows, objects: done.toString(), seconds: (Date.now() - t0) / 1000, familiesLeftOut: plan.skipped };
}
