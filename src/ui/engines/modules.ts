/**
 * The module engine as the Modules screen and the demo use it. Until src/modules offers
 * its entry point this reports itself unavailable (no made-up data).
 */
import { InputError } from '../../core/errors.js';
import type { ModuleOutcome } from './moduleTypes.js';
import { startJob, type Job, type JobProgress } from './workerJob.js';

export const MODULE_ENGINE_AVAILABLE = false;

export const DEFAULT_MODULE_REQUEST = '--seed monomial --x 2,1,0 --theta 3 --antisymmetrize --n 3 --ops x,theta';

/** Checks the request on this side (fast, one clear line) before a worker starts. */
export function checkModuleRequest(line: string): void {
  if (line.trim() === '') throw new InputError('the module request is empty: give at least --seed and --n');
  if (!MODULE_ENGINE_AVAILABLE) throw new InputError('the module engine is not available in this build');
}

export function startModule(line: string, onProgress: (p: JobProgress) => void): Job<ModuleOutcome> {
  checkModuleRequest(line);
  return startJob<ModuleOutcome>('module', { line }, onProgress);
}
