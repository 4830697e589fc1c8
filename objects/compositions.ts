/** Compositions of n (ordered positive parts), optionally with exactly k parts. */
import { compositionCount, compositions as streamCompositions } from '../src/core/compositions.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { checkAtMost, emptyFamilyError, intParam, optIntParam, validateBySpec } from './support/params.js';
import { randomBelow, shuffleInPlace } from './support/random.js';
import type { CompositionObj } from './types.js';

const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'size n', min: 0, max: 60 },
  { name: 'k', kind: 'int', description: 'number of parts k (0..n); any number when omitted', min: 0, max: 60, optional: true },
];
function validate(params: Params): void {
  validateBySpec('compositions', PARAMS, params);
  checkAtMost('compositions', 'k', optIntParam(params, 'k'), intParam(params, 'n'), 'n');
}

/** The composition whose partial sums (other than n) are the elements of cuts (sorted). */
function fromCuts(n: number, cuts: readonly number[]): number[] {
  const parts: number[] = [];
  let prev = 0;
  for (const c of [...cuts, n]) {
    parts.push(c - prev);
    prev = c;
  }
  return n === 0 ? [] : parts;
}

export const compositions: Family<CompositionObj> = {
  id: 'compositions',
  description: 'compositions of n (ordered positive parts), optionally with exactly k parts',
  source: 'standard (Stanley, EC1 §1.2)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    yield* streamCompositions(intParam(params, 'n'), optIntParam(params, 'k'));
  },
  count(params) {
    validate(params);
    return compositionCount(intParam(params, 'n'), optIntParam(params, 'k'));
  },
  render: (c) => (c.length === 0 ? '(empty)' : c.join('+')),
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    const k = optIntParam(params, 'k');
    if (k === 0 && n > 0) throw emptyFamilyError('compositions', params);
    if (n === 0) return [];
    // A composition is a subset of the n−1 cut points (with k−1 of them when k is given).
    const points = Array.from({ length: n - 1 }, (_, i) => i + 1);
    const cuts = k === undefined ? points.filter(() => randomBelow(random, 2) === 1) : shuffleInPlace(points, random).slice(0, k - 1);
    return fromCuts(n, cuts.sort((a, b) => a - b));
  },
  key: (c) => c.join(','),
  testParams: [{ n: 0 }, { n: 0, k: 0 }, { n: 5 }, { n: 6, k: 3 }, { n: 4, k: 0 }],
};
