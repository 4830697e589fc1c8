/**
 * How each family's objects are represented (plain readonly data, cheap to stream).
 * Statistics, transforms and renderers all rely on these shapes.
 */
import type { Partition } from '../src/core/partitions.js';

/** One-line notation on 1..n: w[i−1] = w(i). */
export type Permutation = readonly number[];
/** A word over the positive integers (letters 1..m), e.g. a multiset permutation. */
export type Word = readonly number[];
/** A 0/1 word (a subset of [n] as its indicator word, position i ↦ i+1 ∈ S). */
export type BinaryWord = readonly (0 | 1)[];
/** A composition: positive parts in order. */
export type CompositionObj = readonly number[];
/** An integer partition: weakly decreasing positive parts. */
export type PartitionObj = Partition;
/** A set partition of [n]: blocks each increasing, blocks sorted by their minima. */
export type SetPartition = readonly (readonly number[])[];
/** An ordered set partition of [n]: blocks in their given order, each block increasing. */
export type OrderedSetPartition = readonly (readonly number[])[];
/** A tableau in English notation: rows top-down, each row left to right. */
export type Tableau = readonly (readonly number[])[];
/** A Dyck path of semilength n: 2n steps, 1 = north, 0 = east, never below the diagonal. */
export type DyckPath = readonly (0 | 1)[];
/**
 * A labelled Dyck path (parking function): `labels[i]` is the car in row i+1 (rows
 * counted bottom to top, one north step per row); labels increase up each column.
 */
export interface LabelledDyckPath {
  readonly path: DyckPath;
  readonly labels: readonly number[];
}
/**
 * A labelled Dyck path with decorated double rises: `decorated` lists rows r (1-based)
 * such that rows r−1 and r are a double rise (north steps r−1 and r are consecutive)
 * and row r carries a decoration (rise version of the Delta theorem, MATH.md §3).
 */
export interface DecoratedLabelledDyckPath extends LabelledDyckPath {
  readonly decorated: readonly number[];
}
/**
 * A standard filling of a diagram μ (French: rows[0] is the bottom row of length μ_1):
 * the entries 1..n each used once.
 */
export interface Filling {
  readonly shape: Partition;
  readonly rows: readonly (readonly number[])[];
}
