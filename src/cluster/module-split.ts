/**
 * Modules on a cluster. With exact-integer seed entries on the subgroup route, a shard computes
 * the ranks of some Young-subgroup tasks (both primes from one enumeration, or one prime of a
 * task heavy enough to split), and the merge fills the ranks into the engine exactly as the
 * worker-thread run does. Other routes (seeds without exact-integer entries, polarized and
 * iterated closures) are one shard per prime, merged as two one-prime runs.
 */
import { InputError, LimitError } from '../core/errors.js';
import { CONFIRM_PRIME, DEFAULT_PRIME } from '../core/modp.js';
import { primeCoeffs } from '../modules/coefficients.js';
import { computeModule, type ModuleOptions } from '../modules/compute-module.js';
import { closurePlan, computedTasks, mirrorHolds } from '../modules/derivative-closure.js';
import { integerSeedSupport } from '../modules/integer-seed.js';
import type { ModuleCell } from '../modules/module-cell.js';
import { estimateModuleWork } from '../modules/module-cost.js';
import type { ModuleResult } from '../modules/module-result.js';
import { derivativeFamilies, isDerivativeOnly, parseOperatorFamilies } from '../modules/operators.js';
import { polarizationReducible } from '../modules/polarized-seeds.js';
import { shared, type RankTaskInput } from '../modules/rank-task.js';
import { buildSeedPolynomial } from '../modules/seed-polynomial.js';
import { seedSupport, type SeedSupport } from '../modules/seed-support.js';
import { seedTerms } from '../modules/seeds.js';
import { groupOrder, type YoungTask } from '../modules/young-plan.js';
import type { ModuleRequest } from '../requests/index.js';
import type { ManifestBody, ShardWork } from './manifest.js';
import { packByCost } from './pack.js';
import type { ShardResult } from './shard-file.js';

interface ModuleSetup {
  readonly p1: number;
  readonly p2: number;
  /** The exact-integer seed of the subgroup route, when there is one. */
  readonly exact?: SeedSupport;
  readonly ops: { x: boolean; y: boolean; theta: boolean };
  readonly chi: -1 | 0 | 1;
  readonly plan: readonly YoungTask[];
  /** Only when planning (the shards and the merge need no estimate). */
  readonly estimate?: { units: number; seconds: number };
}

/** The route decisions of computeModuleAsync, taken the same way here so that the merge meets them again. */
function setup(r: ModuleRequest, estimating = false): ModuleSetup {
  if (r.method === 'exact') throw new InputError('--method exact works over Q on one machine; the cluster splits the modular routes (leave out --method exact)', 'method');
  const spec = r.spec;
  const ops = parseOperatorFamilies(spec.ops);
  const derivOnly = isDerivativeOnly(ops);
  const reducible = polarizationReducible(ops);
  if (r.method === 'young' && !derivOnly && !reducible) throw new LimitError('the young method needs derivative operators, or polarizations together with x (use --method iterated)', 'method');
  const young = (r.method === 'auto' || r.method === 'young') && (derivOnly || reducible);
  const terms = seedTerms(spec);
  const polar = ops.some((o) => o.kind === 'polar');
  const p1 = r.prime ?? DEFAULT_PRIME;
  const p2 = p1 === CONFIRM_PRIME ? DEFAULT_PRIME : CONFIRM_PRIME;
  const probe = buildSeedPolynomial(spec.n, terms, primeCoeffs(p1), { y: polar || ops.some((o) => o.kind === 'y'), polar });
  const support = seedSupport(probe.alg.space, p1, probe.f);
  const chi = probe.character === 'sign' ? -1 : probe.character === 'trivial' ? 1 : 0;
  const dops = derivativeFamilies(ops);
  const route = !young ? 'iterated' : derivOnly ? 'young' : 'polarized';
  const estimate = estimating ? estimateModuleWork(support, ops, route, chi === -1 && mirrorHolds([support], dops), chi !== 0) : undefined;
  if (estimate && r.maxWork !== undefined && estimate.units > r.maxWork) {
    throw new LimitError(`estimated work ${estimate.units.toExponential(2)} units exceeds the limit ${r.maxWork.toExponential(2)}; raise it with --max-work (or leave it out: a cluster plan has no limit of its own)`, 'max-work');
  }
  const exact = young && derivOnly ? integerSeedSupport(support, terms) : undefined;
  const plan = exact ? closurePlan(spec.n, chi, mirrorHolds([exact], dops)) : [];
  return { p1, p2, ...(exact ? { exact } : {}), ops: dops, chi, plan, ...(estimate ? { estimate } : {}) };
}

/** Share of a task in the whole (the eliminations dominate; cost falls with the cube of the group order). */
const taskCost = (t: YoungTask): number => groupOrder(t.blocks) ** -3;

export function planModule(r: ModuleRequest, maxShards: number): { body: Omit<ManifestBody, 'key'>; estimate: { units: number; seconds: number } } {
  if (r.checkpoint !== undefined) throw new InputError('--resume is for one machine; a work folder keeps finished shards itself (leave out --resume)', 'resume');
  const s = setup(r, true);
  const estimate = s.estimate!;
  const primes: [number, number] = [s.p1, s.p2];
  if (!s.exact) {
    const shards = primes.map((prime, id) => ({ id, label: `prime ${prime}`, work: { type: 'prime' as const, prime } }));
    return { body: { kind: 'module', route: 'one shard per prime (a whole one-prime run each)', primes, shards }, estimate };
  }
  const tasks = computedTasks(s.plan);
  const total = tasks.reduce((sum, t) => sum + taskCost(s.plan[t]!), 0);
  // a task heavier than an eighth of the whole would finish last alone: its primes go apart
  const items = tasks.flatMap((task) => {
    const t = s.plan[task]!;
    const c = taskCost(t);
    return c > total / 8 && maxShards > tasks.length ? primes.map((p) => ({ cost: c / 2, item: { task, label: t.label, primes: [p] } })) : [{ cost: c, item: { task, label: t.label, primes: [...primes] } }];
  });
  const shards = packByCost(items, maxShards).map((bin, id) => ({
    id,
    label: bin.map((i) => `${i.label}${i.primes.length === 1 ? ` (prime ${i.primes[0]})` : ''}`).join('; '),
    work: { type: 'young' as const, items: bin },
  }));
  return {
    body: { kind: 'module', route: `Young-subgroup tasks (${tasks.length} computed of ${s.plan.length}) × primes, exact-integer entries: one enumeration serves both primes`, primes, shards },
    estimate,
  };
}

/** The pool inputs of a subgroup shard: the seed's arrays in shared memory, one input per task item. */
export function youngTaskInputs(r: ModuleRequest, work: ShardWork): { label: string; input: RankTaskInput }[] {
  if (work.type !== 'young') throw new Error(`not a subgroup shard: ${work.type}`);
  const s = setup(r);
  if (!s.exact) throw new InputError('this seed has no exact-integer entries here, but the plan says it had: the plan was made by other code', 'folder');
  const { space, ...rest } = s.exact;
  const seed = { ...rest, keys: shared(rest.keys), coeffs: shared(rest.coeffs), xs: shared(rest.xs), ys: shared(rest.ys), masks: shared(rest.masks) };
  const base = { space: { n: space.n, hasY: space.hasY, hasTheta: space.hasTheta, radix: space.radix }, seed, ops: s.ops, chi: s.chi };
  return work.items.map((item) => ({ label: `task ${item.label}${item.primes.length === 1 ? ` (prime ${item.primes[0]})` : ''}`, input: { ...base, primes: item.primes, task: item.task } }));
}

/** The module from the shards' results, computed by the engine as the one-machine run does. */
export function mergeModule(r: ModuleRequest, results: readonly ShardResult[]): ModuleResult {
  const options: ModuleOptions = { frobenius: r.frobenius, method: r.method, maxWork: Infinity, ...(r.prime !== undefined ? { prime: r.prime } : {}) };
  if (results.every((x) => x.type === 'prime')) {
    const cells = new Map(results.map((x) => [x.prime, x.cells as ModuleCell[]]));
    return computeModule(r.spec, { ...options, precomputed: cells });
  }
  const s = setup(r);
  const primes = [s.p1, s.p2];
  const ranks = primes.map(() => s.plan.map(() => [] as number[]));
  const have = primes.map(() => new Set<number>());
  for (const x of results) {
    if (x.type !== 'young') throw new Error('a module plan mixes shard kinds');
    for (const item of x.items)
      item.primes.forEach((p, j) => {
        const pi = primes.indexOf(p);
        if (pi < 0) throw new InputError(`a shard holds ranks for prime ${p}, not one of the plan's primes ${primes.join(', ')}`, 'folder');
        ranks[pi]![item.task] = item.ranks[j]!;
        have[pi]!.add(item.task);
      });
  }
  const lacking = computedTasks(s.plan).filter((t) => !have.every((h) => h.has(t)));
  if (lacking.length) throw new InputError(`the shards lack the ranks of task(s) ${lacking.map((t) => s.plan[t]!.label).join(', ')}`, 'folder');
  return computeModule(r.spec, { ...options, youngRanks: { primes, ranks } });
}
