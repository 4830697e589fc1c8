/**
 * The units a catalogue build fills, n = 1..nMax, for every family whose parameters have a
 * size (unitPlaces.ts says which places each family gets), with the family's statistics and
 * those read after each transform, less the duplicates (duplicateStats.ts). A family left out
 * is listed with the reason.
 */
import { FAMILIES } from '../../objects/index.js';
import { InputError } from '../core/errors.js';
import { makeProvenance, type Provenance } from '../core/provenance.js';
import { unknownNameMessage } from '../core/suggest.js';
import type { Family } from '../enumerate/plugin.js';
import { chooseStats, type StatChoice } from './duplicateStats.js';
import { allStatsOf, orderStats, type TallyStat } from './statPlan.js';
import type { UnitShape } from './tallyUnit.js';
import { placesOf, placesUnderstood } from './unitPlaces.js';

/** Bumped when the rows a unit holds change for the same statistics (older units are rebuilt). */
const ROWS_FORMAT = 'rows-2';

export interface Unit extends UnitShape {
  readonly stats: readonly TallyStat[];
  /** Statistics left out as equal to a kept one (index into stats), re-checked on a sample. */
  readonly checks: readonly { readonly stat: TallyStat; readonly sameAs: number }[];
  readonly objects: bigint;
}

export interface Plan {
  readonly units: readonly Unit[];
  /** Families left out, with the reason. */
  readonly skipped: readonly { family: string; why: string }[];
}

/**
 * The plan of a build, with every named family checked first: an unknown name or a family the
 * catalogue does not hold is an InputError naming it (never an empty build reported as done).
 */
export function planUnits(nMax: number, only?: readonly string[]): Plan {
  if (only) {
    for (const id of only) {
      const family = FAMILIES.find((f) => f.id === id);
      if (!family) throw new InputError(`--families: ${unknownNameMessage('family', id, FAMILIES.map((f) => f.id))}`, 'families');
      const why = leftOut(family);
      if (why) throw new InputError(`--families: ${id} is not catalogued (${why})`, 'families');
    }
  }
  const units: Unit[] = [];
  const { planned, skipped } = coverage(only);
  for (const family of planned) {
    const choice = statChoice(family);
    const stats = orderStats(choice.kept);
    const checks = choice.dropped.map((d) => ({ stat: d.stat, sameAs: stats.findIndex((s) => s.id === d.sameAs) }));
    for (let n = 1; n <= nMax; n++) {
      for (const place of placesOf(family, n)) {
        const objects = place.parts.reduce((s, p) => s + family.count(p.params), 0n);
        if (objects === 0n) continue;
        units.push({ ...place, family, stats, checks, selfMaps: choice.selfMaps, objects });
      }
    }
  }
  return { units, skipped };
}

/** The families a build fills and those it leaves out, with the reason (cheap: no statistic is computed). */
export function coverage(only?: readonly string[]): { planned: Family<unknown>[]; skipped: { family: string; why: string }[] } {
  const planned: Family<unknown>[] = [];
  const skipped: { family: string; why: string }[] = [];
  for (const family of FAMILIES) {
    if (only && !only.includes(family.id)) continue;
    const why = leftOut(family);
    if (why) skipped.push({ family: family.id, why });
    else planned.push(family);
  }
  return { planned, skipped };
}

/** Why a family is not catalogued, or undefined. */
function leftOut(family: Family<unknown>): string | undefined {
  const why = placesUnderstood(family);
  if (why) return why;
  if (allStatsOf(family).length === 0) return 'no statistics yet';
  for (let n = 1; n <= 3; n++) if (placesOf(family, n).length > 0) return undefined;
  return `no parameter set of size n = 1..3 passes its checks (${family.params.map((p) => `${p.name}${p.optional ? ' (optional)' : ''}`).join(', ')})`;
}

/** The statistics of a family's units, duplicates left out (the same for every build size). */
export function statChoice(family: Family<unknown>): StatChoice {
  const partsAt = (n: number) => [...new Map(placesOf(family, n).flatMap((p) => p.parts.map((x) => [JSON.stringify(x.params), x.params] as const))).values()];
  return chooseStats(family, partsAt, allStatsOf(family));
}

/** The statistics of a unit as one text (a change of the registry or of the rows makes units stale). */
export function statsSignature(u: Unit): string {
  return [ROWS_FORMAT, ...u.stats.map((s) => s.id), ...(u.selfMaps?.length ? [`self=${u.selfMaps.join('+')}`] : [])].join(',');
}

/** Provenance of a unit's rows: the unit, how it was tallied, how long it took. */
export function unitProvenance(u: Unit, method: string, seconds: number): Provenance {
  const notes = [`${u.stats.length} statistics`];
  if (u.checks.length) notes.push(`${u.checks.length} left out as equal to a kept statistic on every object of the small sizes: ${u.checks.map((c) => `${c.stat.id} = ${u.stats[c.sameAs]!.id}`).join('; ')}`);
  if (u.selfMaps?.length) notes.push(`single rows of the statistics read after ${u.selfMaps.join(', ')} left out (these map the unit onto itself)`);
  return makeProvenance({ request: `catalogue unit ${u.family.id} ${paramsText(u.params)}`, method, seconds, notes });
}

export function paramsText(p: Readonly<Record<string, number | readonly number[]>>): string {
  return Object.entries(p).map(([k, v]) => `${k}=${typeof v === 'number' ? v : v.join(',')}`).join(' ');
}
