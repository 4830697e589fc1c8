/**
 * Runs a distribution request on the worker pool, one shard per thread, and merges nothing
 * itself: it returns the shard outcomes for the caller to merge.
 */
import { runTask } from '../pool/pool.js';
import type { DistRequest } from './request.js';
import type { ShardOutcome } from './run-shard.js';

const TASK = new URL('./shard-task.ts', import.meta.url);

export async function runParallel(request: DistRequest, workers: number, onVisited?: (visited: number) => void): Promise<ShardOutcome[]> {
  const progress = new Array<number>(workers).fill(0);
  return Promise.all(
    Array.from({ length: workers }, (_, index) =>
      runTask<ShardOutcome>(TASK, 'distributionShard', { request, shard: { index, count: workers } }, {
        threads: workers,
        onProgress: (_label, visited) => {
          progress[index] = visited;
          onVisited?.(progress.reduce((a, b) => a + b, 0));
        },
      }).then((outcome) => {
        progress[index] = outcome.visited;
        onVisited?.(progress.reduce((a, b) => a + b, 0));
        return outcome;
      }),
    ),
  );
}
