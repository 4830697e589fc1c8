/**
 * Runs a distribution request on worker threads, one shard each, and merges their tallies
 * on the main thread. Workers load TypeScript through worker-entry.mjs (tsx), so this
 * works from the command line and under vitest alike.
 */
import { Worker } from 'node:worker_threads';
import { InputError, LimitError } from '../core/errors.js';
import type { DistRequest } from './request.js';
import type { ShardOutcome } from './run-shard.js';
import type { WorkerMessage } from './shard-worker.js';

const ENTRY = new URL('./worker-entry.mjs', import.meta.url);

export async function runParallel(request: DistRequest, workers: number, onVisited?: (visited: number) => void): Promise<ShardOutcome[]> {
  const progress = new Array<number>(workers).fill(0);
  const report = (): void => onVisited?.(progress.reduce((a, b) => a + b, 0));
  const started: Worker[] = [];
  const runs = Array.from({ length: workers }, (_, index) => {
    return new Promise<ShardOutcome>((resolve, reject) => {
      const w = new Worker(ENTRY);
      started.push(w);
      let settled = false;
      w.on('message', (m: WorkerMessage) => {
        if (m.type === 'progress') {
          progress[index] = m.visited;
          report();
        } else if (m.type === 'done') {
          settled = true;
          progress[index] = m.outcome.visited;
          report();
          resolve(m.outcome);
        } else {
          settled = true;
          const E = m.name === 'InputError' ? InputError : m.name === 'LimitError' ? LimitError : Error;
          reject(new E(m.message, m.argument));
        }
        if (settled) void w.terminate();
      });
      w.on('error', (e) => {
        settled = true;
        reject(e);
      });
      w.on('exit', (code) => {
        if (!settled) reject(new Error(`distribution worker ${index} stopped with code ${code}`));
      });
      w.postMessage({ request, shard: { index, count: workers } });
    });
  });
  try {
    return await Promise.all(runs);
  } finally {
    await Promise.all(started.map((w) => w.terminate()));
  }
}
