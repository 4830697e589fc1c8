/**
 * Subgroup ranks on both cores: worker threads take tasks from a queue, smallest groups (the
 * costliest) first, each computing every prime from one enumeration, except a task heavy
 * enough to finish alone, which is split by prime. Only for exact-integer seeds.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { closurePlan, computedTasks, mirrorHolds, type ClosureHooks, type DerivativeOps } from './derivative-closure.js';
import type { SeedChi } from './derivative-matrices.js';
import type { RankWorkerData } from './rank-worker.js';
import type { SeedSupport } from './seed-support.js';
import { groupOrder } from './young-plan.js';

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
  const queue: { task: number; primes: number[] }[] = order.flatMap((task) =>
    primes.length > 1 && cost(task) > sum / (2 * threads) ? all.map((pi) => ({ task, primes: [pi] })) : [{ task, primes: all }],
  );
  const partial = new Map<number, number>(); // task -> primes still missing
  const out = primes.map(() => plan.map(() => [] as number[]));
  const { space, ...rest } = seed;
  const data: RankWorkerData = { space: { n: space.n, hasY: space.hasY, hasTheta: space.hasTheta, radix: space.radix }, seed: rest, ops, chi, primes };
  let done = 0;
  const workers: Worker[] = [];
  try {
    await Promise.all(
      Array.from({ length: threads }, () => {
        const w = new Worker(new URL('./rank-worker-entry.mjs', import.meta.url), { workerData: data });
        workers.push(w);
        return new Promise<void>((resolve, reject) => {
          const next = (): void => {
            if (hooks.signal?.aborted) {
              reject(hooks.signal.reason ?? new Error('aborted'));
              return;
            }
            const item = queue.shift();
            w.postMessage(item ?? null);
            if (item === undefined) resolve();
          };
          w.on('message', (msg: { task: number; primes: number[]; ranks: number[][] }) => {
            msg.primes.forEach((pi, j) => (out[pi]![msg.task] = msg.ranks[j]!));
            const missing = (partial.get(msg.task) ?? primes.length) - msg.primes.length;
            partial.set(msg.task, missing);
            if (missing === 0) {
              hooks.onTask?.(msg.task, out.map((perPrime) => perPrime[msg.task]!));
              done++;
              hooks.onProgress?.(done, total, `task ${plan[msg.task]!.label}`);
            }
            next();
          });
          w.on('error', reject);
          next();
        });
      }),
    );
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return out;
}
