/** Shared by the statistics tests: a distribution on the calling thread. */
import { computeDistribution, type Distribution } from '../../src/enumerate/distribution.js';
import type { Params } from '../../src/enumerate/plugin.js';
import type { DistRequest } from '../../src/enumerate/request.js';

export function dist(family: string, params: Params, statistics: readonly string[], extra: Partial<DistRequest> = {}): Promise<Distribution> {
  return computeDistribution({ family, params, statistics, ...extra }, { workers: 1 });
}
