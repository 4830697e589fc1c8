/**
 * Superpartitions of degree n and fermionic degree m (Desrosiers–Lapointe–Mathieu,
 * "Classical symmetric functions in superspace", J. Algebraic Combin. 24 (2006) §2): a
 * strictly decreasing sequence of m non-negative "fermionic" parts (one part 0 allowed)
 * and a partition, the parts summing to n. They index the bases of symmetric functions in
 * superspace of degree (n|m); the m anticommuting variables show as circles in the diagram.
 * Counted by the coefficient of q^n z^m in Π_{i≥0}(1 + z q^i) / Π_{i≥1}(1 − q^i).
 * Order: m, then the fermionic sum, the fermionic parts (decreasing lexicographic), the partition.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { partitions } from '../src/core/partitions.js';
import { partitionsAtMost, randomPartitionAtMost } from './support/partition-counts.js';
import { emptyFamilyError, intParam, optIntParam, validateBySpec } from './support/params.js';
import { weightedIndex } from './support/random.js';
import { diagramRows, fermionicCount, randomFermionic, superpartitionText } from './support/superpartition.js';
import type { Superpartition } from './types.js';

const ID = 'superpartitions';
const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'degree n (sum of all parts)', min: 0, max: 30 },
  { name: 'k', kind: 'int', description: 'fermionic degree m (number of circled parts); any when omitted', min: 0, max: 30, optional: true },
];
const validate = (params: Params): void => validateBySpec(ID, PARAMS, params);

/** The fermionic degrees asked for: m = k, or every m with m(m−1)/2 ≤ n. */
function degrees(params: Params): number[] {
  const n = intParam(params, 'n');
  const k = optIntParam(params, 'k');
  if (k !== undefined) return [k];
  const out: number[] = [];
  for (let m = 0; (m * (m - 1)) / 2 <= n; m++) out.push(m);
  return out;
}

/** Weights of (m, a): fermionic tuples of sum a times partitions of n − a. */
function weights(n: number, ms: readonly number[]): { m: number; a: number; w: bigint }[] {
  const out: { m: number; a: number; w: bigint }[] = [];
  for (const m of ms) for (let a = 0; a <= n; a++) out.push({ m, a, w: fermionicCount(a, m) * partitionsAtMost(n - a, n - a) });
  return out;
}

/** Strictly decreasing m-tuples of non-negative integers with sum a (fresh arrays). */
function* fermionicTuples(a: number, m: number, below = Infinity): Generator<number[]> {
  if (m === 0) {
    if (a === 0) yield [];
    return;
  }
  // The first part f exceeds the m − 1 distinct parts after it, so f ≥ m − 1.
  for (let f = Math.min(a, below - 1); f >= m - 1; f--) for (const rest of fermionicTuples(a - f, m - 1, f)) yield [f, ...rest];
}

export const superpartitions: Family<Superpartition> = {
  id: ID,
  description: 'superpartitions of degree n with fermionic degree m (--k): strict fermionic parts and a partition',
  source: 'Desrosiers–Lapointe–Mathieu, "Classical symmetric functions in superspace", J. Algebraic Combin. 24 (2006) §2',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    for (const m of degrees(params)) {
      for (let a = 0; a <= n; a++) {
        for (const fermionic of fermionicTuples(a, m)) for (const bosonic of partitions(n - a)) yield { fermionic, bosonic: bosonic.slice() };
      }
    }
  },
  count(params) {
    validate(params);
    return weights(intParam(params, 'n'), degrees(params)).reduce((s, x) => s + x.w, 0n);
  },
  render(s) {
    const rows = diagramRows(s);
    return [superpartitionText(s), ...rows.map((r) => '□'.repeat(r.length) + (r.circle ? '○' : ''))].join('\n');
  },
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    const ws = weights(n, degrees(params));
    if (ws.every((x) => x.w === 0n)) throw emptyFamilyError(ID, params);
    const { m, a } = ws[weightedIndex(random, ws.map((x) => x.w))]!;
    return { fermionic: randomFermionic(a, m, random), bosonic: randomPartitionAtMost(n - a, n - a, random) };
  },
  key: superpartitionText,
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 4, k: 2 }, { n: 5, k: 1 }, { n: 6 }, { n: 2, k: 3 }],
};
