/**
 * Labelled Dyck paths of size n with decorated double rises, for the rise version of the
 * Delta theorem (Haglund–Remmel–Wilson, The Delta Conjecture, Trans. Amer. Math. Soc. 370
 * (2018)): Δ'_{e_{k−1}} e_n sums over those with n − k decorations.
 * Give k (1..n, as in Δ'_{e_{k−1}} e_n and the superspace modules δ_{n,k}) or the number of
 * decorations d = n − k (0..n−1). A double rise is a row r ≥ 2 whose north step follows
 * the north step of row r−1. Order: Dyck paths (lexicographic), then the decorated sets
 * (lexicographic), then the labellings.
 * Fast path: `visit` reuses the label buffer; shards take whole Dyck paths, balanced by their weights.
 */
import { binomial } from '../src/core/integers.js';
import { InputError } from '../src/core/errors.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { labellings } from './parking-functions.js';
import { drawDyckPath, firstDyckPath, nextDyckPath } from './support/dyck.js';
import { multinomial } from './support/numbers.js';
import { intParam, optIntParam, validateBySpec } from './support/params.js';
import { shardParts } from './support/shards.js';
import { labelRuns, northRuns, parkingReadingWord } from './support/parking.js';
import { shuffleInPlace, weightedIndex } from './support/random.js';
import type { DecoratedLabelledDyckPath, DyckPath } from './types.js';

const ID = 'decorated-dyck-paths';
const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'size n (number of cars)', min: 1, max: 10 },
  { name: 'k', kind: 'int', description: 'k of Δ′_{e_{k−1}} e_n (1..n): n − k decorated double rises', min: 1, max: 10, optional: true },
  { name: 'd', kind: 'int', description: 'number of decorated double rises d = n − k (0..n−1)', min: 0, max: 9, optional: true },
];

/** The number of decorations asked for (validates). */
function decorations(params: Params): number {
  validateBySpec(ID, PARAMS, params);
  const n = intParam(params, 'n');
  const k = optIntParam(params, 'k');
  const d = optIntParam(params, 'd');
  if (k === undefined && d === undefined) throw new InputError(`${ID} needs k (1..${n}) or d, the number of decorations (0..${n - 1})`, 'k');
  if (k !== undefined && k > n) throw new InputError(`${ID}: k must be at most n = ${n} (got ${k})`, 'k');
  if (d !== undefined && d > n - 1) throw new InputError(`${ID}: d must be at most n − 1 = ${n - 1} (got ${d})`, 'd');
  if (k !== undefined && d !== undefined && k + d !== n) throw new InputError(`${ID}: k and d must satisfy k + d = n (got k=${k}, d=${d})`, 'd');
  return d ?? n - k!;
}

/** The double rises of a path: rows r (1-based, r ≥ 2) whose north step follows row r−1's. */
export function doubleRises(path: DyckPath): number[] {
  const out: number[] = [];
  let row = 0;
  for (let i = 0; i < path.length; i++) {
    if (path[i] !== 1) continue;
    row++;
    if (i > 0 && path[i - 1] === 1) out.push(row);
  }
  return out;
}

/** Streams the d-element subsets of items (fresh arrays, lexicographic by position). */
export function* subsetsOfSize<T>(items: readonly T[], d: number): Generator<T[]> {
  if (d > items.length) return;
  const idx = Array.from({ length: d }, (_, i) => i);
  for (;;) {
    yield idx.map((i) => items[i]!);
    let i = d - 1;
    while (i >= 0 && idx[i] === items.length - d + i) i--;
    if (i < 0) return;
    idx[i]!++;
    for (let j = i + 1; j < d; j++) idx[j] = idx[j - 1]! + 1;
  }
}

/** Weight of a Dyck path: its labellings times its choices of decorated rises. */
function weight(path: DyckPath, d: number): bigint {
  return multinomial(northRuns(path)) * binomial(doubleRises(path).length, d);
}

const weightCache = new Map<string, { paths: (0 | 1)[][]; weights: bigint[] }>();

/** The Dyck paths of size n with their weights for d decorations (cached: C_n ≤ 16796 entries). */
function weightedPaths(n: number, d: number): { paths: (0 | 1)[][]; weights: bigint[] } {
  const key = `${n}:${d}`;
  let hit = weightCache.get(key);
  if (!hit) {
    hit = { paths: [], weights: [] };
    const path = firstDyckPath(n);
    do {
      const w = weight(path, d);
      if (w > 0n) {
        hit.paths.push(path.slice());
        hit.weights.push(w);
      }
    } while (nextDyckPath(path));
    weightCache.set(key, hit);
  }
  return hit;
}

/** Which shard takes each weighted path: largest first, each to the least loaded shard (the same plan everywhere). */
function owners(weights: readonly bigint[], count: number): Uint16Array {
  const order = weights.map((_, i) => i).sort((a, b) => (weights[b]! > weights[a]! ? 1 : weights[b]! < weights[a]! ? -1 : a - b));
  const load = new Array<bigint>(count).fill(0n);
  const owner = new Uint16Array(weights.length);
  for (const i of order) {
    let target = 0;
    for (let s = 1; s < count; s++) if (load[s]! < load[target]!) target = s;
    load[target]! += weights[i]!;
    owner[i] = target;
  }
  return owner;
}

export const decoratedDyckPaths: Family<DecoratedLabelledDyckPath> = {
  id: ID,
  description: 'labelled Dyck paths with n − k decorated double rises (rise version of the Delta theorem)',
  source: 'Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018)',
  params: PARAMS,
  validate: (params) => void decorations(params),
  *generate(params) {
    const d = decorations(params);
    const path = firstDyckPath(intParam(params, 'n'));
    do {
      const frozen = path.slice();
      for (const decorated of subsetsOfSize(doubleRises(frozen), d)) {
        for (const labels of labellings(frozen)) yield { path: frozen, labels: labels.slice(), decorated };
      }
    } while (nextDyckPath(path));
  },
  visit(params, f, shard) {
    const d = decorations(params);
    const [index, count] = shardParts(shard);
    const { paths, weights } = weightedPaths(intParam(params, 'n'), d);
    const owner = count === 1 ? undefined : owners(weights, count);
    paths.forEach((path, j) => {
      if (owner && owner[j] !== index) return;
      for (const decorated of subsetsOfSize(doubleRises(path), d)) {
        const obj = { path, labels: [] as number[], decorated };
        for (const labels of labellings(path)) {
          obj.labels = labels;
          f(obj);
        }
      }
    });
  },
  count(params) {
    const d = decorations(params);
    return weightedPaths(intParam(params, 'n'), d).weights.reduce((a, b) => a + b, 0n);
  },
  render: (p) => drawDyckPath(p.path, p.labels, new Set(p.decorated)),
  sample(params, random) {
    const d = decorations(params);
    // A path by its weight, then a uniform labelling and decorated set: uniform overall.
    const { paths, weights } = weightedPaths(intParam(params, 'n'), d);
    const chosen = paths[weightedIndex(random, weights)]!;
    const runs = northRuns(chosen);
    const runOf = shuffleInPlace(runs.flatMap((len, j) => new Array<number>(len).fill(j)), random);
    const runStart = runs.map((_, j) => runs.slice(0, j).reduce((a, b) => a + b, 0));
    const labels = new Array<number>(runOf.length).fill(0);
    labelRuns(runOf, runStart, new Array<number>(runs.length).fill(0), labels);
    const decorated = shuffleInPlace(doubleRises(chosen), random)
      .slice(0, d)
      .sort((a, b) => a - b);
    return { path: chosen.slice(), labels, decorated };
  },
  key: (p) => `${p.path.map((s) => (s === 1 ? 'N' : 'E')).join('')}:${p.labels.join(',')}:${p.decorated.join(',')}`,
  readingWord: parkingReadingWord,
  testParams: [{ n: 1, k: 1 }, { n: 3, k: 3 }, { n: 3, k: 2 }, { n: 4, d: 1 }, { n: 4, k: 2 }, { n: 4, k: 1 }],
};

