/** Partition counts by largest part, and uniform sampling from them. */
import { conjugate } from '../../src/core/partitions.js';
import { weightedIndex } from './random.js';

const table: bigint[][] = [[1n]]; // table[n][m] = #partitions of n with parts ≤ m (m ≤ n)

/** The number of partitions of n with every part at most m. */
export function partitionsAtMost(n: number, m: number): bigint {
  if (n < 0) return 0n;
  if (m > n) m = n;
  if (m <= 0) return n === 0 ? 1n : 0n;
  for (let a = table.length; a <= n; a++) {
    const row: bigint[] = [a === 0 ? 1n : 0n];
    for (let b = 1; b <= a; b++) row.push(row[b - 1]! + partitionsAtMost(a - b, b)); // largest part < b, or = b
    table.push(row);
  }
  return table[n]![m]!;
}

/** The number of partitions of n with exactly k parts (= largest part exactly k). */
export function partitionsWithParts(n: number, k: number): bigint {
  if (k === 0) return n === 0 ? 1n : 0n;
  return k > n ? 0n : partitionsAtMost(n - k, k);
}

/** A uniform partition of n with parts ≤ m: the first part j is chosen by its count. */
export function randomPartitionAtMost(n: number, m: number, random: () => number): number[] {
  const out: number[] = [];
  while (n > 0) {
    const top = Math.min(n, m);
    const weights = Array.from({ length: top }, (_, i) => partitionsAtMost(n - (i + 1), i + 1));
    const j = weightedIndex(random, weights) + 1;
    out.push(j);
    n -= j;
    m = j;
  }
  return out;
}

/** A uniform partition of n with exactly k parts (the conjugate of one with largest part k). */
export function randomPartitionWithParts(n: number, k: number, random: () => number): number[] {
  if (k === 0) return [];
  return conjugate([k, ...randomPartitionAtMost(n - k, k, random)]);
}
