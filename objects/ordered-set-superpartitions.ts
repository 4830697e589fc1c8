/**
 * Ordered set superpartitions of [n] into k blocks: ordered set partitions in which any
 * element that is not the least of its block may be barred (Rhoades–Wilson, "Set
 * superpartitions and superspace duality modules", Forum Math. Sigma 10 (2022)). They index
 * a basis of the superspace module of δ_{n,k} (closure under ∂x and ∂θ), the bars playing the
 * anticommuting variables; the tests compare the number with j bars against the θ-degree-j
 * dimension computed by the module engine. Counted by k!·S(n,k)·2^{n−k}.
 * Order: ordered set partitions as in ordered-set-partitions, then the barred sets by bitmask.
 */
import { factorial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { orderedSetPartitions } from './ordered-set-partitions.js';
import { stirling2 } from './support/numbers.js';
import { checkAtMost, emptyFamilyError, intParam, validateBySpec } from './support/params.js';
import type { OrderedSetSuperpartition } from './types.js';

const ID = 'ordered-set-superpartitions';
// n = 9, k = 5 has 13 million objects; n ≤ 8 stays near a million per k.
const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'size n (elements 1..n)', min: 0, max: 9 },
  { name: 'k', kind: 'int', description: 'number of blocks k (0..n)', min: 0, max: 9 },
];
function validate(params: Params): void {
  validateBySpec(ID, PARAMS, params);
  checkAtMost(ID, 'k', intParam(params, 'k'), intParam(params, 'n'), 'n');
}

/** The elements that may carry a bar: all but the least of each block. */
export function barrable(blocks: readonly (readonly number[])[]): number[] {
  return blocks.flatMap((b) => b.slice(1)).sort((a, b) => a - b);
}

export const orderedSetSuperpartitions: Family<OrderedSetSuperpartition> = {
  id: ID,
  description: 'ordered set partitions of [n] into k blocks with some non-minimal elements barred',
  source: 'Rhoades–Wilson, "Set superpartitions and superspace duality modules", Forum Math. Sigma 10 (2022)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    for (const blocks of orderedSetPartitions.generate(params)) {
      const free = barrable(blocks);
      for (let mask = 0; mask < 1 << free.length; mask++) yield { blocks, barred: free.filter((_, i) => mask & (1 << i)) };
    }
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = intParam(params, 'k');
    return factorial(k) * stirling2(n, k) * 2n ** BigInt(Math.max(0, n - k));
  },
  render(p) {
    const bar = new Set(p.barred);
    const text = p.blocks.map((b) => b.map((x) => (bar.has(x) ? `${x}\u0305` : String(x))).join(' ')).join(' | ');
    return text || '(empty)';
  },
  sample(params, random) {
    validate(params);
    if (stirling2(intParam(params, 'n'), intParam(params, 'k')) === 0n) throw emptyFamilyError(ID, params);
    const blocks = orderedSetPartitions.sample(params, random);
    return { blocks, barred: barrable(blocks).filter(() => random() < 0.5) };
  },
  key: (p) => `${p.blocks.map((b) => b.join(',')).join('|')}:${p.barred.join(',')}`,
  testParams: [{ n: 0, k: 0 }, { n: 3, k: 0 }, { n: 3, k: 2 }, { n: 4, k: 2 }, { n: 4, k: 4 }, { n: 5, k: 3 }],
};
