/**
 * One engine job per screen: start, progress, cancel, result or a clear error. Starting a
 * new job cancels the old one; leaving the app cancels whatever still runs.
 */
import { useCallback, useEffect, useRef, useState } from 'react';
import { appWords, errorText, type Place } from './errorText.js';
import { JobCancelled, JobError, type Job, type JobProgress } from './engines/workerJob.js';

export type JobStatus = 'idle' | 'running' | 'done' | 'error' | 'cancelled';

export interface JobState<T> {
  readonly status: JobStatus;
  readonly progress: JobProgress | undefined;
  readonly startedAt: number;
  readonly finishedAt: number;
  readonly result: T | undefined;
  readonly error: string | undefined;
}

const IDLE: JobState<never> = { status: 'idle', progress: undefined, startedAt: 0, finishedAt: 0, result: undefined, error: undefined };

export function jobErrorText(e: unknown, place?: Place): string {
  if (e instanceof JobError) return e.user ? appWords(e.message, place) : `internal error (a bug in gradus, please report it): ${e.message}`;
  return errorText(e, place);
}

/** `place` words the errors for the screen that shows them. */
export function useJob<T>(place?: Place) {
  const [state, setState] = useState<JobState<T>>(IDLE);
  const current = useRef<Job<T> | undefined>(undefined);

  useEffect(
    () => () => {
      current.current?.cancel();
    },
    [],
  );

  const run = useCallback((start: (onProgress: (p: JobProgress) => void) => Job<T>, onDone?: (r: T) => void) => {
    current.current?.cancel();
    const startedAt = Date.now();
    let job: Job<T>;
    try {
      job = start((p) => setState((s) => (s.status === 'running' && current.current === job ? { ...s, progress: p } : s)));
    } catch (e) {
      setState({ ...IDLE, status: 'error', error: jobErrorText(e, place), startedAt, finishedAt: Date.now() });
      return;
    }
    current.current = job;
    setState({ ...IDLE, status: 'running', startedAt });
    job.result.then(
      (r) => {
        if (current.current !== job) return;
        current.current = undefined;
        setState({ ...IDLE, status: 'done', result: r, startedAt, finishedAt: Date.now() });
        onDone?.(r);
      },
      (e: unknown) => {
        if (current.current !== job) return;
        current.current = undefined;
        const cancelled = e instanceof JobCancelled;
        setState({ ...IDLE, status: cancelled ? 'cancelled' : 'error', error: cancelled ? undefined : jobErrorText(e, place), startedAt, finishedAt: Date.now() });
      },
    );
  }, [place]);

  const cancel = useCallback(() => {
    current.current?.cancel();
  }, []);

  /** Forget the result or error (the input it belonged to has changed); a running job goes on. */
  const clear = useCallback(() => {
    setState((s) => (s.status === 'running' ? s : IDLE));
  }, []);

  return { state, run, cancel, clear };
}
