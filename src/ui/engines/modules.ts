/**
 * The module engine as the Modules screen and the demo use it: the request is checked on
 * this side (one clear line at once), then computeModule runs in a worker with progress
 * and can be cancelled.
 */
import { demoRequest, DEMO_SHOWN_N } from '../demo/demoSeed.js';
import { parseModuleRequest } from './moduleRequest.js';
import type { ModuleOutcome } from './moduleTypes.js';
import { moduleOutcome } from './moduleView.js';
import { startJob, type Job, type JobProgress } from './workerJob.js';

export const MODULE_ENGINE_AVAILABLE = true;

/** Our own seed for the demo: ε(x1^2 x2 θ3), the staircase of n = 3 with θ on its last variable. */
export const DEFAULT_MODULE_REQUEST = demoRequest(DEMO_SHOWN_N);

/** Requests the `s` key cycles through: our seed first, then the named seeds. */
export const MODULE_PRESETS: readonly string[] = [
  DEFAULT_MODULE_REQUEST,
  '--seed vandermonde --n 4 --ops x',
  '--seed superspace-vandermonde --n 4 --k 2 --ops x,theta',
  '--seed theta-staircase --n 4 --k 2 --ops x,theta',
  '--seed superspace-vandermonde --n 3 --k 2 --ops x,y,polar1,polar2',
];

/** The request with --n changed by delta (1..10); unchanged when it names no --n. */
export function bumpRequestN(line: string, delta: number): string {
  return line.replace(/--n(\s+|=)(\d+)/, (_m, sep: string, v: string) => `--n${sep}${Math.min(10, Math.max(1, Number(v) + delta))}`);
}

/** The request with its --n blanked: requests equal up to n give one family over n. */
export function withoutN(line: string): string {
  return line.replace(/--n(\s+|=)\d+/, '--n {n}').trim().replace(/\s+/g, ' ');
}

/** Checks the request on this side (fast, one clear line) before a worker starts. */
export function checkModuleRequest(line: string): void {
  parseModuleRequest(line);
}

/** Compute a typed request; with the user's catalogue (when there is one) its kept result is reused and a new one kept. */
export function startModule(line: string, onProgress: (p: JobProgress) => void, catalogue?: string): Job<ModuleOutcome> {
  const req = parseModuleRequest(line);
  const job = startJob<{ json: Record<string, unknown> }>('module', { request: req, ...(catalogue ? { catalogue } : {}) }, onProgress);
  return { result: job.result.then((r) => moduleOutcome(r.json, req.spec)), cancel: job.cancel };
}
