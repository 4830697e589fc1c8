/**
 * Runs an engine task of the app on the worker pool, so long work never freezes the keyboard,
 * and cancelling is immediate (the task's thread is ended; engines write nothing half-done
 * from these tasks). Results cross the thread boundary as JSON-ready data.
 */
import { isUserError } from '../../core/errors.js';
import { runTask, TaskCancelled } from '../../pool/pool.js';
import { ESTIMATE_MARK } from './progressMark.js';

export interface JobProgress {
  readonly label: string;
  readonly done: number;
  readonly total: number | undefined;
  /** The engine's estimate of the whole run (wall-clock seconds), when it gave one. */
  readonly estimateSeconds?: number;
  /** When that estimate arrived (Date.now()): the work it estimates starts there, after the worker's start-up. */
  readonly estimatedAt?: number;
}


function progressOf(label: string, done: number, total: number | undefined, estimatedAt: () => number): JobProgress {
  const i = label.indexOf(ESTIMATE_MARK);
  if (i < 0) return { label, done, total };
  const est = Number(label.slice(i + 1));
  return { label: label.slice(0, i), done, total, ...(Number.isFinite(est) ? { estimateSeconds: est, estimatedAt: estimatedAt() } : {}) };
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

/** An error from the task, with a one-line message (user errors marked as such). */
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
 * thread start-up to pay). Such a job cannot be cancelled.
 */
export function runJobsInProcess(on: boolean): void {
  inProcess = on;
}

function asJobError(e: unknown): Error {
  if (e instanceof TaskCancelled || e instanceof JobCancelled) return new JobCancelled();
  const msg = e instanceof Error ? e.message : String(e);
  return new JobError(msg.split('\n')[0] ?? msg, isUserError(e));
}

const TASKS = new URL('./jobTasks.ts', import.meta.url);

export function startJob<T>(task: string, input: unknown, onProgress: (p: JobProgress) => void): Job<T> {
  let firstEstimate: number | undefined;
  const estimatedAt = () => (firstEstimate ??= Date.now());
  const progress = (label: string, done: number, total?: number): void => onProgress(progressOf(label, done, total, estimatedAt));
  if (inProcess) {
    const result = import('./jobTasks.js').then(({ runJobTask }) => runJobTask({ task, input }, progress) as Promise<T>);
    return { result: result.catch((e: unknown) => Promise.reject(asJobError(e))), cancel() {} };
  }
  const stop = new AbortController();
  const result = runTask<T>(TASKS, 'runJobTask', { task, input }, { onProgress: progress, signal: stop.signal }).catch((e: unknown) => Promise.reject(asJobError(e)));
  return { result, cancel: () => stop.abort() };
}
