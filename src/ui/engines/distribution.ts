/**
 * Distributions of one or two statistics over a family: computeDistribution, the engine
 * entry `gradus dist` calls. Small runs go on this thread (instant); larger ones in a
 * worker, so the keys stay live and the run can be cancelled.
 */
import type { Poly } from '../../core/poly.js';
import { computeDistribution } from '../../enumerate/distribution.js';
import type { DistRequest } from '../../enumerate/request.js';
import { polyFromJson } from '../../series/seriesJson.js';
import { startJob, type Job, type JobProgress } from './workerJob.js';

export const DISTRIBUTION_ENGINE_AVAILABLE = true;

/** Up to this many objects the run stays on the app's thread. */
export const IN_THREAD_OBJECTS = 20_000n;

export interface DistView {
  readonly series: Poly;
  readonly ms: number;
  readonly method: string;
}

export function startDistribution(request: DistRequest, count: bigint, onProgress: (p: JobProgress) => void): Job<DistView> {
  if (count <= IN_THREAD_OBJECTS) {
    const result = computeDistribution(request, { workers: 1 }).then((d) => ({ series: d.series, ms: Math.round(d.provenance.seconds * 1000), method: d.provenance.method }));
    return { result, cancel() {} };
  }
  const job = startJob<{ series: unknown; ms: number; method: string }>('dist', request, onProgress);
  return {
    result: job.result.then((r) => ({ series: polyFromJson(r.series, 'distribution'), ms: r.ms, method: r.method })),
    cancel: job.cancel,
  };
}
