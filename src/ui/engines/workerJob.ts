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

let inProcess = false;

/**
 * Run tasks on this thread instead (the text demo: nothing to keep responsive, and no
 * worker start-up to pay). Such a job cannot be cancelled.
 */
export function runJobsInProcess(on: boolean): void {
  inProcess = on;
}

function startLocal<T>(task: string, input: unknown, onProgress: (p: JobProgress) => void): Job<T> {
  const result = import('./jobTasks.js').then(async ({ JOB_TASKS }) => {
    const run = JOB_TASKS[task];
    if (!run) throw new Error(`no such task ${task}`);
    const value = await run(input, (label, done, total) => onProgress({ label, done, total }));
    return value as T;
  });
  return { result, cancel() {} };
}

export function startJob<T>(task: string, input: unknown, onProgress: (p: JobProgress) => void): Job<T> {
  if (inProcess) return startLocal<T>(task, input, onProgress);
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
