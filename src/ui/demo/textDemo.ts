/**
 * The demo session as plain text, for when there is no terminal to run the app in (a pipe,
 * CI): the same steps as the Tour screen, computed live, then exit.
 */
import { runJobsInProcess } from '../engines/workerJob.js';
import { errorText } from '../errorText.js';
import { jobErrorText } from '../useJob.js';
import { DEMO_STEPS, type DemoState } from './demoSession.js';
import { stepReport } from './demoReport.js';

export async function textDemo(out: (s: string) => void, env: Readonly<Record<string, string | undefined>>, cwd = process.cwd()): Promise<void> {
  out('gradus demo session (no terminal on stdin/stdout, so as text; run gradus in a terminal for the app)');
  runJobsInProcess(true);
  let state: DemoState = {};
  for (const [i, step] of DEMO_STEPS.entries()) {
    out('');
    out(`${i + 1}. ${step.title}`);
    try {
      state = await step.run(state, { env, cwd }, (job) => job.result, () => {});
    } catch (e) {
      out(`   stopped: ${e instanceof Error && e.name === 'JobError' ? jobErrorText(e) : errorText(e)}`);
      return;
    }
    for (const l of stepReport(i, state, true)) out(`   ${l.text}`);
  }
}
