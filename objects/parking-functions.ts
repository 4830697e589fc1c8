/**
 * Parking functions of size n as labelled Dyck paths: for each Dyck path (lexicographic),
 * every way to put cars 1..n on its north steps increasing up each column. Car c lies in
 * column j exactly when c prefers spot j (0-based): the classical bijection.
 * Fast path: `visit` reuses the path and label buffers; shards take whole Dyck paths, balanced by their numbers of labellings.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { nextPermutationFrom } from './permutations.js';
import { drawDyckPath, firstDyckPath, nextDyckPath } from './support/dyck.js';
import { multinomial } from './support/numbers.js';
import { intParam, validateBySpec } from './support/params.js';
import { shardParts } from './support/shards.js';
import { labelRuns, northRuns, parkingReadingWord, randomParkingFunction } from './support/parking.js';
import type { DyckPath, LabelledDyckPath } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'size n (number of cars)', min: 0, max: 12 }];
const validate = (params: Params): void => validateBySpec('parking-functions', PARAMS, params);

/** Streams the labellings of the path; the yielded array is reused between steps. */
export function* labellings(path: DyckPath): Generator<number[]> {
  const runs = northRuns(path);
  const runStart: number[] = [];
  let row = 0;
  for (const len of runs) {
    runStart.push(row);
    row += len;
  }
  const runOf: number[] = [];
  runs.forEach((len, j) => {
    for (let i = 0; i < len; i++) runOf.push(j);
  });
  const fill = new Array<number>(runs.length).fill(0);
  const labels = new Array<number>(row).fill(0);
  do {
    labelRuns(runOf, runStart, fill, labels);
    yield labels;
  } while (nextPermutationFrom(runOf, 0));
}

/**
 * Which shard takes each Dyck path (in generation order): paths weighted by their number
 * of labellings, largest first, each to the least loaded shard — the same plan everywhere.
 */
function pathOwners(n: number, count: number): Uint16Array {
  const weights: number[] = [];
  const path = firstDyckPath(n);
  do weights.push(Number(multinomial(northRuns(path))));
  while (nextDyckPath(path));
  const order = weights.map((_, i) => i).sort((a, b) => weights[b]! - weights[a]! || a - b);
  const load = new Array<number>(count).fill(0);
  const owner = new Uint16Array(weights.length);
  for (const i of order) {
    let target = 0;
    for (let s = 1; s < count; s++) if (load[s]! < load[target]!) target = s;
    load[target]! += weights[i]!;
    owner[i] = target;
  }
  return owner;
}

export const parkingFunctions: Family<LabelledDyckPath> = {
  id: 'parking-functions',
  description: 'parking functions of size n, as Dyck paths with cars 1..n increasing up each column',
  source: 'standard (Haglund, The q,t-Catalan numbers and the space of diagonal harmonics, ch. 5); (n+1)^(n−1) by Konheim–Weiss',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const path = firstDyckPath(intParam(params, 'n'));
    do {
      const frozen = path.slice();
      for (const labels of labellings(frozen)) yield { path: frozen, labels: labels.slice() };
    } while (nextDyckPath(path));
  },
  visit(params, f, shard) {
    validate(params);
    const [index, count] = shardParts(shard);
    const n = intParam(params, 'n');
    const owner = count === 1 ? undefined : pathOwners(n, count);
    const path = firstDyckPath(n);
    let j = 0;
    do {
      if (owner && owner[j++] !== index) continue;
      const obj = { path, labels: [] as number[] };
      for (const labels of labellings(path)) {
        obj.labels = labels;
        f(obj);
      }
    } while (nextDyckPath(path));
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    return n === 0 ? 1n : BigInt(n + 1) ** BigInt(n - 1);
  },
  render: (p) => drawDyckPath(p.path, p.labels),
  sample(params, random) {
    validate(params);
    return randomParkingFunction(intParam(params, 'n'), random);
  },
  key: (p) => `${p.path.map((s) => (s === 1 ? 'N' : 'E')).join('')}:${p.labels.join(',')}`,
  readingWord: parkingReadingWord,
  testParams: [{ n: 0 }, { n: 1 }, { n: 3 }, { n: 4 }],
};
