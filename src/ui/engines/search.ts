/**
 * The search engine as the Search screen and the demo use it: the same calls `gradus
 * search` makes (catalogue look-up, formula recognition, saved-search document), run in a
 * worker. Building the catalogue, when there is none, is a worker job too.
 */
import { existsSync } from 'node:fs';
import type { SearchDocument } from '../../match/searchDocument.js';
import { Catalogue } from '../../store/catalogue.js';
import { errorText } from '../errorText.js';
import type { Target } from '../../series/target.js';
import { targetToJson } from '../../series/targetFile.js';
import type { SearchOutcome } from './searchTypes.js';
import { searchOutcome } from './searchView.js';
import { startJob, type Job, type JobProgress } from './workerJob.js';

export const SEARCH_ENGINE_AVAILABLE = true;

/** The size the app builds a missing catalogue to (seconds of work on two cores). */
export const APP_CATALOGUE_N_MAX = 5;

export function startSearch(target: Target, cataloguePath: string, onProgress: (p: JobProgress) => void): Job<SearchOutcome> {
  const job = startJob<{ doc: SearchDocument; id: number | undefined; ms: number }>('search', { target: targetToJson(target), catalogue: cataloguePath }, onProgress);
  return { result: job.result.then((r) => searchOutcome(r.doc, r.id, r.ms)), cancel: job.cancel };
}

/** Several targets searched in one worker, in order. */
export function startSearches(targets: readonly Target[], cataloguePath: string, onProgress: (p: JobProgress) => void): Job<SearchOutcome[]> {
  const job = startJob<{ doc: SearchDocument; id: number | undefined; ms: number }[]>('search-many', { targets: targets.map(targetToJson), catalogue: cataloguePath }, onProgress);
  return { result: job.result.then((rs) => rs.map((r) => searchOutcome(r.doc, r.id, r.ms))), cancel: job.cancel };
}

export interface CatalogueState {
  /** Largest n held (undefined: no catalogue yet). */
  readonly maxN: number | undefined;
  /** The n up to which b builds (resuming an unfinished build, never smaller than what is held). */
  readonly buildTo: number;
  readonly unfinished: boolean;
  readonly error?: string;
}

/** What the catalogue holds, read without creating it. */
export function catalogueState(path: string): CatalogueState {
  if (!existsSync(path)) return { maxN: undefined, buildTo: APP_CATALOGUE_N_MAX, unfinished: false };
  try {
    const cat = Catalogue.open(path, { existing: true });
    try {
      const maxN = cat.maxN();
      const unfinished = cat.unfinishedNote() !== undefined;
      return { maxN: maxN >= 0 ? maxN : undefined, buildTo: Math.max(APP_CATALOGUE_N_MAX, maxN), unfinished };
    } finally {
      cat.close();
    }
  } catch (e) {
    return { maxN: undefined, buildTo: APP_CATALOGUE_N_MAX, unfinished: false, error: errorText(e, 'catalogue') };
  }
}

export interface BuildSummary {
  readonly text: string;
}

export function startCatalogueBuild(cataloguePath: string, nMax: number, onProgress: (p: JobProgress) => void): Job<BuildSummary> {
  return startJob<BuildSummary>('catalogue-build', { catalogue: cataloguePath, nMax }, onProgress);
}
