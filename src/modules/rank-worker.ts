/**
 * Worker body for parallel Young-subgroup ranks: rebuilds the seed support from the shared
 * typed arrays, then answers one task index at a time with its ranks for every prime.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { derivativeRanks, type DerivativeOps } from './derivative-closure.js';
import type { SeedChi } from './derivative-matrices.js';
import type { SeedSupport } from './seed-support.js';
import { SuperSpace } from './superspace.js';

export interface RankWorkerData {
  readonly space: { n: number; hasY: boolean; hasTheta: boolean; radix: number };
  readonly seed: Omit<SeedSupport, 'space'>;
  readonly ops: DerivativeOps;
  readonly chi: SeedChi;
  readonly primes: readonly number[];
}

const data = workerData as RankWorkerData;
const seed: SeedSupport = { ...data.seed, space: new SuperSpace(data.space.n, data.space.hasY, data.space.hasTheta, data.space.radix) };
parentPort!.on('message', (task: number | null) => {
  if (task === null) {
    parentPort!.close();
    return;
  }
  const ranks = derivativeRanks([seed], data.ops, data.chi, data.primes, 0, {}, [task]);
  parentPort!.postMessage({ task, ranks: ranks.map((perPrime) => perPrime[task]!) });
});
