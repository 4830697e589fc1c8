/** Pool task of the quotient route: one Young functional's task, both primes, in a worker thread. */
import type { IdealSpec } from './ideals.js';
import { cellUnits } from './quotient-cost.js';
import { quotientRequest } from './quotient-input.js';
import type { QuotientTask, QuotientTaskResult } from './quotient-spec.js';
import { runQuotientTask } from './quotient-task.js';

export function quotientTaskJob(
  input: { readonly spec: IdealSpec; readonly frobenius: boolean; readonly task: QuotientTask },
  progress: (label: string, done: number, total?: number) => void,
): QuotientTaskResult {
  // the request is rebuilt here from the spec (cheap): only plain data crosses the thread
  const req = quotientRequest(input.spec, input.frobenius);
  const label = req.input.functionals[input.task.functional]!.label;
  let done = 0;
  return runQuotientTask(req.input, input.task, (_, cell, certificate) => {
    done += cellUnits(req.input, input.task, cell, certificate);
    progress(`${label}: cell ${cell.x}/${cell.y}/${cell.theta}`, done);
  });
}
