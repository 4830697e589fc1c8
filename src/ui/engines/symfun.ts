/**
 * The expression language of `gradus sym`: parsed here (errors at once, with their
 * column), evaluated by the same engine entry as the command line in a worker.
 */
import { InputError } from '../../core/errors.js';
import { instantiate } from '../../requests/template.js';
import { parseExpression } from '../../symfun/expression-parser.js';
import type { Target } from '../../series/target.js';
import { targetFromJson } from '../../series/targetFile.js';
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

/** An expression with {n} (and {k}) stands for a family over n (as in `gradus search --from "sym …{n}…"`). */
export function hasSize(expression: string): boolean {
  return expression.includes('{n}');
}

/** The k shown with size n when the expression has {k}: the middle of 1..n. */
export function middleK(n: number): number {
  return Math.ceil(n / 2);
}

/** The expression at size n (and k = middleK(n)): the arithmetic next to {n}, {k} worked out (`e({k}-1)` at k = 2 is `e(1)`). */
export function atSize(expression: string, n: number): string {
  return instantiate(expression, { n, ...(expression.includes('{k}') ? { k: middleK(n) } : {}) }, 'expression');
}

/** The family's target for n = 1..nTo, built by the search engine's own command runner. */
export function startSymTarget(expression: string, nTo: number, cwd: string, catalogue: string | undefined, onProgress: (p: JobProgress) => void): Job<Target> {
  if (expression.includes('"')) throw new InputError('the expression cannot contain a double quote');
  parseExpression(atSize(expression, 1)); // the family over n = 1..nTo, and every k = 1..n when {k} appears
  const job = startJob<unknown>('from-template', { template: `sym "${expression}"`, nFrom: 1, nTo, cwd, ...(catalogue ? { catalogue } : {}) }, onProgress);
  return { result: job.result.then((j) => targetFromJson(j, 'sym target')), cancel: job.cancel };
}

/** Keep the expression as a family of the user's expression library (as `gradus expressions add`), for n = 1..nMax. */
export function startAddFamily(name: string, template: string, nMax: number, catalogue: string, onProgress: (p: JobProgress) => void): Job<{ text: string }> {
  return startJob<{ text: string }>('expression-add', { name, template, nMax, catalogue }, onProgress);
}
