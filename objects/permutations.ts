/**
 * Permutations of [n] in one-line notation, in lexicographic order.
 * Fast path: `visit` steps one buffer with nextPermutationFrom (no allocation per object);
 * shards split by the first two letters, dealt round-robin (n(n−1) nearly equal parts).
 */
import { factorial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params, Shard } from '../src/enumerate/plugin.js';
import { intParam, validateBySpec } from './support/params.js';
import { shuffleInPlace } from './support/random.js';
import { shardParts } from './support/shards.js';
import type { Permutation } from './types.js';

/**
 * Next permutation (lexicographic) of a[start..] in place, leaving a[0..start−1] alone;
 * false (and a unchanged) after the last one. Works for multisets too (repeated letters).
 */
export function nextPermutationFrom(a: number[], start = 0): boolean {
  let i = a.length - 2;
  while (i >= start && a[i]! >= a[i + 1]!) i--;
  if (i < start) return false;
  let j = a.length - 1;
  while (a[j]! <= a[i]!) j--;
  let t = a[i]!;
  a[i] = a[j]!;
  a[j] = t;
  for (let l = i + 1, r = a.length - 1; l < r; l++, r--) {
    t = a[l]!;
    a[l] = a[r]!;
    a[r] = t;
  }
  return true;
}

function visitPermutations(n: number, f: (w: Permutation) => void, shard?: Shard): void {
  const [index, count] = shardParts(shard);
  const a = Array.from({ length: n }, (_, i) => i + 1);
  if (n < 2 || count === 1) {
    if (index === 0) do f(a);
    while (nextPermutationFrom(a, 0));
    return;
  }
  let p = 0;
  for (let x = 1; x <= n; x++) {
    for (let y = 1; y <= n; y++) {
      if (y === x || p++ % count !== index) continue;
      a[0] = x;
      a[1] = y;
      let m = 2;
      for (let v = 1; v <= n; v++) if (v !== x && v !== y) a[m++] = v;
      do f(a);
      while (nextPermutationFrom(a, 2));
    }
  }
}

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'size n', min: 0, max: 20 }];
const validate = (params: Params): void => validateBySpec('permutations', PARAMS, params);

export const permutations: Family<Permutation> = {
  id: 'permutations',
  description: 'permutations of [n] in one-line notation',
  source: 'standard (Stanley, EC1 §1.3)',
  params: PARAMS,
  validate,
  *generate(params: Params) {
    validate(params);
    const a = Array.from({ length: intParam(params, 'n') }, (_, i) => i + 1);
    do yield a.slice();
    while (nextPermutationFrom(a, 0));
  },
  visit(params: Params, f: (w: Permutation) => void, shard?: Shard) {
    validate(params);
    visitPermutations(intParam(params, 'n'), f, shard);
  },
  count(params) {
    validate(params);
    return factorial(intParam(params, 'n'));
  },
  render: (w) => (w.length === 0 ? '(empty)' : w.join(' ')),
  sample: (params, random) => (validate(params), shuffleInPlace(Array.from({ length: intParam(params, 'n') }, (_, i) => i + 1), random)),
  key: (w) => w.join(','),
  readingWord: (w) => w,
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 5 }],
};
