/**
 * Runs an engine task in a worker thread, so long work never freezes the keyboard, and
 * cancelling is immediate (the worker is terminated; engines write nothing half-done from
 * these tasks). Results cross the thread boundary as JSON-ready data in the engines' own
 * JSON conventions.
 */
import { Worker } from 'node:worker_threads';

export interface JobProgress {
  readonly label: string;
  readonly done: number;
  readonly total: number | undefined;
}

export interface Job<T> {
  readonly result: Promise<T>;
  cancel(): void;
}

export class JobCancelled extends Error {
  override readonly name = 'JobCancelled';
  constructor() {
    super('cancelled');
  }
}

/** Messages from the worker (see jobWorkerMain.ts). */
export type WorkerMessage =
  | { readonly type: 'progress'; readonly label: string; readonly done: number; readonly total?: number }
  | { readonly type: 'result'; readonly value: unknown }
  | { readonly type: 'error'; readonly message: string; readonly user: boolean };

/** An error from the worker, rebuilt on this side (user errors keep their one-line message). */
export class JobError extends Error {
  override readonly name = 'JobError';
  constructor(
    message: string,
    readonly user: boolean,
  ) {
    super(message);
  }
}

export function startJob<T>(task: string, input: unknown, onProgress: (p: JobProgress) => void): Job<T> {
  const worker = new Worker(new URL('./jobWorker.mjs', import.meta.url), {
    workerData: { task, input },
    stdout: true,
    stderr: true,
  });
  let settled = false;
  let rejectFn: (e: unknown) => void = () => {};
  const result = new Promise<T>((resolve, reject) => {
    rejectFn = reject;
    worker.on('message', (m: WorkerMessage) => {
      if (m.type === 'progress') onProgress({ label: m.label, done: m.done, total: m.total });
      else if (m.type === 'result') {
        settled = true;
        resolve(m.value as T);
        void worker.terminate();
      } else {
        settled = true;
        reject(new JobError(m.message, m.user));
        void worker.terminate();
      }
    });
    worker.on('error', (e) => {
      if (settled) return;
      settled = true;
      reject(new JobError(e instanceof Error ? e.message : String(e), false));
    });
    worker.on('exit', () => {
      if (settled) return;
      settled = true;
      reject(new JobCancelled());
    });
  });
  return {
    result,
    cancel() {
      if (settled) return;
      settled = true;
      rejectFn(new JobCancelled());
      void worker.terminate();
    },
  };
}
