/**
 * Motzkin paths of length n: up (1), level (0) and down (−1) steps from height 0 back to 0,
 * never below 0; all of them, or those with k up steps. Counted by C(n, 2k)·Cat(k) (the
 * non-level steps form a Dyck path, placed anywhere), the Motzkin numbers in all
 * (Donaghey–Shapiro, "Motzkin numbers", J. Combin. Theory Ser. A 23 (1977)).
 * Streamed depth first, steps tried in the order up, level, down.
 */
import { binomial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { randomDyckPath } from './support/dyck.js';
import { catalan } from './support/numbers.js';
import { emptyFamilyError, intParam, optIntParam, validateBySpec } from './support/params.js';
import { shuffleInPlace, weightedIndex } from './support/random.js';
import type { MotzkinPath } from './types.js';

const ID = 'motzkin-paths';
const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'length n (number of steps)', min: 0, max: 20 },
  { name: 'k', kind: 'int', description: 'number of up steps (0..n/2); any number when omitted', min: 0, max: 10, optional: true },
];
const validate = (params: Params): void => validateBySpec(ID, PARAMS, params);

/** Motzkin paths of length n with k up steps: C(n, 2k)·Cat(k). */
export function motzkinCount(n: number, k: number): bigint {
  return 2 * k > n ? 0n : binomial(n, 2 * k) * catalan(k);
}

/** Rows top-down: `/` up, `\` down, `_` level, one column per step. */
function draw(p: MotzkinPath): string {
  if (p.length === 0) return '(empty path)';
  let h = 0;
  let max = 0;
  const at = p.map((s) => {
    const row = s === -1 ? h - 1 : h; // a down step is drawn one row lower
    h += s;
    max = Math.max(max, h);
    return row;
  });
  const lines: string[] = [];
  for (let r = max; r >= 0; r--) lines.push(p.map((s, i) => (at[i] === r ? (s === 1 ? '/' : s === -1 ? '\\' : '_') : ' ')).join('').trimEnd() || '.');
  return lines.join('\n');
}

export const motzkinPaths: Family<MotzkinPath> = {
  id: ID,
  description: 'Motzkin paths of length n (up, level and down steps, never below 0), with k up steps',
  source: 'Donaghey–Shapiro, "Motzkin numbers", J. Combin. Theory Ser. A 23 (1977)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    const w: (-1 | 0 | 1)[] = [];
    function* walk(h: number, ups: number): Generator<(-1 | 0 | 1)[]> {
      const left = n - w.length;
      if (left === 0) {
        if (h === 0 && (k === undefined || ups === k)) yield w.slice();
        return;
      }
      if (k !== undefined && (ups > k || 2 * (k - ups) + h > left)) return;
      const steps: (-1 | 0 | 1)[] = [1, 0, -1];
      for (const s of steps) {
        const g = h + s;
        if (g < 0 || g > left - 1) continue;
        w.push(s);
        yield* walk(g, ups + (s === 1 ? 1 : 0));
        w.pop();
      }
    }
    yield* walk(0, 0);
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    if (k !== undefined) return motzkinCount(n, k);
    let s = 0n;
    for (let j = 0; 2 * j <= n; j++) s += motzkinCount(n, j);
    return s;
  },
  render: draw,
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    let k = optIntParam(params, 'k');
    if (k === undefined) k = weightedIndex(random, Array.from({ length: Math.floor(n / 2) + 1 }, (_, j) => motzkinCount(n, j)));
    if (2 * k > n) throw emptyFamilyError(ID, params);
    // A uniform Dyck path of semilength k on uniformly chosen 2k of the n positions.
    const dyck = randomDyckPath(k, random);
    const slots = new Set(shuffleInPlace(Array.from({ length: n }, (_, i) => i), random).slice(0, 2 * k));
    const out: (-1 | 0 | 1)[] = [];
    let at = 0;
    for (let i = 0; i < n; i++) out.push(slots.has(i) ? (dyck[at++] === 1 ? 1 : -1) : 0);
    return out;
  },
  key: (p) => p.map((s) => (s === 1 ? 'U' : s === -1 ? 'D' : 'H')).join(''),
  testParams: [{ n: 0 }, { n: 1 }, { n: 4 }, { n: 6 }, { n: 6, k: 2 }, { n: 5, k: 0 }, { n: 7, k: 3 }],
};
