/**
 * Semistandard Young tableaux (English) of shape λ with content μ (letter i used μ_i
 * times): letter by letter, each letter fills a horizontal strip. Counted by the Kostka
 * number K_{λμ} (Stanley, EC2 §7.10; Macdonald, Symmetric Functions, I.6), computed by the
 * same strip recursion with memoization.
 */
import { InputError } from '../src/core/errors.js';
import type { Partition } from '../src/core/partitions.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { drawRows } from './support/diagram.js';
import { listParam, validateBySpec } from './support/params.js';
import { weightedIndex } from './support/random.js';
import { rowReadingWord } from './support/tableaux.js';
import type { Tableau } from './types.js';

const PARAMS: readonly ParamSpec[] = [
  { name: 'shape', kind: 'partition', description: 'the shape λ', min: 0, max: 30 },
  { name: 'content', kind: 'list', description: 'the content μ1,…,μm (letter i used μi times; sum |λ|)', min: 0, max: 30 },
];
function validate(params: Params): void {
  validateBySpec('semistandard-tableaux', PARAMS, params);
  const size = listParam(params, 'shape').reduce((a, b) => a + b, 0);
  const total = listParam(params, 'content').reduce((a, b) => a + b, 0);
  if (size !== total) throw new InputError(`semistandard-tableaux: content must sum to |shape| = ${size} (got ${total})`, 'content');
}

/** Every way to add a horizontal strip of m cells to inner shape mu inside lambda (row additions). */
export function* horizontalStrips(lambda: Partition, mu: readonly number[], m: number): Generator<number[]> {
  const add = new Array<number>(lambda.length).fill(0);
  function* row(r: number, left: number): Generator<number[]> {
    if (r === lambda.length) {
      if (left === 0) yield add.slice();
      return;
    }
    const inner = mu[r] ?? 0;
    // A strip never puts two cells in one column: row r may grow up to the old end of row r−1.
    const cap = Math.min(lambda[r]! - inner, r === 0 ? Infinity : (mu[r - 1] ?? 0) - inner, left);
    for (let x = cap; x >= 0; x--) {
      add[r] = x;
      yield* row(r + 1, left - x);
    }
    add[r] = 0;
  }
  yield* row(0, m);
}

function grow(mu: readonly number[], add: readonly number[]): number[] {
  return add.map((x, r) => (mu[r] ?? 0) + x);
}

/**
 * A memoized counter: ways(i, mu) = number of ways to fill lambda/mu with letters i+1, …
 * (content[i], … of each), by horizontal strips.
 */
function stripCounter(lambda: Partition, content: readonly number[]): (i: number, mu: readonly number[]) => bigint {
  const memo = new Map<string, bigint>();
  const rec = (i: number, mu: readonly number[]): bigint => {
    if (i === content.length) return mu.every((x, r) => x === lambda[r]) ? 1n : 0n;
    const key = `${i}:${mu.join(',')}`;
    const hit = memo.get(key);
    if (hit !== undefined) return hit;
    let s = 0n;
    for (const add of horizontalStrips(lambda, mu, content[i]!)) s += rec(i + 1, grow(mu, add));
    memo.set(key, s);
    return s;
  };
  return rec;
}

/** K_{λμ}: the number of SSYT of shape lambda and content mu. */
export function kostka(lambda: Partition, content: readonly number[]): bigint {
  return stripCounter(lambda, content)(0, new Array<number>(lambda.length).fill(0));
}

export const semistandardTableaux: Family<Tableau> = {
  id: 'semistandard-tableaux',
  description: 'semistandard Young tableaux of shape λ with content μ (counted by Kostka numbers)',
  source: 'standard (Stanley, EC2 §7.10; Macdonald, Symmetric Functions, I.6)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const lambda = listParam(params, 'shape');
    const content = listParam(params, 'content');
    const rows: number[][] = lambda.map(() => []);
    function* fill(i: number, mu: readonly number[]): Generator<Tableau> {
      if (i === content.length) {
        if (mu.every((x, r) => x === lambda[r])) yield rows.map((r) => r.slice());
        return;
      }
      for (const add of horizontalStrips(lambda, mu, content[i]!)) {
        add.forEach((x, r) => {
          for (let j = 0; j < x; j++) rows[r]!.push(i + 1);
        });
        yield* fill(i + 1, grow(mu, add));
        add.forEach((x, r) => (rows[r]!.length -= x));
      }
    }
    yield* fill(0, new Array<number>(lambda.length).fill(0));
  },
  count(params) {
    validate(params);
    return kostka(listParam(params, 'shape'), listParam(params, 'content'));
  },
  render: (t) => drawRows(t),
  sample(params, random) {
    validate(params);
    const lambda = listParam(params, 'shape');
    const content = listParam(params, 'content');
    const ways = stripCounter(lambda, content);
    if (ways(0, new Array<number>(lambda.length).fill(0)) === 0n) throw new InputError(`semistandard-tableaux: no tableau of shape ${lambda.join(',')} with content ${content.join(',')}`, 'content');
    // Choose each letter's strip with weight = number of ways to finish (uniform overall).
    const rows: number[][] = lambda.map(() => []);
    let mu: number[] = new Array<number>(lambda.length).fill(0);
    for (let i = 0; i < content.length; i++) {
      const options = [...horizontalStrips(lambda, mu, content[i]!)];
      const weights = options.map((add) => ways(i + 1, grow(mu, add)));
      const add = options[weightedIndex(random, weights)]!;
      add.forEach((x, r) => {
        for (let j = 0; j < x; j++) rows[r]!.push(i + 1);
      });
      mu = grow(mu, add);
    }
    return rows;
  },
  key: (t) => t.map((r) => r.join(',')).join('/'),
  readingWord: rowReadingWord,
  // the shape, for Σ q^stat s_shape over the tableaux of one content (Hall–Littlewood by charge)
  shape: (t) => t.map((r) => r.length),
  testParams: [
    { shape: [], content: [] },
    { shape: [3, 2], content: [2, 2, 1] },
    { shape: [2, 2], content: [1, 1, 1, 1] },
    { shape: [3, 1], content: [2, 0, 2] },
    { shape: [2, 1], content: [3] },
    { shape: [3, 2, 1], content: [2, 2, 2] },
    { shape: [3, 2], content: [1, 2, 1, 1] },
  ],
};
