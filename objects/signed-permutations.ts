/**
 * Signed permutations of [n] (the hyperoctahedral group B_n) in window notation: for each
 * permutation in lexicographic order, every choice of signs (sign mask counting up, bit i
 * negates position i+1). 2^n·n! objects: 10 321 920 at n = 8.
 * Fast path: `visit` writes one buffer per object; shards split the permutations by their first three letters.
 */
import { factorial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { visitRearrangements } from './support/multiset-visit.js';
import { nextPermutationFrom } from './support/next-permutation.js';
import { intParam, validateBySpec } from './support/params.js';
import { randomBelow, shuffleInPlace } from './support/random.js';
import type { SignedPermutation } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'size n (letters ±1, …, ±n)', min: 0, max: 14 }];
const validate = (params: Params): void => validateBySpec('signed-permutations', PARAMS, params);

function withSigns(w: readonly number[], mask: number, out: number[]): number[] {
  for (let i = 0; i < w.length; i++) out[i] = (mask >>> i) & 1 ? -w[i]! : w[i]!;
  return out;
}

export const signedPermutations: Family<SignedPermutation> = {
  id: 'signed-permutations',
  description: 'signed permutations of [n] (hyperoctahedral group B_n) in window notation w(1) … w(n)',
  source: 'standard (Björner–Brenti, Combinatorics of Coxeter Groups, GTM 231, §8.1)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    const a = Array.from({ length: n }, (_, i) => i + 1);
    do for (let m = 0; m < 2 ** n; m++) yield withSigns(a, m, new Array<number>(n));
    while (nextPermutationFrom(a, 0));
  },
  visit(params, f, shard) {
    validate(params);
    const n = intParam(params, 'n');
    const out = new Array<number>(n);
    visitRearrangements(Array.from({ length: n }, (_, i) => i + 1), (w) => {
      for (let m = 0; m < 2 ** n; m++) f(withSigns(w, m, out));
    }, shard);
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    return 2n ** BigInt(n) * factorial(n);
  },
  render: (w) => (w.length === 0 ? '(empty)' : w.join(' ')),
  sample(params, random) {
    validate(params);
    const w = shuffleInPlace(Array.from({ length: intParam(params, 'n') }, (_, i) => i + 1), random);
    return w.map((x) => (randomBelow(random, 2) === 1 ? -x : x));
  },
  key: (w) => w.join(','),
  testParams: [{ n: 0 }, { n: 1 }, { n: 2 }, { n: 3 }],
};
