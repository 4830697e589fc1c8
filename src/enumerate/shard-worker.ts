/**
 * Worker side of the parallel engine: receives {request, shard}, runs the shard and
 * posts progress messages, then the outcome (or the error, with its type).
 */
import { parentPort } from 'node:worker_threads';
import type { Shard } from './plugin.js';
import { resolveRequest, type DistRequest } from './request.js';
import { runShard } from './run-shard.js';

export type WorkerMessage =
  | { readonly type: 'progress'; readonly visited: number }
  | { readonly type: 'done'; readonly outcome: ReturnType<typeof runShard> }
  | { readonly type: 'error'; readonly name: string; readonly message: string; readonly argument?: string };

const port = parentPort;
if (port) {
  port.once('message', (msg: { request: DistRequest; shard: Shard }) => {
    try {
      const resolved = resolveRequest(msg.request);
      const outcome = runShard(resolved, msg.shard, (visited) => port.postMessage({ type: 'progress', visited } satisfies WorkerMessage));
      port.postMessage({ type: 'done', outcome } satisfies WorkerMessage);
    } catch (e) {
      const err = e instanceof Error ? e : new Error(String(e));
      const argument = (err as { argument?: string }).argument;
      port.postMessage({ type: 'error', name: err.name, message: err.message, ...(argument ? { argument } : {}) } satisfies WorkerMessage);
    }
  });
}
