/**
 * Subgroup ranks on every core: the Young-subgroup tasks go to the worker pool, smallest
 * groups (the costliest) first, each computing every prime from one enumeration, except a
 * task heavy enough to finish alone, which is split by prime. Only for exact-integer seeds.
 */
import { setMaxListeners } from 'node:events';
import { availableParallelism } from 'node:os';
import { runTask } from '../pool/pool.js';
import { closurePlan, computedTasks, mirrorHolds, type ClosureHooks, type DerivativeOps } from './derivative-closure.js';
import type { SeedChi } from './derivative-matrices.js';
import { shared, type RankTaskInput } from './rank-task.js';
import type { SeedSupport } from './seed-support.js';
import { groupOrder } from './young-plan.js';

const TASK = new URL('./rank-task.ts', import.meta.url);

export async function parallelRanks(
  seed: SeedSupport,
  ops: DerivativeOps,
  chi: SeedChi,
  primes: readonly number[],
  hooks: ClosureHooks = {},
  threads = Math.min(2, availableParallelism()),
  tasks?: readonly number[],
): Promise<number[][][]> {
  const plan = closurePlan(seed.space.n, chi, mirrorHolds([seed], ops));
  const order = (tasks ?? computedTasks(plan)).filter((i) => plan[i]!.mirrorOf === undefined).sort((a, b) => groupOrder(plan[a]!.blocks) - groupOrder(plan[b]!.blocks));
  const total = order.length;
  // A task far heavier than the rest would run alone at the end: such tasks (cost taken as
  // |G|^-3, the eliminations' share) go out one prime per item, the enumeration repeated.
  const cost = (t: number): number => groupOrder(plan[t]!.blocks) ** -3;
  const sum = order.reduce((s, t) => s + cost(t), 0);
  const all = primes.map((_, pi) => pi);
  const items: { task: number; primes: number[] }[] = order.flatMap((task) =>
    primes.length > 1 && cost(task) > sum / (2 * threads) ? all.map((pi) => ({ task, primes: [pi] })) : [{ task, primes: all }],
  );
  const out = primes.map(() => plan.map(() => [] as number[]));
  const missing = new Map<number, number>(); // task -> primes still missing
  const { space, ...rest } = seed;
  const base: Omit<RankTaskInput, 'task' | 'primes'> = {
    space: { n: space.n, hasY: space.hasY, hasTheta: space.hasTheta, radix: space.radix },
    seed: { ...rest, keys: shared(rest.keys), coeffs: shared(rest.coeffs), xs: shared(rest.xs), ys: shared(rest.ys), masks: shared(rest.masks) },
    ops,
    chi,
  };
  let done = 0;
  const stop = new AbortController();
  setMaxListeners(0, stop.signal); // one listener per task in the pool // the first failure (or the caller's signal) stops the other tasks
  hooks.signal?.addEventListener('abort', () => stop.abort(), { once: true });
  // the pool runs `threads` of them at once, in the order given
  await Promise.all(
    items.map(async (item) => {
      const ranks = await runTask<number[][]>(TASK, 'youngTaskRanks', { ...base, task: item.task, primes: item.primes.map((pi) => primes[pi]!) }, { threads, signal: stop.signal }).catch((e: unknown) => {
        stop.abort();
        throw e;
      });
      item.primes.forEach((pi, j) => (out[pi]![item.task] = ranks[j]!));
      const left = (missing.get(item.task) ?? primes.length) - item.primes.length;
      missing.set(item.task, left);
      if (left === 0) {
        hooks.onTask?.(item.task, out.map((perPrime) => perPrime[item.task]!));
        done++;
        hooks.onProgress?.(done, total, `task ${plan[item.task]!.label}`);
      }
    }),
  );
  return out;
}
