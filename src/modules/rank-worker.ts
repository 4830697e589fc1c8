/**
 * Worker body for parallel Young-subgroup ranks: rebuilds the seed support from the shared
 * typed arrays, then answers one task at a time with its ranks for the primes asked (indices
 * into the primes given).
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
parentPort!.on('message', (item: { task: number; primes: number[] } | null) => {
  if (item === null) {
    parentPort!.close();
    return;
  }
  const { task, primes } = item;
  const ranks = derivativeRanks([seed], data.ops, data.chi, primes.map((pi) => data.primes[pi]!), 0, {}, [task]);
  parentPort!.postMessage({ task, primes, ranks: ranks.map((perPrime) => perPrime[task]!) });
});
