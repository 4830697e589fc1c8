/**
 * Subsets of [n] as 0/1 words (position i is 1 when i+1 is in the subset), optionally
 * with exactly k ones. Streamed in lexicographic order of the word.
 */
import { binomial } from '../src/core/integers.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { nextPermutationFrom } from './permutations.js';
import { checkAtMost, intParam, optIntParam, validateBySpec } from './support/params.js';
import { randomBelow, shuffleInPlace } from './support/random.js';
import type { BinaryWord } from './types.js';

const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'size n', min: 0, max: 40 },
  { name: 'k', kind: 'int', description: 'number of ones k (0..n); all subsets when omitted', min: 0, max: 40, optional: true },
];
function validate(params: Params): void {
  validateBySpec('subsets', PARAMS, params);
  checkAtMost('subsets', 'k', optIntParam(params, 'k'), intParam(params, 'n'), 'n');
}

/** Next 0/1 word in lexicographic order (binary counting) in place; false after 1…1. */
export function nextBinaryWord(w: (0 | 1)[]): boolean {
  let i = w.length - 1;
  while (i >= 0 && w[i] === 1) w[i--] = 0;
  if (i < 0) return false;
  w[i] = 1;
  return true;
}

function first(n: number, k: number | undefined): (0 | 1)[] {
  const w = new Array<0 | 1>(n).fill(0);
  if (k !== undefined) for (let i = n - k; i < n; i++) w[i] = 1;
  return w;
}

export const subsets: Family<BinaryWord> = {
  id: 'subsets',
  description: 'subsets of [n] as 0/1 words, optionally with exactly k elements',
  source: 'standard (Stanley, EC1 §1.2)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const k = optIntParam(params, 'k');
    const w = first(intParam(params, 'n'), k);
    do yield w.slice();
    while (k === undefined ? nextBinaryWord(w) : nextPermutationFrom(w, 0));
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    return k === undefined ? 2n ** BigInt(n) : binomial(n, k);
  },
  render(w) {
    const set = w.flatMap((b, i) => (b === 1 ? [i + 1] : []));
    return `${w.join('') || '(empty word)'}  {${set.join(',')}}`;
  },
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    if (k === undefined) return Array.from({ length: n }, () => randomBelow(random, 2) as 0 | 1);
    return shuffleInPlace(first(n, k), random);
  },
  key: (w) => w.join(''),
  readingWord: (w) => w.map((b) => b + 1),
  testParams: [{ n: 0 }, { n: 4 }, { n: 5, k: 2 }, { n: 3, k: 0 }, { n: 3, k: 3 }],
};
