/**
 * Labelled Dyck paths with n − k decorated contractible valleys: the valley version of the
 * Delta conjecture (Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc.
 * 370 (2018), its valley conjecture), Δ′_{e_{k−1}} e_n = Σ q^{dinv} t^{area} F_{iDes}.
 * A valley is a row r ≥ 2 whose north step follows an east step (a_r ≤ a_{r−1}); it is
 * contractible when a_r < a_{r−1}, or a_r = a_{r−1} and l_{r−1} < l_r (moving its north step
 * one column left leaves a labelled Dyck path). Order: Dyck paths (lexicographic), then the
 * labellings, then the decorated sets (lexicographic).
 */
import type { Family, Params } from '../src/enumerate/plugin.js';
import { labellings } from './parking-functions.js';
import { subsetsOfSize } from './decorated-dyck-paths.js';
import { decorationCount, decorationParams, valleyRows } from './support/decorations.js';
import { areaSequence, drawDyckPath, firstDyckPath, nextDyckPath } from './support/dyck.js';
import { multinomial } from './support/numbers.js';
import { intParam } from './support/params.js';
import { parkingReadingWord } from './support/parking.js';
import { shuffleInPlace, weightedIndex } from './support/random.js';
import type { DyckPath, ValleyDecoratedLabelledDyckPath } from './types.js';

const ID = 'valley-decorated-dyck-paths';
// n = 8 has up to 12 million objects per k (as the rise version); 7 keeps a unit under 600 000.
const PARAMS = decorationParams(7, 'contractible valleys');
const decorations = (params: Params): number => decorationCount(ID, PARAMS, params);

/** The contractible valleys (1-based rows) of a labelled path. */
export function contractibleValleys(path: DyckPath, labels: readonly number[]): number[] {
  const a = areaSequence(path);
  return valleyRows(path).filter((r) => a[r - 1]! < a[r - 2]! || labels[r - 2]! < labels[r - 1]!);
}

/**
 * The rows grouped into intervals whose labels must increase upwards when the valleys D are
 * contractible: each run of north steps, and two runs joined where a valley of D has a_r = a_{r−1}.
 */
function mergedGroups(path: DyckPath, decorated: readonly number[]): number[] {
  const a = areaSequence(path);
  const joins = new Set(decorated.filter((r) => a[r - 1] === a[r - 2]));
  const valleys = new Set(valleyRows(path));
  const sizes: number[] = [];
  for (let r = 1; r <= a.length; r++) {
    if (r === 1 || (valleys.has(r) && !joins.has(r))) sizes.push(1);
    else sizes[sizes.length - 1]!++;
  }
  return sizes;
}

const cache = new Map<string, { paths: (0 | 1)[][]; weights: bigint[]; sets: number[][][]; setWeights: bigint[][] }>();

/** Each Dyck path with its decorated sets D (|D| = d) and their numbers of labellings. */
function weighted(n: number, d: number) {
  const key = `${n}:${d}`;
  let hit = cache.get(key);
  if (!hit) {
    hit = { paths: [], weights: [], sets: [], setWeights: [] };
    const path = firstDyckPath(n);
    do {
      const sets = [...subsetsOfSize(valleyRows(path), d)];
      const ws = sets.map((D) => multinomial(mergedGroups(path, D)));
      const total = ws.reduce((x, y) => x + y, 0n);
      if (total === 0n) continue;
      hit.paths.push(path.slice());
      hit.weights.push(total);
      hit.sets.push(sets);
      hit.setWeights.push(ws);
    } while (nextDyckPath(path));
    cache.set(key, hit);
  }
  return hit;
}

export const valleyDecoratedDyckPaths: Family<ValleyDecoratedLabelledDyckPath> = {
  id: ID,
  description: 'labelled Dyck paths with n − k decorated contractible valleys (valley version of the Delta conjecture)',
  source: 'Haglund–Remmel–Wilson, "The Delta Conjecture", Trans. Amer. Math. Soc. 370 (2018), valley version',
  params: PARAMS,
  validate: (params) => void decorations(params),
  *generate(params) {
    const d = decorations(params);
    const path = firstDyckPath(intParam(params, 'n'));
    do {
      const frozen = path.slice();
      for (const labels of labellings(frozen)) {
        const frozenLabels = labels.slice();
        for (const decorated of subsetsOfSize(contractibleValleys(frozen, frozenLabels), d)) yield { path: frozen, labels: frozenLabels, decorated };
      }
    } while (nextDyckPath(path));
  },
  count(params) {
    const d = decorations(params);
    return weighted(intParam(params, 'n'), d).weights.reduce((a, b) => a + b, 0n);
  },
  render: (p) => drawDyckPath(p.path, p.labels, new Set(p.decorated)),
  sample(params, random) {
    const d = decorations(params);
    // A path by its weight, a decorated set by its labellings, then a uniform labelling of
    // the merged groups (cars increasing up each group): uniform overall.
    const w = weighted(intParam(params, 'n'), d);
    const i = weightedIndex(random, w.weights);
    const path = w.paths[i]!;
    const decorated = w.sets[i]![weightedIndex(random, w.setWeights[i]!)]!;
    const sizes = mergedGroups(path, decorated);
    const n = path.length / 2;
    const cars = shuffleInPlace(Array.from({ length: n }, (_, c) => c + 1), random);
    const labels: number[] = [];
    let at = 0;
    for (const s of sizes) {
      labels.push(...cars.slice(at, at + s).sort((x, y) => x - y));
      at += s;
    }
    return { path: path.slice(), labels, decorated: decorated.slice() };
  },
  key: (p) => `${p.path.map((s) => (s === 1 ? 'N' : 'E')).join('')}:${p.labels.join(',')}:${p.decorated.join(',')}`,
  readingWord: parkingReadingWord,
  testParams: [{ n: 1, k: 1 }, { n: 2, k: 1 }, { n: 3, k: 3 }, { n: 3, k: 2 }, { n: 4, k: 3 }, { n: 4, k: 2 }, { n: 4, k: 1 }],
};
