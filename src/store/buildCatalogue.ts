/**
 * Fill the catalogue unit by unit, each unit in its own transaction (an interrupted build
 * keeps every finished unit and nothing of the unit under way; running again resumes).
 */
import { LimitError } from '../core/errors.js';
import type { Progress } from '../core/progress.js';
import type { Catalogue } from './catalogue.js';
import { planUnits, statsSignature, unitProvenance, type Unit } from './planUnits.js';
import { accumulate } from './rawTally.js';
import { rowsOfTally } from './tallyUnit.js';

export interface BuildOptions {
  readonly nMax: number;
  readonly maxObjects: bigint;
  readonly families?: readonly string[];
  readonly progress: Progress;
  /** Called after each unit is written (for a line of log on stderr). */
  readonly onUnit?: (text: string) => void;
}

export interface BuildReport {
  readonly units: number;
  readonly skippedDone: number;
  readonly rows: number;
  readonly objects: string;
  readonly seconds: number;
  readonly familiesLeftOut: readonly { family: string; why: string }[];
}

/** The units still to build (those not done with the same statistics) and their object count, within the limit. */
export function pendingWork(cat: Catalogue, o: BuildOptions): { plan: ReturnType<typeof planUnits>; todo: Unit[]; total: bigint } {
  const plan = planUnits(o.nMax, o.families);
  // Small units first (stable within a size): an interrupted build keeps as many finished units as it can.
  const todo = plan.units.filter((u) => !cat.isUnitDone(u.family.id, u.params, statsSignature(u))).sort((a, b) => (a.objects < b.objects ? -1 : a.objects > b.objects ? 1 : 0));
  const total = todo.reduce((s, u) => s + u.objects, 0n);
  if (total > o.maxObjects) {
    throw new LimitError(`building up to n = ${o.nMax} visits ${total} objects, above the limit ${o.maxObjects}; raise it with --max-objects`, 'max-objects');
  }
  return { plan, todo, total };
}

export function buildCatalogue(cat: Catalogue, o: BuildOptions): BuildReport {
  const { plan, todo, total } = pendingWork(cat, o);
  cat.beginBuild({ nMax: o.nMax, ...(o.families ? { families: o.families } : {}), units: plan.units.length });
  const t0 = Date.now();
  let done = 0n;
  let rows = 0;
  o.progress.start(`catalogue build (n ≤ ${o.nMax})`, Number(total));
  for (const u of todo) {
    const t1 = Date.now();
    const r = rowsOfTally(u, u.stats, accumulate({ family: u.family, n: u.n, parts: u.parts, stats: u.stats, checks: u.checks }));
    const seconds = (Date.now() - t1) / 1000;
    cat.writeUnit(u.family.id, u.params, r.objects, seconds, r.rows,
      unitProvenance(u, 'exhaustive enumeration, exact integer tallies', seconds), statsSignature(u));
    rows += r.rows.length;
    done += r.objects;
    o.progress.update(Number(done));
    o.onUnit?.(`${u.family.id} ${JSON.stringify(u.params)}: ${r.objects} objects, ${r.rows.length} distributions, ${seconds.toFixed(2)}s`);
  }
  o.progress.finish();
  cat.finishBuild();
  return {
    units: todo.length,
    skippedDone: plan.units.length - todo.length,
    rows,
    objects: done.toString(),
    seconds: (Date.now() - t0) / 1000,
    familiesLeftOut: plan.skipped,
  };
}
