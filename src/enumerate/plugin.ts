/**
 * The plug-in shapes every family, statistic and transform follows (DEVELOPERS.md, "Families,
 * transforms and the registries").
 * Registries (objects/index.ts, statistics/index.ts) list them; contract tests run
 * every entry through the same checks.
 */
import type { Partition } from '../core/partitions.js';

/** A parameter of a family: an integer (n, k, …) or an integer list (a shape, a content). */
export interface ParamSpec {
  readonly name: string;
  readonly kind: 'int' | 'partition' | 'list';
  readonly description: string;
  readonly min?: number;
  readonly max?: number;
  readonly optional?: boolean;
}

export type ParamValue = number | readonly number[];
export type Params = Readonly<Record<string, ParamValue | undefined>>;

export interface Family<T> {
  readonly id: string;
  readonly description: string;
  readonly source: string;
  readonly params: readonly ParamSpec[];
  /** Throws InputError naming the parameter when params are out of range. */
  validate(params: Params): void;
  /** Streams every object exactly once (no array of all objects). */
  generate(params: Params): Iterable<T>;
  /** The exact count, by formula or recurrence (checked against generate in tests). */
  count(params: Params): bigint;
  /** Text drawing (may be several lines). */
  render(obj: T): string;
  /** A uniformly (or at least fairly) random object, for property tests. */
  sample(params: Params, random: () => number): T;
  /** A canonical one-line key (distinct objects have distinct keys). */
  key(obj: T): string;
  /** A word whose (inverse) descent set gives a quasisymmetric F for Frobenius-level sums. */
  readingWord?(obj: T): readonly number[];
  /** A shape, for Σ q^stat s_shape sums. */
  shape?(obj: T): Partition;
  /** Small parameter sets the contract tests use. */
  readonly testParams: readonly Params[];
  /**
   * Optional fast path: calls f once per object, passing a buffer that is REUSED between
   * calls (valid only during the call; copy it to keep it). With a shard {index, count}
   * only that shard's objects are visited; the shards 0..count−1 partition the family.
   */
  visit?(params: Params, f: (obj: T) => void, shard?: Shard): void;
}

/** One part of a family split for parallel work (index in 0..count−1). */
export interface Shard {
  readonly index: number;
  readonly count: number;
}

export interface Statistic<T> {
  readonly id: string;
  readonly family: string;
  readonly description: string;
  readonly source: string;
  /** Worked examples [object, value] checked by the contract tests. */
  readonly examples: readonly (readonly [T, number])[];
  compute(obj: T): number;
  /**
   * Optional fast path for the engine's prefix walks (src/enumerate/fast): the statistic as
   * a sum of increments, one per step of the walk, checked against compute by the tests.
   */
  readonly step?: PrefixStep;
}

/**
 * One step of a prefix walk: `value` is placed at position `at` (0-based) after `prev`
 * (0 at the start); `placed` has bit v−1 set for each value v placed before; `rank` counts
 * the values not yet placed that are below `value`. Permutations place w(at+1) = value;
 * ordered set partitions place element at+1 in block `value` (placed = non-empty blocks).
 */
export type PrefixStep = (at: number, value: number, prev: number, rank: number, placed: number) => number;

export interface Transform<A, B> {
  readonly id: string;
  readonly from: string; // family id
  readonly to: string; // family id
  readonly description: string;
  readonly source: string;
  readonly examples: readonly (readonly [A, B])[];
  apply(obj: A): B;
  /** True when apply is its own inverse (the contract tests then check apply∘apply = id). */
  readonly involution?: boolean;
}
