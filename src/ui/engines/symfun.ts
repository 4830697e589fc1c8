/**
 * The expression language of `gradus sym`: parsed here (errors at once, with their
 * column), evaluated by the same engine entry as the command line in a worker.
 */
import { InputError } from '../../core/errors.js';
import { parseExpression } from '../../symfun/expression-parser.js';
import { startJob, type Job, type JobProgress } from './workerJob.js';

export const SYMFUN_ENGINE_AVAILABLE = true;

export interface SymOutcome {
  readonly expression: string;
  /** The result in the Schur basis, one term per line. */
  readonly lines: readonly string[];
  /** The engine's JSON document for the result (the `--json` output of `gradus sym`). */
  readonly json: unknown;
  /** The result as a series (JSON form of src/series), for the search. */
  readonly seriesJson: unknown;
  readonly degree: number | undefined;
  readonly elapsedMs: number;
}

export function startSym(expression: string, onProgress: (p: JobProgress) => void): Job<SymOutcome> {
  if (!SYMFUN_ENGINE_AVAILABLE) throw new InputError('the symmetric-function engine is not available in this build');
  if (expression.trim() === '') throw new InputError('type an expression first, such as nabla(e(3))');
  // Parse errors come at once, with their column, before any worker starts.
  parseExpression(expression);
  return startJob<SymOutcome>('sym', { expression }, onProgress);
}

/** The 1-based column an error points at, when its message names one ("… at column 7"). */
export function errorColumn(message: string): number | undefined {
  const m = /column (\d+)/.exec(message);
  return m ? Number(m[1]) : undefined;
}
