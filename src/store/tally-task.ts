/** Pool task of the catalogue build: tally one unit, or one shard of it. */
import { familyById } from '../../objects/index.js';
import type { Shard } from '../enumerate/plugin.js';
import { accumulate, type RawTally, type UnitPart } from './rawTally.js';
import type { Unit } from './planUnits.js';
import { statsFromIds } from './statPlan.js';

export interface TallyJob {
  readonly family: string;
  readonly n: number;
  readonly parts: readonly UnitPart[];
  /** The unit's statistics by id, in tally order. */
  readonly stats: readonly string[];
  /** Left-out statistics re-checked on a sample: [id, index of the kept statistic it equals]. */
  readonly checks: readonly (readonly [string, number])[];
  readonly shard?: Shard;
}

/** The job that tallies `unit` (or one shard of it) in a worker: the unit named by ids, so it crosses threads and files. */
export function tallyJobOf(unit: Unit, shard?: Shard): TallyJob {
  return {
    family: unit.family.id, n: unit.n, parts: unit.parts, stats: unit.stats.map((s) => s.id), checks: unit.checks.map((c) => [c.stat.id, c.sameAs] as const),
    ...(shard && shard.count > 1 ? { shard } : {}),
  };
}

export function tallyJob(job: TallyJob): RawTally {
  const family = familyById(job.family);
  const stats = statsFromIds(job.stats);
  const dropped = statsFromIds(job.checks.map(([id]) => id));
  return accumulate({ family, n: job.n, parts: job.parts, stats, checks: job.checks.map(([, sameAs], i) => ({ stat: dropped[i]!, sameAs })), ...(job.shard ? { shard: job.shard } : {}) });
}
