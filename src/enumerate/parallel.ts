/**
 * Runs a distribution request on worker threads, one shard each, and merges nothing
 * itself: it returns the shard outcomes for the caller to merge. Workers load TypeScript
 * through worker-entry.mjs (tsx), so this works from the command line and under vitest.
 * Started workers stay in a small pool between runs (unreferenced while idle, so they
 * never keep the process alive): a run of many small requests pays the start-up once.
 */
import { Worker } from 'node:worker_threads';
import { InputError, LimitError } from '../core/errors.js';
import type { DistRequest } from './request.js';
import type { ShardOutcome } from './run-shard.js';
import type { WorkerJob, WorkerMessage } from './shard-worker.js';

const ENTRY = new URL('./worker-entry.mjs', import.meta.url);
const MAX_IDLE = 4;

interface PoolWorker {
  readonly worker: Worker;
  busy: boolean;
  dead: boolean;
}

const pool: PoolWorker[] = [];
let nextJob = 1;

function acquire(): PoolWorker {
  let pw = pool.find((p) => !p.busy && !p.dead);
  if (!pw) {
    const worker = new Worker(ENTRY);
    const fresh: PoolWorker = { worker, busy: false, dead: false };
    worker.on('exit', () => {
      fresh.dead = true;
      const i = pool.indexOf(fresh);
      if (i >= 0) pool.splice(i, 1);
    });
    pool.push(fresh);
    pw = fresh;
  }
  pw.busy = true;
  pw.worker.ref();
  return pw;
}

function release(pw: PoolWorker): void {
  pw.busy = false;
  if (pool.filter((p) => !p.busy && !p.dead).length > MAX_IDLE) void pw.worker.terminate();
  else pw.worker.unref();
}

function runJob(request: DistRequest, shard: { index: number; count: number }, onVisited: (v: number) => void): Promise<ShardOutcome> {
  const pw = acquire();
  const id = nextJob++;
  return new Promise<ShardOutcome>((resolve, reject) => {
    const cleanup = (): void => {
      pw.worker.off('message', onMessage);
      pw.worker.off('error', onError);
      pw.worker.off('exit', onExit);
    };
    const onMessage = (m: WorkerMessage): void => {
      if (m.id !== id) return;
      if (m.type === 'progress') return onVisited(m.visited);
      cleanup();
      release(pw);
      if (m.type === 'done') {
        onVisited(m.outcome.visited);
        resolve(m.outcome);
      } else {
        const E = m.name === 'InputError' ? InputError : m.name === 'LimitError' ? LimitError : Error;
        reject(new E(m.message, m.argument));
      }
    };
    const onError = (e: Error): void => {
      cleanup();
      pw.dead = true;
      void pw.worker.terminate();
      reject(e);
    };
    const onExit = (code: number): void => {
      cleanup();
      reject(new Error(`distribution worker stopped with code ${code}`));
    };
    pw.worker.on('message', onMessage);
    pw.worker.on('error', onError);
    pw.worker.on('exit', onExit);
    pw.worker.postMessage({ id, request, shard } satisfies WorkerJob);
  });
}

export async function runParallel(request: DistRequest, workers: number, onVisited?: (visited: number) => void): Promise<ShardOutcome[]> {
  const progress = new Array<number>(workers).fill(0);
  const jobs = Array.from({ length: workers }, (_, index) =>
    runJob(request, { index, count: workers }, (v) => {
      progress[index] = v;
      onVisited?.(progress.reduce((a, b) => a + b, 0));
    }),
  );
  return Promise.all(jobs);
}

/** Stops the pooled workers (for tests and long-lived hosts that want them gone now). */
export async function stopWorkers(): Promise<void> {
  await Promise.all(pool.splice(0).map((p) => p.worker.terminate()));
}
