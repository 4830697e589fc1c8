/**
 * The distribution engine: the joint distribution of one or two statistics over a family
 * with given parameters, as a polynomial in q (and t), and optionally the Frobenius-level
 * sum Σ q^stat F_{iDes(reading word)} or Σ q^stat s_shape kept as a map to polynomials.
 * Estimates the count first and refuses past a limit; splits large runs over worker
 * threads; checks that the objects visited are exactly as many as the family's count.
 */
import { availableParallelism } from 'node:os';
import { LimitError } from '../core/errors.js';
import type { Poly } from '../core/poly.js';
import { makeProvenance, type Provenance } from '../core/provenance.js';
import { descentSetOfKey } from './descent-key.js';
import { runParallel } from './parallel.js';
import type { Params } from './plugin.js';
import { resolveRequest, type DistRequest, type FrobeniusKind } from './request.js';
import { runShard, walkOf, type ShardOutcome } from './run-shard.js';
import { Tally } from './tally.js';

export const DEFAULT_MAX_OBJECTS = 2_000_000_000n;
/** Below this many objects one thread is faster than starting workers (plain path). */
export const PARALLEL_THRESHOLD = 2_000_000n;
/** The same for prefix walks, which run ten times faster per object. */
export const WALK_PARALLEL_THRESHOLD = 20_000_000n;

export interface DistOptions {
  /** Refuse runs over this many objects (default 2·10^9; the CLI option --max-objects). */
  readonly maxObjects?: bigint;
  /** Worker threads: 1 runs on the calling thread; default: every core for large runs. */
  readonly workers?: number;
  /** Called now and then with the objects done and the total. */
  readonly onProgress?: (done: number, total: number) => void;
}

export interface FrobeniusTerm {
  /** The descent set S of F_{n,S} (for 'descents'). */
  readonly set?: readonly number[];
  /** The shape λ of s_λ (for 'shapes'). */
  readonly shape?: readonly number[];
  readonly series: Poly;
}

export interface Distribution {
  readonly family: string;
  readonly params: Params;
  readonly statistics: readonly string[];
  readonly transform?: string;
  /** Σ over the objects of q^{stat} (t^{stat2}). */
  readonly series: Poly;
  readonly count: bigint;
  readonly frobenius?: { readonly kind: FrobeniusKind; readonly n?: number; readonly terms: readonly FrobeniusTerm[] };
  readonly provenance: Provenance;
}

export async function computeDistribution(request: DistRequest, options: DistOptions = {}): Promise<Distribution> {
  const t0 = performance.now();
  const resolved = resolveRequest(request);
  const { family } = resolved;
  const expected = family.count(request.params);
  const max = options.maxObjects ?? DEFAULT_MAX_OBJECTS;
  if (expected > max) {
    throw new LimitError(`${family.id} with ${paramsText(request.params)} has ${expected} objects, over the limit of ${max}; raise it with --max-objects`, 'max-objects');
  }
  const total = Number(expected);
  const onVisited = options.onProgress ? (v: number): void => options.onProgress!(v, total) : undefined;
  const cores = Math.max(1, availableParallelism());
  const threshold = walkOf(resolved) ? WALK_PARALLEL_THRESHOLD : PARALLEL_THRESHOLD;
  const workers = options.workers ?? (expected >= threshold ? cores : 1);
  const outcomes: ShardOutcome[] = workers <= 1 ? [runShard(resolved, undefined, onVisited)] : await runParallel(request, workers, onVisited);

  const series = new Tally();
  const frob = new Map<number | string, Tally>();
  let visited = 0;
  for (const o of outcomes) {
    visited += o.visited;
    series.merge(o.series);
    for (const [k, triples] of o.frobenius ?? []) {
      let t = frob.get(k);
      if (!t) frob.set(k, (t = new Tally()));
      t.merge(triples);
    }
  }
  if (BigInt(visited) !== expected) {
    throw new Error(`${family.id} visited ${visited} objects but its count says ${expected}`);
  }
  const kind = request.frobenius;
  let frobenius: Distribution['frobenius'];
  if (kind === 'descents') {
    const n = typeof request.params['n'] === 'number' ? request.params['n'] : undefined;
    const size = n ?? sizeFromObjects(resolved);
    const terms = [...frob]
      .map(([k, t]) => ({ set: descentSetOfKey(k as number, size), series: t.toPoly() }))
      .sort((a, b) => compareLists(a.set, b.set));
    frobenius = { kind, n: size, terms };
  } else if (kind === 'shapes') {
    const terms = [...frob]
      .map(([k, t]) => ({ shape: k === '' ? [] : String(k).split(',').map(Number), series: t.toPoly() }))
      .sort((a, b) => compareLists(b.shape, a.shape));
    frobenius = { kind, terms };
  }
  return {
    family: family.id,
    params: request.params,
    statistics: resolved.statistics.map((s) => s.id),
    ...(request.transform ? { transform: request.transform } : {}),
    series: series.toPoly(),
    count: expected,
    ...(frobenius ? { frobenius } : {}),
    provenance: makeProvenance({
      request: `${family.id} ${paramsText(request.params)}`,
      method: `exhaustive enumeration (${walkOf(resolved) ? 'prefix walk with per-step increments' : family.visit ? 'reused-buffer visit' : 'stream'}${workers > 1 ? `, ${workers} worker threads` : ''})`,
      seconds: (performance.now() - t0) / 1000,
    }),
  };
}

/** The length of a reading word of the family (for families without an n parameter). */
function sizeFromObjects(r: ReturnType<typeof resolveRequest>): number {
  for (const obj of r.family.generate(r.request.params)) return r.family.readingWord!(obj).length;
  return 0;
}

function compareLists(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
  return a.length - b.length;
}

export function paramsText(params: Params): string {
  return Object.entries(params)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => `${k}=${Array.isArray(v) ? v.join(',') : String(v)}`)
    .join(' ');
}
