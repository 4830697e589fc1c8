/**
 * The inner loop of the engine: visit one shard of a family (all of it when no shard is
 * given) and tally the statistics. Runs on the main thread or in a worker. Memory stays
 * flat: objects are streamed (in a reused buffer when the family offers `visit`).
 */
import type { Shard } from './plugin.js';
import type { ResolvedRequest } from './request.js';
import { inverseDescentKey } from './descent-key.js';
import { Tally, type TallyTriples } from './tally.js';
import { walkFor, zeroStep, type Walk } from './fast/walks.js';

export interface ShardOutcome {
  readonly series: TallyTriples;
  /** Frobenius-level sum: descent-set key (a number) or shape key ("3,1") with its tally. */
  readonly frobenius?: readonly (readonly [number | string, TallyTriples])[];
  readonly visited: number;
}

/** How often (in objects) the loop reports progress. */
export const TICK = 1 << 16;

/** The prefix walk this request can take, if any: no transform or Frobenius sum, and a step for each statistic. */
export function walkOf(r: ResolvedRequest): Walk | undefined {
  if (r.request.generic || r.transform || r.request.frobenius || !r.statistics.every((s) => s.step)) return undefined;
  return walkFor(r.family.id, r.request.params);
}

export function runShard(r: ResolvedRequest, shard?: Shard, tick?: (visited: number) => void): ShardOutcome {
  const { family, transform, statistics } = r;
  const s1 = statistics[0]!;
  const s2 = statistics[1];
  const series = new Tally();
  const frob = new Map<number | string, Tally>();
  const kind = r.request.frobenius;
  let visited = 0;
  let next = TICK;
  const record = (obj: unknown): void => {
    const x = transform ? transform.apply(obj) : obj;
    const v1 = s1.compute(x);
    const v2 = s2 ? s2.compute(x) : 0;
    series.add(v1, v2);
    if (kind) {
      const key = kind === 'descents' ? inverseDescentKey(family.readingWord!(obj)) : family.shape!(obj).join(',');
      let t = frob.get(key);
      if (!t) frob.set(key, (t = new Tally()));
      t.add(v1, v2);
    }
    if (++visited === next) {
      next += TICK;
      tick?.(visited);
    }
  };
  // Fast path without transform, second statistic or Frobenius sum: the tightest loop.
  const simple = !transform && !s2 && !kind;
  const f = simple
    ? (obj: unknown): void => {
        series.add(s1.compute(obj), 0);
        if (++visited === next) {
          next += TICK;
          tick?.(visited);
        }
      }
    : record;
  const walk = walkOf(r);
  if (walk) {
    walk(
      r.request.params,
      s1.step!,
      s2?.step ?? zeroStep,
      (a, b) => {
        series.add(a, b);
        if (++visited === next) {
          next += TICK;
          tick?.(visited);
        }
      },
      shard,
    );
  } else if (family.visit) family.visit(r.request.params, f, shard);
  else {
    // No sharded visit: every shard streams the family and keeps every count-th object.
    const count = shard?.count ?? 1;
    const index = shard?.index ?? 0;
    let i = 0;
    for (const obj of family.generate(r.request.params)) if (i++ % count === index) f(obj);
  }
  return {
    series: series.triples(),
    ...(kind ? { frobenius: [...frob].map(([k, t]) => [k, t.triples()] as const) } : {}),
    visited,
  };
}
