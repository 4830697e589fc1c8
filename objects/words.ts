/**
 * Words with a given content (multiset permutations): content [a1, …, am] means letter i
 * appears a_i times. Streamed in lexicographic order.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { nextPermutationFrom } from './permutations.js';
import { visitRearrangements } from './support/multiset-visit.js';
import { multinomial } from './support/numbers.js';
import { listParam, validateBySpec } from './support/params.js';
import { shuffleInPlace } from './support/random.js';
import type { Word } from './types.js';

const PARAMS: readonly ParamSpec[] = [
  { name: 'content', kind: 'list', description: 'multiplicities a1,…,am of the letters 1..m (sum n ≤ 20)', min: 0, max: 20 },
];
const validate = (params: Params): void => validateBySpec('words', PARAMS, params);

/** The smallest word of the content: 1^a1 2^a2 …. */
export function sortedWord(content: readonly number[]): number[] {
  const w: number[] = [];
  content.forEach((a, i) => {
    for (let j = 0; j < a; j++) w.push(i + 1);
  });
  return w;
}

export const words: Family<Word> = {
  id: 'words',
  description: 'words with a given content (letter i used a_i times): multiset permutations',
  source: 'standard (Stanley, EC1 §1.7; MacMahon)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const w = sortedWord(listParam(params, 'content'));
    do yield w.slice();
    while (nextPermutationFrom(w, 0));
  },
  visit(params, f, shard) {
    validate(params);
    visitRearrangements(sortedWord(listParam(params, 'content')), f, shard);
  },
  count(params) {
    validate(params);
    return multinomial(listParam(params, 'content'));
  },
  render: (w) => (w.length === 0 ? '(empty)' : w.join(' ')),
  sample(params, random) {
    validate(params);
    return shuffleInPlace(sortedWord(listParam(params, 'content')), random);
  },
  key: (w) => w.join(','),
  readingWord: (w) => w,
  testParams: [{ content: [] }, { content: [2, 1, 1] }, { content: [0, 2, 2] }, { content: [3, 2] }, { content: [1, 1, 1, 1] }],
};
