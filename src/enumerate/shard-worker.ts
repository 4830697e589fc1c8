/**
 * Worker side of the parallel engine: for each job {id, request, shard} runs the shard,
 * posting progress messages, then the outcome (or the error, with its type). A worker
 * serves many jobs in turn (parallel.ts keeps a small pool).
 */
import { parentPort } from 'node:worker_threads';
import type { Shard } from './plugin.js';
import { resolveRequest, type DistRequest } from './request.js';
import { runShard } from './run-shard.js';

export interface WorkerJob {
  readonly id: number;
  readonly request: DistRequest;
  readonly shard: Shard;
}

export type WorkerMessage =
  | { readonly id: number; readonly type: 'progress'; readonly visited: number }
  | { readonly id: number; readonly type: 'done'; readonly outcome: ReturnType<typeof runShard> }
  | { readonly id: number; readonly type: 'error'; readonly name: string; readonly message: string; readonly argument?: string };

const port = parentPort;
if (port) {
  port.on('message', ({ id, request, shard }: WorkerJob) => {
    try {
      const resolved = resolveRequest(request);
      const outcome = runShard(resolved, shard, (visited) => port.postMessage({ id, type: 'progress', visited } satisfies WorkerMessage));
      port.postMessage({ id, type: 'done', outcome } satisfies WorkerMessage);
    } catch (e) {
      const err = e instanceof Error ? e : new Error(String(e));
      const argument = (err as { argument?: string }).argument;
      port.postMessage({ id, type: 'error', name: err.name, message: err.message, ...(argument ? { argument } : {}) } satisfies WorkerMessage);
    }
  });
}
