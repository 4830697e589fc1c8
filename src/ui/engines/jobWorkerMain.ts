/**
 * The worker side of workerJob.ts: runs one named engine task and posts progress, then
 * the result or one error line (never a stack).
 */
import { parentPort, workerData } from 'node:worker_threads';
import { isUserError } from '../../core/errors.js';
import type { WorkerMessage } from './workerJob.js';
import { JOB_TASKS } from './jobTasks.js';

const port = parentPort!;
const post = (m: WorkerMessage) => port.postMessage(m);
const { task, input } = workerData as { task: string; input: unknown };

try {
  const run = JOB_TASKS[task];
  if (!run) throw new Error(`no such task ${task}`);
  let last = 0;
  const value = await run(input, (label, done, total) => {
    const now = Date.now();
    // At most ~20 messages a second; the screen redraws no faster anyway.
    if (now - last < 50 && done !== total) return;
    last = now;
    post({ type: 'progress', label, done, ...(total !== undefined ? { total } : {}) });
  });
  post({ type: 'result', value });
} catch (e) {
  const user = isUserError(e);
  const msg = e instanceof Error ? e.message : String(e);
  post({ type: 'error', message: msg.split('\n')[0] ?? msg, user });
}
