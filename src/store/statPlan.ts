/**
 * The statistics a catalogue unit tallies: the family's own statistics, then those read after
 * each transform leaving the family ("T:s"). Named by id, so a worker thread resolves the same
 * list from the registries; grouped by transform, so a transform is applied once per object.
 */
import { transformById, transformsFrom } from '../../objects/transforms/index.js';
import { statisticById, statisticsOfFamily } from '../../statistics/index.js';
import type { Family, Statistic, Transform } from '../enumerate/plugin.js';

/** A statistic as tallied: an own statistic (transform ''), or one read after a transform. */
export interface TallyStat {
  readonly id: string;
  readonly transform: string;
  readonly statistic: Statistic<unknown>;
  readonly map?: Transform<unknown, unknown>;
}

/** Consecutive statistics sharing one transform (the first group, without map, is the own statistics). */
export interface StatGroup {
  readonly map?: Transform<unknown, unknown>;
  readonly from: number;
  readonly to: number;
}

export function ownStat(s: Statistic<unknown>): TallyStat {
  return { id: s.id, transform: '', statistic: s };
}

export function mappedStat(t: Transform<unknown, unknown>, s: Statistic<unknown>): TallyStat {
  return { id: `${t.id}:${s.id}`, transform: t.id, statistic: s, map: t };
}

/** Every statistic a unit of the family could tally, own ones first. */
export function allStatsOf(family: Family<unknown>): TallyStat[] {
  const own = statisticsOfFamily(family.id).map(ownStat);
  const via = transformsFrom(family.id).flatMap((t) => statisticsOfFamily(t.to).map((s) => mappedStat(t, s)));
  return [...own, ...via];
}

/** The statistics named by ids ("s" or "T:s"), as a worker resolves a job's list. */
export function statsFromIds(ids: readonly string[]): TallyStat[] {
  return ids.map((id) => {
    const i = id.indexOf(':');
    return i < 0 ? ownStat(statisticById(id)) : mappedStat(transformById(id.slice(0, i)), statisticById(id.slice(i + 1)));
  });
}

/** Own statistics first, then each transform's statistics together (stable otherwise). */
export function orderStats(stats: readonly TallyStat[]): TallyStat[] {
  const own = stats.filter((s) => !s.map);
  const order = [...new Set(stats.filter((s) => s.map).map((s) => s.transform))];
  return [...own, ...order.flatMap((t) => stats.filter((s) => s.transform === t))];
}

/** The groups of an ordered list (see orderStats). */
export function groupsOf(stats: readonly TallyStat[]): StatGroup[] {
  const out: StatGroup[] = [];
  let from = 0;
  for (let i = 1; i <= stats.length; i++) {
    if (i === stats.length || stats[i]!.transform !== stats[from]!.transform) {
      out.push({ ...(stats[from]!.map ? { map: stats[from]!.map } : {}), from, to: i });
      from = i;
    }
  }
  return out;
}

/** How many statistics of the ordered list are the family's own (they come first). */
export function ownCount(stats: readonly TallyStat[]): number {
  let i = 0;
  while (i < stats.length && !stats[i]!.map) i++;
  return i;
}
