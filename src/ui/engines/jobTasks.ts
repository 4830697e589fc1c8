/**
 * The engine tasks the app runs in a worker thread, by name. Each takes JSON-ready input,
 * reports progress, and returns JSON-ready output.
 */
export type ProgressFn = (label: string, done: number, total?: number) => void;
export type JobTask = (input: unknown, progress: ProgressFn) => unknown | Promise<unknown>;

export const JOB_TASKS: Readonly<Record<string, JobTask>> = {
  // Exercises the worker plumbing in tests: counts to input.n, reporting progress.
  count: async (input, progress) => {
    const { n, delayMs } = input as { n: number; delayMs: number };
    for (let i = 1; i <= n; i++) {
      await new Promise((r) => setTimeout(r, delayMs));
      progress('counting', i, n);
    }
    return { counted: n };
  },
};
