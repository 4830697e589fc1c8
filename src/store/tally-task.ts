/** Pool task of the catalogue build: tally one unit, or one shard of it. */
import { familyById } from '../../objects/index.js';
import type { Shard } from '../enumerate/plugin.js';
import { statsOfFamily } from './planUnits.js';
import { accumulate, type RawTally } from './rawTally.js';

export interface TallyJob {
  readonly family: string;
  readonly params: Readonly<Record<string, number>>;
  readonly shard?: Shard;
}

export function tallyJob(job: TallyJob): RawTally {
  const family = familyById(job.family);
  return accumulate(family, job.params, statsOfFamily(family), job.shard);
}
