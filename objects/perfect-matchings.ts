/**
 * Perfect matchings of [2n] as partner arrays: the smallest unmatched point is matched with
 * each larger unmatched point in turn (lexicographic order of the partner choices).
 * (2n−1)!! of them: 2 027 025 at n = 8.
 * Fast path: `visit` matches in one reused array; shards by the partners of the first two
 * arcs' openers, dealt round-robin.
 */
import type { Family, ParamSpec, Params, Shard } from '../src/enumerate/plugin.js';
import { doubleFactorialOdd } from './support/odd-double-factorial.js';
import { intParam, validateBySpec } from './support/params.js';
import { randomBelow } from './support/random.js';
import { shardParts } from './support/shards.js';
import type { PerfectMatching } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'number of arcs n (points 1..2n)', min: 0, max: 16 }];
const validate = (params: Params): void => validateBySpec('perfect-matchings', PARAMS, params);

/** Calls f on every matching of [2n] (partner array m reused); choices made at depth < 2 decide the shard. */
function walk(n: number, f: (m: number[]) => void, shard?: Shard): void {
  const [index, count] = shardParts(shard);
  const m = new Array<number>(2 * n).fill(0);
  let rank = 0;
  const rec = (depth: number): void => {
    let a = 0;
    while (a < 2 * n && m[a] !== 0) a++;
    if (depth === Math.min(2, n) && count > 1 && rank++ % count !== index) return;
    if (a === 2 * n) {
      f(m);
      return;
    }
    for (let b = a + 1; b < 2 * n; b++) {
      if (m[b] !== 0) continue;
      m[a] = b + 1;
      m[b] = a + 1;
      rec(depth + 1);
      m[a] = 0;
      m[b] = 0;
    }
  };
  rec(0);
}

export const perfectMatchings: Family<PerfectMatching> = {
  id: 'perfect-matchings',
  description: 'perfect matchings of [2n] (fixed-point-free involutions), as partner arrays',
  source: 'standard (Stanley, EC1 §1.3 exercises; Chen–Deng–Du–Stanley–Yan, Trans. Amer. Math. Soc. 359 (2007)); (2n−1)!! matchings',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    // A recursive generator n levels deep: one matching at a time, never the whole list.
    const n = intParam(params, 'n');
    const m = new Array<number>(2 * n).fill(0);
    function* rec(): Generator<number[]> {
      let a = 0;
      while (a < 2 * n && m[a] !== 0) a++;
      if (a === 2 * n) {
        yield m.slice();
        return;
      }
      for (let b = a + 1; b < 2 * n; b++) {
        if (m[b] !== 0) continue;
        m[a] = b + 1;
        m[b] = a + 1;
        yield* rec();
        m[a] = 0;
        m[b] = 0;
      }
    }
    yield* rec();
  },
  visit(params, f, shard) {
    validate(params);
    walk(intParam(params, 'n'), f, shard);
  },
  count(params) {
    validate(params);
    return doubleFactorialOdd(intParam(params, 'n'));
  },
  render(m) {
    if (m.length === 0) return '(empty matching)';
    const arcs: string[] = [];
    m.forEach((b, i) => {
      if (b > i + 1) arcs.push(`(${i + 1},${b})`);
    });
    return arcs.join(' ');
  },
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    const m = new Array<number>(2 * n).fill(0);
    for (let a = 0; a < 2 * n; a++) {
      if (m[a] !== 0) continue;
      const free: number[] = [];
      for (let b = a + 1; b < 2 * n; b++) if (m[b] === 0) free.push(b);
      const b = free[randomBelow(random, free.length)]!;
      m[a] = b + 1;
      m[b] = a + 1;
    }
    return m;
  },
  key: (m) => m.join(','),
  testParams: [{ n: 0 }, { n: 1 }, { n: 2 }, { n: 4 }],
};
