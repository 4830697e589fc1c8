/**
 * Ordered set partitions of [n] into k blocks, as surjective words f: [n] → [k]
 * (element i lies in block f(i)), streamed in lexicographic order of that word.
 * Fast path: `visit` walks set partitions times block orders with reused buffers (its
 * order differs from generate's); nextSurjection/surjectionToBlocks step the word order.
 */
import { factorial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params, Shard } from '../src/enumerate/plugin.js';
import { firstGrowthWord, growthWordToBlocks, nextGrowthWord, renderBlocks } from './support/growth-words.js';
import { stirling2 } from './support/numbers.js';
import { checkAtMost, emptyFamilyError, intParam, validateBySpec } from './support/params.js';
import { randomSetPartition } from './support/random-set-partition.js';
import { shuffleInPlace } from './support/random.js';
import { shardParts } from './support/shards.js';
import type { OrderedSetPartition } from './types.js';

/**
 * Lexicographically smallest surjective completion of w[from..] given the letter
 * counts of w[0..from−1] in `counts` (letters 0..k−1); updates counts. Assumes it exists.
 */
function completeSurjection(w: number[], counts: number[], k: number, from: number): void {
  let missing = 0;
  for (let v = 0; v < k; v++) if (counts[v] === 0) missing++;
  for (let j = from; j < w.length; j++) {
    const slots = w.length - j;
    let v = 0;
    // Smallest letter that still leaves room for every missing letter.
    while (!(counts[v] === 0 ? missing - 1 <= slots - 1 : missing <= slots - 1)) v++;
    if (counts[v] === 0) missing--;
    counts[v]!++;
    w[j] = v;
  }
}

/**
 * Next surjective word w ∈ {0..k−1}^n (lexicographic) in place, changing only
 * positions ≥ start; `counts` holds the letter counts of w and is kept in step.
 * Returns the first position that changed, or −1 after the last word (w and counts are
 * then left in an unspecified state).
 */
export function nextSurjection(w: number[], counts: number[], k: number, start = 0): number {
  for (let i = w.length - 1; i >= start; i--) {
    counts[w[i]!]!--;
    let missing = 0;
    for (let v = 0; v < k; v++) if (counts[v] === 0) missing++;
    const slots = w.length - i; // positions i..n−1
    for (let v = w[i]! + 1; v < k; v++) {
      const need = counts[v] === 0 ? missing - 1 : missing;
      if (need <= slots - 1) {
        w[i] = v;
        counts[v]!++;
        completeSurjection(w, counts, k, i + 1);
        return i;
      }
    }
    w[i] = 0; // placeholder; counts no longer include position i
  }
  return -1;
}

/**
 * Brings `blocks` (k reused arrays) in line with the surjective word w (letters 0..k−1),
 * given that w changed only at positions ≥ from: elements > from leave their blocks
 * (they sit at the ends, blocks being increasing) and come back where w now puts them.
 */
export function surjectionToBlocks(w: readonly number[], blocks: number[][], from = 0): void {
  for (const b of blocks) while (b.length > 0 && b[b.length - 1]! > from) b.pop();
  for (let i = from; i < w.length; i++) blocks[w[i]!]!.push(i + 1);
}

/** The first surjective word [n] → {0..k−1} and its letter counts (undefined when there is none). */
export function firstSurjection(n: number, k: number): { w: number[]; counts: number[] } | undefined {
  if (k > n || (n > 0 && k === 0)) return undefined;
  const w = new Array<number>(n).fill(0);
  const counts = new Array<number>(k).fill(0);
  completeSurjection(w, counts, k, 0);
  return { w, counts };
}

/** Next permutation (lexicographic) of p in place; the first changed index, or −1 after the last. */
function nextOrder(p: number[]): number {
  let i = p.length - 2;
  while (i >= 0 && p[i]! > p[i + 1]!) i--;
  if (i < 0) return -1;
  let j = p.length - 1;
  while (p[j]! < p[i]!) j--;
  let t = p[i]!;
  p[i] = p[j]!;
  p[j] = t;
  for (let l = i + 1, r = p.length - 1; l < r; l++, r--) {
    t = p[l]!;
    p[l] = p[r]!;
    p[r] = t;
  }
  return i;
}

/**
 * The fast path: every set partition into k blocks (restricted growth order) in every
 * order of its blocks (lexicographic). Stepping the order only swaps block pointers, so
 * an object costs O(1) amortized. Shards take whole set partitions round-robin (each
 * brings k! objects, so shards balance within one set partition's worth).
 */
function visitOsp(n: number, k: number, f: (p: OrderedSetPartition) => void, shard?: Shard): void {
  const [index, count] = shardParts(shard);
  if (stirling2(n, k) === 0n) return;
  const a = firstGrowthWord(n, k);
  const order = Array.from({ length: k }, (_, i) => i);
  const ordered: number[][] = new Array<number[]>(k);
  let j = 0;
  do {
    if (j++ % count !== index) continue;
    const blocks = growthWordToBlocks(a);
    for (let i = 0; i < k; i++) ordered[i] = blocks[(order[i] = i)]!;
    let from = 0;
    do {
      for (let i = from; i < k; i++) ordered[i] = blocks[order[i]!]!;
      f(ordered);
      from = nextOrder(order);
    } while (from >= 0);
  } while (nextGrowthWord(a, k));
}

const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'size n (elements 1..n)', min: 0, max: 20 },
  { name: 'k', kind: 'int', description: 'number of blocks k (0..n)', min: 0, max: 20 },
];
function validate(params: Params): void {
  validateBySpec('ordered-set-partitions', PARAMS, params);
  checkAtMost('ordered-set-partitions', 'k', intParam(params, 'k'), intParam(params, 'n'), 'n');
}

export const orderedSetPartitions: Family<OrderedSetPartition> = {
  id: 'ordered-set-partitions',
  description: 'ordered set partitions of [n] into k blocks (blocks in order, each increasing)',
  source: 'standard (Stanley, EC1 §1.9); counted by k!·S(n,k)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = intParam(params, 'k');
    const start = firstSurjection(n, k);
    if (!start) return;
    const { w, counts } = start;
    do {
      const blocks = Array.from({ length: k }, () => [] as number[]);
      surjectionToBlocks(w, blocks);
      yield blocks;
    } while (nextSurjection(w, counts, k, 0) >= 0);
  },
  visit(params, f, shard) {
    validate(params);
    visitOsp(intParam(params, 'n'), intParam(params, 'k'), f, shard);
  },
  count(params) {
    validate(params);
    const k = intParam(params, 'k');
    return factorial(k) * stirling2(intParam(params, 'n'), k);
  },
  render: renderBlocks,
  sample(params, random) {
    validate(params);
    if (stirling2(intParam(params, 'n'), intParam(params, 'k')) === 0n) throw emptyFamilyError('ordered-set-partitions', params);
    return shuffleInPlace(randomSetPartition(intParam(params, 'n'), intParam(params, 'k'), random), random);
  },
  key: (p) => p.map((b) => b.join(',')).join('|'),
  testParams: [{ n: 0, k: 0 }, { n: 3, k: 0 }, { n: 3, k: 2 }, { n: 4, k: 4 }, { n: 5, k: 3 }, { n: 6, k: 2 }],
};
