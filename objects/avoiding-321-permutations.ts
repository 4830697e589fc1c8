/**
 * 321-avoiding permutations of [n] (no i < j < k with w(i) > w(j) > w(k)), streamed in
 * lexicographic order by a prefix search that only extends prefixes with a completion:
 * every entry below the running maximum must exceed the previous such entry, and no unused
 * value may lie below it. Counted by the Catalan numbers (Knuth, TAOCP vol. 1 §2.2.1 ex. 5;
 * Simion–Schmidt, Europ. J. Combin. 6 (1985)). Uniform samples come from Dyck paths through
 * Krattenthaler's bijection.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { avoiding321OfDyck } from './support/avoiding-321.js';
import { randomDyckPath } from './support/dyck.js';
import { catalan } from './support/numbers.js';
import { intParam, validateBySpec } from './support/params.js';
import type { Permutation } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'size n', min: 0, max: 20 }];
const validate = (params: Params): void => validateBySpec('321-avoiding-permutations', PARAMS, params);

function* avoiders(n: number): Generator<number[]> {
  const w: number[] = [];
  const used = new Uint8Array(n + 2);
  function* rec(max: number, second: number, smallestFree: number): Generator<number[]> {
    if (w.length === n) {
      yield w.slice();
      return;
    }
    for (let v = smallestFree; v <= n; v++) {
      if (used[v]) continue;
      const isMax = v > max;
      // A non-maximum must exceed the last one and leave no unused value below it.
      if (!isMax && (v < second || v !== smallestFree)) continue;
      used[v] = 1;
      w.push(v);
      let free = smallestFree;
      while (used[free]) free++;
      yield* rec(isMax ? v : max, isMax ? second : v, free);
      w.pop();
      used[v] = 0;
    }
  }
  yield* rec(0, 0, 1);
}

export const avoiding321Permutations: Family<Permutation> = {
  id: '321-avoiding-permutations',
  description: 'permutations of [n] with no decreasing subsequence of length 3, in one-line notation',
  source: 'Simion–Schmidt, "Restricted permutations", Europ. J. Combin. 6 (1985); Catalan many (Knuth, TAOCP vol. 1 §2.2.1)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    yield* avoiders(intParam(params, 'n'));
  },
  count(params) {
    validate(params);
    return catalan(intParam(params, 'n'));
  },
  render: (w) => (w.length === 0 ? '(empty)' : w.join(' ')),
  sample(params, random) {
    validate(params);
    return avoiding321OfDyck(randomDyckPath(intParam(params, 'n'), random));
  },
  key: (w) => w.join(','),
  readingWord: (w) => w,
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 6 }],
};
