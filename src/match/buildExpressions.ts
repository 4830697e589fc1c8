/**
 * Building the expression library: every family (built in, and the user's stored ones) at every
 * n up to --n-max that the catalogue does not hold yet, one pool task per place. A family's new
 * units are written together in one transaction when all of its places are in; a family that
 * fails at some place writes nothing and is reported with the place and the reason.
 */
import { InputError, LimitError } from '../core/errors.js';
import { makeProvenance } from '../core/provenance.js';
import type { Progress } from '../core/progress.js';
import { unknownNameMessage } from '../core/suggest.js';
import { runTask, TaskCancelled } from '../pool/pool.js';
import { seriesFromJson } from '../series/seriesJson.js';
import type { Catalogue } from '../store/catalogue.js';
import { expressionFamilies, writeExpressionUnits, type ExpressionFamily, type ExpressionUnit, type ExpressionValue } from '../store/expressionStore.js';
import { BUILT_IN_EXPRESSIONS, placesOf, type Place } from './expressionFamilies.js';
import { evaluateExpressionJob, type ExpressionJob, type ExpressionJobResult } from './expressionTask.js';

const TASK = new URL('./expressionTask.ts', import.meta.url);

/** The largest n of the library (the operators cost more than n! beyond). */
export const EXPRESSION_N_MAX = 8;

export interface ExpressionBuildOptions {
  readonly nMax: number;
  /** Only these family ids (built in or stored); default all. */
  readonly families?: readonly string[];
  readonly workers: number;
  readonly progress: Progress;
}

export interface ExpressionBuildReport {
  readonly families: number;
  readonly units: number;
  readonly skippedDone: number;
  readonly values: number;
  readonly seconds: number;
}

interface FamilyWork {
  readonly family: ExpressionFamily;
  readonly sizes: readonly number[];
  readonly replaceAll: boolean;
}

/**
 * Evaluate the places of some families at some sizes; each family is handed to `settled` (its
 * units, or its first failure) as soon as its last place is in, so a long build keeps what it
 * finished when it is stopped.
 */
async function evaluate(work: readonly FamilyWork[], workers: number, progress: Progress, settled: (w: FamilyWork, r: ExpressionUnit[] | Error) => void): Promise<void> {
  const jobs: { job: ExpressionJob; w: FamilyWork }[] = [];
  for (const w of work) for (const n of w.sizes) for (const place of placesOf(w.family, n)) jobs.push({ job: { family: w.family, place }, w });
  // on threads the largest sizes first, so that they finish together; on one, the smallest first (a failure is then the first place that fails)
  jobs.sort((a, b) => (workers > 1 ? b.job.place.n - a.job.place.n : a.job.place.n - b.job.place.n));
  const results = new Map<string, Map<number, { place: Place; r: ExpressionJobResult }[]>>();
  const failed = new Map<string, Error>();
  const left = new Map<string, number>(work.map((w) => [w.family.id, 0]));
  for (const { w } of jobs) left.set(w.family.id, left.get(w.family.id)! + 1);
  const settle = (w: FamilyWork) => {
    const f = failed.get(w.family.id);
    const byN = results.get(w.family.id) ?? new Map<number, { place: Place; r: ExpressionJobResult }[]>();
    settled(w, f ?? w.sizes.map((n) => unitOf(w.family, n, byN.get(n) ?? [], workers)));
  };
  for (const w of work) if (left.get(w.family.id) === 0) settle(w);
  let done = 0;
  progress.start(`expression library (${jobs.length} places, ${workers} worker${workers === 1 ? '' : 's'})`, jobs.length);
  const finish = (job: ExpressionJob, r: ExpressionJobResult) => {
    const byN = results.get(job.family.id) ?? new Map<number, { place: Place; r: ExpressionJobResult }[]>();
    byN.set(job.place.n, [...(byN.get(job.place.n) ?? []), { place: job.place, r }]);
    results.set(job.family.id, byN);
    progress.update(++done);
  };
  // every place is evaluated, so that the failure reported is the first place (smallest n, then k) that fails
  const failedAt = new Map<string, Place>();
  const failWith = (job: ExpressionJob, e: unknown) => {
    if (e instanceof TaskCancelled) return;
    if (!(e instanceof InputError || e instanceof LimitError)) throw e;
    const id = job.family.id;
    const prev = failedAt.get(id);
    const p = job.place;
    if (!prev || p.n < prev.n || (p.n === prev.n && (p.k ?? 0) < (prev.k ?? 0))) {
      failed.set(id, e);
      failedAt.set(id, p);
    }
  };
  const after = (w: FamilyWork) => {
    const l = left.get(w.family.id)! - 1;
    left.set(w.family.id, l);
    if (l === 0) settle(w);
  };
  if (workers <= 1) {
    for (const { job, w } of jobs) {
      try {
        if (!failed.has(job.family.id)) finish(job, evaluateExpressionJob(job));
      } catch (e) {
        failWith(job, e);
      }
      after(w);
    }
  } else {
    await Promise.all(
      jobs.map(async ({ job, w }) => {
        try {
          finish(job, await runTask<ExpressionJobResult>(TASK, 'evaluateExpressionJob', job, { threads: workers }));
        } catch (e) {
          failWith(job, e);
        }
        after(w);
      }),
    );
  }
  progress.finish();
}

function unitOf(family: ExpressionFamily, n: number, places: readonly { place: Place; r: ExpressionJobResult }[], workers: number): ExpressionUnit {
  const values: ExpressionValue[] = places.flatMap(({ place, r }) =>
    r.values.map((v) => ({
      family: family.id,
      n,
      ...(place.k === undefined ? {} : { k: place.k }),
      ...(place.partition ? { partition: place.partition } : {}),
      specialisation: v.specialisation,
      projection: v.projection,
      expression: v.expression,
      series: seriesFromJson(v.series, 'expression value'),
    })),
  );
  const seconds = places.reduce((s, p) => s + p.r.seconds, 0);
  return {
    n,
    values,
    seconds,
    provenance: makeProvenance({
      request: `expression library ${family.id} n=${n}: ${family.template}`,
      method: `exact over Q[q,t] by the symmetric-function engine (gradus sym), each place evaluated once and its specialisations derived from it (${workers} worker${workers === 1 ? '' : 's'})`,
      seconds,
    }),
  };
}

/** The families a build covers: the built-in ones and the user's stored ones (or those named). */
function familiesToBuild(cat: Catalogue, only: readonly string[] | undefined): { family: ExpressionFamily; stored?: ExpressionFamily & { sizes: readonly number[] } }[] {
  const stored = expressionFamilies(cat);
  const all = [
    ...BUILT_IN_EXPRESSIONS.map((family) => ({ family, stored: stored.find((s) => s.id === family.id) })),
    ...stored.filter((s) => s.origin === 'user').map((s) => ({ family: s as ExpressionFamily, stored: s })),
  ];
  if (!only) return all;
  for (const id of only) if (!all.some((x) => x.family.id === id)) throw new InputError(`--families: ${unknownNameMessage('expression family', id, all.map((x) => x.family.id))}`, 'families');
  return all.filter((x) => only.includes(x.family.id));
}

export async function buildExpressionLibrary(cat: Catalogue, o: ExpressionBuildOptions): Promise<ExpressionBuildReport> {
  const t0 = Date.now();
  const work: FamilyWork[] = [];
  let skippedDone = 0;
  for (const { family, stored } of familiesToBuild(cat, o.families)) {
    // a built-in family whose definition changed since it was stored is built again from n = 1
    const replaceAll = stored !== undefined && stored.template !== family.template;
    const have = new Set(replaceAll ? [] : stored?.sizes ?? []);
    const sizes = Array.from({ length: o.nMax }, (_, i) => i + 1).filter((n) => !have.has(n));
    skippedDone += o.nMax - sizes.length;
    work.push({ family, sizes, replaceAll });
  }
  let units = 0;
  let values = 0;
  const failures: string[] = [];
  await evaluate(work, o.workers, o.progress, (w, r) => {
    if (r instanceof Error) {
      failures.push(r.message);
      return;
    }
    writeExpressionUnits(cat, w.family, r, w.replaceAll);
    units += r.length;
    values += r.reduce((s, u) => s + u.values.length, 0);
  });
  if (failures.length) throw new InputError(`${failures.join('; ')} — nothing of ${failures.length === 1 ? 'that family' : 'those families'} was stored (the other families were)`, 'template');
  return { families: work.length, units, skippedDone, values, seconds: (Date.now() - t0) / 1000 };
}

/** A user family evaluated for n = 1..nMax and stored in one transaction, or nothing stored. */
export async function addExpressionFamily(cat: Catalogue, family: ExpressionFamily, nMax: number, workers: number, progress: Progress): Promise<ExpressionBuildReport> {
  const t0 = Date.now();
  if (expressionFamilies(cat).some((f) => f.id === family.id)) throw new InputError(`an expression family ${family.id} is already in the catalogue; remove it first (gradus expressions remove ${family.id})`, 'name');
  if (!cat.writable) throw new InputError(`cannot add an expression family: the catalogue ${cat.path} is read-only`, 'catalogue');
  const sizes = Array.from({ length: nMax }, (_, i) => i + 1);
  const box: { r: ExpressionUnit[] | Error } = { r: new Error('nothing evaluated') };
  await evaluate([{ family, sizes, replaceAll: true }], workers, progress, (_w, x) => {
    box.r = x;
  });
  const r = box.r;
  if (r instanceof Error) throw r;
  writeExpressionUnits(cat, family, r, true);
  return { families: 1, units: r.length, skippedDone: 0, values: r.reduce((s, u) => s + u.values.length, 0), seconds: (Date.now() - t0) / 1000 };
}

/** The user's families of another catalogue (one being rebuilt), read if it opens; none otherwise. */
export function userFamiliesOf(open: () => Catalogue): (ExpressionFamily & { readonly sizes: readonly number[] })[] {
  try {
    const old = open();
    try {
      return expressionFamilies(old).filter((f) => f.origin === 'user');
    } finally {
      old.close();
    }
  } catch {
    return [];
  }
}

/** Families added by the user, evaluated again into a fresh catalogue at their former sizes. */
export async function restoreUserFamilies(cat: Catalogue, families: readonly (ExpressionFamily & { readonly sizes: readonly number[] })[], workers: number, progress: Progress): Promise<number> {
  for (const f of families) {
    const { sizes, ...family } = f;
    const nMax = Math.max(0, ...sizes);
    if (nMax > 0) await addExpressionFamily(cat, { ...family, origin: 'user' }, Math.min(nMax, EXPRESSION_N_MAX), workers, progress);
  }
  return families.length;
}
