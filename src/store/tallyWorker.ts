/** Worker side of the parallel catalogue build: tally one unit or one shard of it. */
import { parentPort } from 'node:worker_threads';
import { familyById } from '../../objects/index.js';
import type { Shard } from '../enumerate/plugin.js';
import { statsOfFamily } from './planUnits.js';
import { accumulate, type RawTally } from './rawTally.js';

export interface TallyJob {
  readonly id: number;
  readonly family: string;
  readonly params: Readonly<Record<string, number>>;
  readonly shard?: Shard;
}

export type TallyReply = { readonly id: number; readonly raw: RawTally } | { readonly id: number; readonly error: string };

const port = parentPort;
if (port) {
  port.on('message', (job: TallyJob) => {
    try {
      const family = familyById(job.family);
      const raw = accumulate(family, job.params, statsOfFamily(family), job.shard);
      port.postMessage({ id: job.id, raw } satisfies TallyReply, [raw.singleDense.buffer as ArrayBuffer, raw.pairDense.buffer as ArrayBuffer]);
    } catch (e) {
      port.postMessage({ id: job.id, error: e instanceof Error ? e.message : String(e) } satisfies TallyReply);
    }
  });
}
