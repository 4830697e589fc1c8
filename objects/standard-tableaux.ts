/**
 * Standard Young tableaux (English): of one shape λ (param shape), or of every shape of
 * size n (param n; shapes in reverse lexicographic order). Exactly one of the two is given.
 * Within a shape, tableaux come in lexicographic order of the word "row of 1, row of 2, …".
 * Fast path: `visit` steps one tableau in place (SytWalk); shards deal tableaux round-robin.
 */
import { InputError } from '../src/core/errors.js';
import { partitions as streamPartitions, type Partition } from '../src/core/partitions.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { drawRows } from './support/diagram.js';
import { intParam, listParam, optIntParam, validateBySpec } from './support/params.js';
import { weightedIndex } from './support/random.js';
import { shardParts } from './support/shards.js';
import { SytWalk } from './support/syt-walk.js';
import { randomSyt, rowReadingWord, sytCount } from './support/tableaux.js';
import type { Tableau } from './types.js';

const PARAMS: readonly ParamSpec[] = [
  { name: 'shape', kind: 'partition', description: 'the shape λ (give this or n)', min: 0, max: 40, optional: true },
  { name: 'n', kind: 'int', description: 'size n: every shape of size n (give this or shape)', min: 0, max: 40, optional: true },
];
function validate(params: Params): void {
  validateBySpec('standard-tableaux', PARAMS, params);
  if ((params['shape'] === undefined) === (params['n'] === undefined)) {
    throw new InputError('standard-tableaux needs exactly one of shape (a partition such as 3,1) and n (0..40)', 'shape');
  }
}

/** The shapes the params ask for. */
function shapesOf(params: Params): Iterable<Partition> {
  const n = optIntParam(params, 'n');
  return n === undefined ? [listParam(params, 'shape')] : streamPartitions(n);
}

/** Streams the SYT of one shape (fresh arrays). */
export function* standardTableauxOfShape(shape: Partition): Generator<number[][]> {
  const n = shape.reduce((a, b) => a + b, 0);
  const rows: number[][] = shape.map(() => []);
  function* place(m: number): Generator<number[][]> {
    if (m > n) {
      yield rows.map((r) => r.slice());
      return;
    }
    for (let r = 0; r < shape.length; r++) {
      const len = rows[r]!.length;
      if (len < shape[r]! && (r === 0 || rows[r - 1]!.length > len)) {
        rows[r]!.push(m);
        yield* place(m + 1);
        rows[r]!.pop();
      }
    }
  }
  yield* place(1);
}

export const standardTableaux: Family<Tableau> = {
  id: 'standard-tableaux',
  description: 'standard Young tableaux of a shape λ (--shape), or of every shape of size n (--n)',
  source: 'standard (Stanley, EC2 §7.10; Sagan, The Symmetric Group, ch. 3)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    for (const shape of shapesOf(params)) yield* standardTableauxOfShape(shape);
  },
  visit(params, f, shard) {
    validate(params);
    const [index, count] = shardParts(shard);
    let j = 0;
    for (const shape of shapesOf(params)) {
      const walk = new SytWalk(shape);
      do if (j++ % count === index) f(walk.rows);
      while (walk.next());
    }
  },
  count(params) {
    validate(params);
    let s = 0n;
    for (const shape of shapesOf(params)) s += sytCount(shape);
    return s;
  },
  render: (t) => drawRows(t),
  sample(params, random) {
    validate(params);
    const shapes = [...shapesOf(params)];
    const shape = shapes[weightedIndex(random, shapes.map(sytCount))]!;
    return randomSyt(shape, random);
  },
  key: (t) => t.map((r) => r.join(',')).join('/'),
  readingWord: rowReadingWord,
  shape: (t) => t.map((r) => r.length),
  testParams: [{ n: 0 }, { n: 1 }, { n: 4 }, { n: 6 }, { shape: [3, 2] }, { shape: [2, 2, 1] }, { shape: [4, 2, 1] }, { shape: [] }],
};
