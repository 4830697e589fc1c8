/**
 * Schröder paths from (0,0) to (n,n): north, east and diagonal steps, never below the
 * diagonal; all of them, or those with d diagonal steps. Counted by C(2n−d, d)·Cat(n−d)
 * (the diagonal steps go anywhere in a Dyck path of semilength n − d); the large Schröder
 * numbers in all. Haglund, "The q,t-Catalan Numbers and the Space of Diagonal Harmonics",
 * AMS 2008, ch. 4: Σ q^{area} t^{bounce} over those with d diagonal steps = ⟨∇e_n, e_{n−d}h_d⟩.
 * Streamed depth first, steps tried in the order north, east, diagonal.
 */
import { binomial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { randomDyckPath } from './support/dyck.js';
import { catalan } from './support/numbers.js';
import { checkAtMost, intParam, optIntParam, validateBySpec } from './support/params.js';
import { shuffleInPlace, weightedIndex } from './support/random.js';
import { drawSchroderPath } from './support/schroder.js';
import type { SchroderPath } from './types.js';

const ID = 'schroder-paths';
const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'size n (the path ends at (n,n))', min: 0, max: 12 },
  { name: 'd', kind: 'int', description: 'number of diagonal steps (0..n); any number when omitted', min: 0, max: 12, optional: true },
];
function validate(params: Params): void {
  validateBySpec(ID, PARAMS, params);
  checkAtMost(ID, 'd', optIntParam(params, 'd'), intParam(params, 'n'), 'n');
}

/** Schröder paths of size n with d diagonal steps: C(2n−d, d)·Cat(n−d). */
export function schroderCount(n: number, d: number): bigint {
  return d > n ? 0n : binomial(2 * n - d, d) * catalan(n - d);
}

export const schroderPaths: Family<SchroderPath> = {
  id: ID,
  description: 'Schröder paths to (n,n) with north, east and diagonal steps (with d diagonal steps)',
  source: 'Haglund, The q,t-Catalan Numbers and the Space of Diagonal Harmonics (AMS 2008), ch. 4; large Schröder numbers',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    const want = optIntParam(params, 'd');
    const w: (0 | 1 | 2)[] = [];
    function* walk(x: number, y: number, d: number): Generator<(0 | 1 | 2)[]> {
      if (x === n && y === n) {
        if (want === undefined || d === want) yield w.slice();
        return;
      }
      // Diagonal steps still possible: n − y; prune when the wanted number cannot be met.
      if (want !== undefined && (d > want || d + (n - y) < want)) return;
      if (y < n) {
        w.push(1);
        yield* walk(x, y + 1, d);
        w.pop();
      }
      if (x < y) {
        w.push(0);
        yield* walk(x + 1, y, d);
        w.pop();
      }
      if (y < n) {
        w.push(2);
        yield* walk(x + 1, y + 1, d + 1);
        w.pop();
      }
    }
    yield* walk(0, 0, 0);
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    const d = optIntParam(params, 'd');
    if (d !== undefined) return schroderCount(n, d);
    let s = 0n;
    for (let j = 0; j <= n; j++) s += schroderCount(n, j);
    return s;
  },
  render: drawSchroderPath,
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    let d = optIntParam(params, 'd');
    if (d === undefined) d = weightedIndex(random, Array.from({ length: n + 1 }, (_, j) => schroderCount(n, j)));
    // A uniform Dyck path of semilength n − d with d diagonal steps in uniform positions.
    const dyck = randomDyckPath(n - d, random);
    const slots = shuffleInPlace(Array.from({ length: 2 * n - d }, (_, i) => i), random).slice(0, d);
    const isDiagonal = new Set(slots);
    const out: (0 | 1 | 2)[] = [];
    let at = 0;
    for (let i = 0; i < 2 * n - d; i++) out.push(isDiagonal.has(i) ? 2 : dyck[at++]!);
    return out;
  },
  key: (p) => p.map((s) => 'END'[s]).join(''),
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 4, d: 2 }, { n: 5, d: 1 }, { n: 3, d: 3 }],
};
