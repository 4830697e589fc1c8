/** Pool task of the distribution engine: one shard of a request, with the objects visited as progress. */
import type { ProgressFn } from '../pool/pool.js';
import type { Shard } from './plugin.js';
import { resolveRequest, type DistRequest } from './request.js';
import { runShard, type ShardOutcome } from './run-shard.js';

export function distributionShard(input: { readonly request: DistRequest; readonly shard: Shard }, progress: ProgressFn): ShardOutcome {
  return runShard(resolveRequest(input.request), input.shard, (visited) => progress('objects', visited));
}
