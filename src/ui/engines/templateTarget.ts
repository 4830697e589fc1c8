/**
 * A target over the whole range n = 1..N (and every k = 1..n) from a request template, as
 * `gradus search --from` builds it, in a worker: what `g` sends to the Search screen from the
 * Statistics and SymFun screens.
 */
import type { Params } from '../../enumerate/plugin.js';
import type { Target } from '../../series/target.js';
import { targetFromJson } from '../../series/targetFile.js';
import { startJob, type Job, type JobProgress } from './workerJob.js';

export function startTemplateTarget(template: string, nFrom: number, nTo: number, cwd: string, catalogue: string | undefined, onProgress: (p: JobProgress) => void): Job<Target> {
  const job = startJob<unknown>('from-template', { template, nFrom, nTo, cwd, ...(catalogue ? { catalogue } : {}) }, onProgress);
  return { result: job.result.then((j) => targetFromJson(j, 'target')), cancel: job.cancel };
}

/** `dist` over the range: n and k become {n} and {k}, the other parameters stay as chosen. */
export function distTemplate(family: string, params: Params, statistics: readonly string[]): string {
  const opts = Object.entries(params)
    .filter(([, v]) => v !== undefined)
    .map(([name, v]) => `--${name} ${name === 'n' ? '{n}' : name === 'k' ? '{k}' : typeof v === 'number' ? v : (v as readonly number[]).join(',')}`);
  return ['dist', family, statistics[0]!, ...(statistics[1] ? ['--stat2', statistics[1]] : []), ...opts].join(' ');
}
