/**
 * The search engine as the Search screen and the demo use it; runs in a worker. Until
 * src/match offers its entry point this reports itself unavailable.
 */
import { InputError } from '../../core/errors.js';
import type { Target } from '../../series/target.js';
import { targetToJson } from '../../series/targetFile.js';
import type { SearchOutcome } from './searchTypes.js';
import { startJob, type Job, type JobProgress } from './workerJob.js';

export const SEARCH_ENGINE_AVAILABLE = false;

export function startSearch(target: Target, onProgress: (p: JobProgress) => void): Job<SearchOutcome> {
  if (!SEARCH_ENGINE_AVAILABLE) throw new InputError('the search engine is not available in this build');
  return startJob<SearchOutcome>('search', { target: targetToJson(target) }, onProgress);
}
