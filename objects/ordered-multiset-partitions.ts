/**
 * Ordered multiset partitions of a content α into k blocks: sequences of k non-empty sets
 * whose union, as a multiset, has letter i exactly α_i times (the objects of the Delta
 * conjecture at t = 0; Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc.
 * 370 (2018) §4; Wilson, "An extension of MacMahon's equidistribution theorem to ordered
 * multiset partitions", Electron. J. Combin. 23 (2016)). Content 1^n gives ordered set partitions.
 * Order: letter by letter, each letter's set of blocks in lexicographic order.
 */
import { binomial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { renderBlocks } from './support/growth-words.js';
import { emptyFamilyError, intParam, listParam, validateBySpec } from './support/params.js';
import { shuffleInPlace, weightedIndex } from './support/random.js';
import type { OrderedMultisetPartition } from './types.js';

const ID = 'ordered-multiset-partitions';
const PARAMS: readonly ParamSpec[] = [
  { name: 'content', kind: 'list', description: 'letter multiplicities α (letter i used α_i times), such as 2,1,1', min: 0, max: 12 },
  { name: 'k', kind: 'int', description: 'number of blocks k (0..12)', min: 0, max: 12 },
];
const validate = (params: Params): void => validateBySpec(ID, PARAMS, params);

/**
 * Ways to place the letters α[from..] (each letter in a set of α_i distinct blocks out of k)
 * so that e given blocks, empty so far, all receive a letter: inclusion–exclusion over the
 * empty blocks left empty.
 */
export function completions(alpha: readonly number[], from: number, k: number, e: number): bigint {
  let s = 0n;
  for (let j = 0; j <= e; j++) {
    let term = binomial(e, j);
    for (let i = from; i < alpha.length; i++) term *= binomial(k - j, alpha[i]!);
    s += j % 2 === 0 ? term : -term;
  }
  return s;
}

export const orderedMultisetPartitions: Family<OrderedMultisetPartition> = {
  id: ID,
  description: 'ordered multiset partitions of a content α into k blocks (each block a set)',
  source: 'Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018) §4; Wilson, Electron. J. Combin. 23 (2016)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const alpha = listParam(params, 'content');
    const k = intParam(params, 'k');
    const rest = alpha.map((_, i) => alpha.slice(i + 1).reduce((a, b) => a + b, 0));
    const blocks: number[][] = Array.from({ length: k }, () => []);
    let empty = k;
    function* place(letter: number): Generator<number[][]> {
      if (letter === alpha.length) {
        if (empty === 0) yield blocks.map((b) => b.slice());
        return;
      }
      // Choose the blocks of this letter in lexicographic order; prune when too few letters remain.
      function* choose(from: number, left: number): Generator<number[][]> {
        if (left === 0) {
          if (rest[letter]! >= empty) yield* place(letter + 1);
          return;
        }
        for (let j = from; j <= k - left; j++) {
          const b = blocks[j]!;
          if (b.length === 0) empty--;
          b.push(letter + 1);
          yield* choose(j + 1, left - 1);
          b.pop();
          if (b.length === 0) empty++;
        }
      }
      yield* choose(0, alpha[letter]!);
    }
    if (alpha.length === 0) {
      if (k === 0) yield [];
      return;
    }
    yield* place(0);
  },
  count(params) {
    validate(params);
    const alpha = listParam(params, 'content');
    const k = intParam(params, 'k');
    return completions(alpha, 0, k, k);
  },
  render: renderBlocks,
  sample(params, random) {
    validate(params);
    const alpha = listParam(params, 'content');
    const k = intParam(params, 'k');
    if (completions(alpha, 0, k, k) === 0n) throw emptyFamilyError(ID, params);
    // Letter by letter: how many of its blocks are still empty, weighted by the completions.
    const blocks: number[][] = Array.from({ length: k }, () => []);
    for (let i = 0; i < alpha.length; i++) {
      const emptyIdx = blocks.flatMap((b, j) => (b.length === 0 ? [j] : []));
      const fullIdx = blocks.flatMap((b, j) => (b.length > 0 ? [j] : []));
      const e = emptyIdx.length;
      const a = alpha[i]!;
      const weights = Array.from({ length: a + 1 }, (_, m) => binomial(e, m) * binomial(k - e, a - m) * completions(alpha, i + 1, k, e - m));
      const m = weightedIndex(random, weights);
      const chosen = [...shuffleInPlace(emptyIdx, random).slice(0, m), ...shuffleInPlace(fullIdx, random).slice(0, a - m)];
      for (const j of chosen) blocks[j]!.push(i + 1);
    }
    return blocks;
  },
  key: (p) => p.map((b) => b.join(',')).join('|'),
  testParams: [{ content: [], k: 0 }, { content: [2, 1], k: 1 }, { content: [1, 1, 1], k: 2 }, { content: [2, 1, 1], k: 2 }, { content: [2, 2], k: 3 }, { content: [1, 2, 3], k: 3 }, { content: [2, 0, 2, 1], k: 4 }],
};
