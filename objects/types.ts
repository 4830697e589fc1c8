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
 * and row r carries a decoration (rise version of the Delta theorem, Haglund–Remmel–Wilson,
 * Trans. Amer. Math. Soc. 370 (2018)).
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

// Part B of the statistics library: signed permutations, matrices, trees, sequences, matchings.

/** A signed permutation of [n] (B_n) in window notation: w[i−1] = w(i) ∈ ±[n], |w(1)|, …, |w(n)| a permutation. */
export type SignedPermutation = readonly number[];
/** An alternating sign matrix: n rows of n entries −1, 0, 1 (rows and columns sum to 1, signs alternate). */
export type AlternatingSignMatrix = readonly (readonly number[])[];
/** A monotone triangle: row k (k = 1..n) strictly increasing of length k, the last row 1..n, rows interlacing. */
export type MonotoneTriangle = readonly (readonly number[])[];
/** A binary tree: null (empty) or [left subtree, right subtree]. */
export type BinaryTree = null | readonly [BinaryTree, BinaryTree];
/** A plane (ordered) tree: the list of the root's subtrees, left to right. */
export type PlaneTree = readonly PlaneTree[];
/** A tree on the vertices 0..n rooted at 0: parent[i−1] is the parent of vertex i. */
export type LabelledTree = readonly number[];
/** A Prüfer code of a tree on 0..n: n−1 letters from 0..n (empty for n ≤ 1). */
export type PruferCode = readonly number[];
/** An increasing (recursive) tree on 0..n rooted at 0: parent[i−1] < i is the parent of vertex i. */
export type IncreasingTree = readonly number[];
/** An increasing plane tree on 0..n rooted at 0: children[v] lists v's children left to right (each > v). */
export type IncreasingPlaneTree = readonly (readonly number[])[];
/** An inversion sequence e_1 … e_n with 0 ≤ e_i ≤ i − 1. */
export type InversionSequence = readonly number[];
/** A Stirling permutation of order n: 1,1,2,2,…,n,n arranged so that letters between the two i's exceed i. */
export type StirlingPermutation = readonly number[];
/** A perfect matching of [2n]: partner[i−1] is the point matched with i. */
export type PerfectMatching = readonly number[];
// Families of the Delta/Shuffle and superspace library (part A).

/** An ordered multiset partition: blocks in order, each a set of letters (strictly increasing). */
export type OrderedMultisetPartition = readonly (readonly number[])[];
/**
 * A labelled Dyck path with decorated contractible valleys (valley version of the Delta
 * conjecture): `decorated` lists rows r (1-based, r ≥ 2) whose north step follows an east step
 * and which stay a labelled Dyck path when that north step moves one column left.
 */
export interface ValleyDecoratedLabelledDyckPath extends LabelledDyckPath {
  readonly decorated: readonly number[];
}
/** An unlabelled Dyck path with decorated rows (double rises or valleys, by family), 1-based rows. */
export interface DecoratedDyckPath {
  readonly path: DyckPath;
  readonly decorated: readonly number[];
}
/** A Schröder path from (0,0) to (n,n) weakly above the diagonal: 1 = north, 0 = east, 2 = diagonal. */
export type SchroderPath = readonly (0 | 1 | 2)[];
/** A Motzkin path: 1 = up, 0 = level, −1 = down, never below height 0, ending at 0. */
export type MotzkinPath = readonly (-1 | 0 | 1)[];
/** A skew standard tableau of shape outer/inner (English): rows[i] fills columns inner[i]..outer[i]−1. */
export interface SkewTableau {
  readonly outer: readonly number[];
  readonly inner: readonly number[];
  readonly rows: readonly (readonly number[])[];
}
/**
 * Non-attacking rooks on a Ferrers board: `heights` are the column heights left to right
 * (weakly increasing, positive), `rows[c]` the row (1 = bottom) of the rook in column c, 0 if none.
 */
export interface RookPlacement {
  readonly heights: readonly number[];
  readonly rows: readonly number[];
}
/** A Tesler matrix: an upper triangular n × n matrix of non-negative integers, given by its rows. */
export type TeslerMatrix = readonly (readonly number[])[];
/** A superpartition: strictly decreasing fermionic parts (a last part 0 allowed) and a partition. */
export interface Superpartition {
  readonly fermionic: readonly number[];
  readonly bosonic: readonly number[];
}
/** An ordered set superpartition: an ordered set partition with some non-minimal elements barred. */
export interface OrderedSetSuperpartition {
  readonly blocks: OrderedSetPartition;
  readonly barred: readonly number[];
}
/** A parallelogram polyomino as its columns left to right, each the rows [bottom, top) it covers. */
export type ParallelogramPolyomino = readonly (readonly [number, number])[];
