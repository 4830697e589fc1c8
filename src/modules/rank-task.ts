/**
 * Pool task of the subgroup route: the ranks of one Young-subgroup task for some of the
 * primes, from the seed support (its typed arrays shared between threads, not copied).
 */
import { derivativeRanks, type DerivativeOps } from './derivative-closure.js';
import type { SeedChi } from './derivative-matrices.js';
import type { SeedSupport } from './seed-support.js';
import { SuperSpace } from './superspace.js';

export interface RankTaskInput {
  readonly space: { n: number; hasY: boolean; hasTheta: boolean; radix: number };
  readonly seed: Omit<SeedSupport, 'space'>;
  readonly ops: DerivativeOps;
  readonly chi: SeedChi;
  readonly primes: readonly number[];
  readonly task: number;
}

/** Ranks per prime (in the order of `primes`) of every cell, for one task. */
export function youngTaskRanks(input: RankTaskInput): number[][] {
  const s = input.space;
  const seed: SeedSupport = { ...input.seed, space: new SuperSpace(s.n, s.hasY, s.hasTheta, s.radix) };
  const ranks = derivativeRanks([seed], input.ops, input.chi, input.primes, 0, {}, [input.task]);
  return ranks.map((perPrime) => perPrime[input.task]!);
}

/** A copy of a typed array in shared memory: every thread reads the same bytes. */
export function shared<T extends Float64Array | Int32Array>(a: T): T {
  const copy = new (a.constructor as new (b: SharedArrayBuffer) => T)(new SharedArrayBuffer(a.byteLength));
  copy.set(a);
  return copy;
}
