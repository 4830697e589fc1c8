/**
 * The two unlabelled decorated Dyck path families (decorated double rises, decorated
 * valleys) differ only in which rows may carry a decoration; this builds either one.
 * A path with p peaks has n − p double rises and p − 1 valleys, so both counts are
 * Σ_p N(n, p)·C(rows, d) with Narayana numbers N(n, p).
 */
import { binomial } from '../../src/core/integers.js';
import type { Family, ParamSpec, Params } from '../../src/enumerate/plugin.js';
import { subsetsOfSize } from '../decorated-dyck-paths.js';
import type { DecoratedDyckPath, DyckPath } from '../types.js';
import { decorationCount } from './decorations.js';
import { drawDyckPath, firstDyckPath, nextDyckPath } from './dyck.js';
import { narayana, randomDyckPathWithPeaks } from './dyck-peaks.js';
import { intParam } from './params.js';
import { shuffleInPlace, weightedIndex } from './random.js';

export interface DecoratedKind {
  readonly id: string;
  readonly description: string;
  readonly source: string;
  readonly params: readonly ParamSpec[];
  /** The rows that may be decorated. */
  readonly rows: (path: DyckPath) => number[];
  /** How many such rows a path with p peaks (of semilength n) has. */
  readonly rowsOfPeaks: (n: number, p: number) => number;
}

export function decoratedUnlabelledFamily(kind: DecoratedKind): Family<DecoratedDyckPath> {
  const decorations = (params: Params): number => decorationCount(kind.id, kind.params, params);
  const peakWeights = (n: number, d: number): bigint[] => Array.from({ length: n + 1 }, (_, p) => narayana(n, p) * binomial(Math.max(0, kind.rowsOfPeaks(n, p)), d));
  return {
    id: kind.id,
    description: kind.description,
    source: kind.source,
    params: kind.params,
    validate: (params) => void decorations(params),
    *generate(params) {
      const d = decorations(params);
      const path = firstDyckPath(intParam(params, 'n'));
      do {
        const frozen = path.slice();
        for (const decorated of subsetsOfSize(kind.rows(frozen), d)) yield { path: frozen, decorated };
      } while (nextDyckPath(path));
    },
    count(params) {
      const d = decorations(params);
      return peakWeights(intParam(params, 'n'), d).reduce((a, b) => a + b, 0n);
    },
    render: (p) => drawDyckPath(p.path, undefined, new Set(p.decorated)),
    sample(params, random) {
      const d = decorations(params);
      const n = intParam(params, 'n');
      // Peaks by their weight, a uniform path with that many peaks, a uniform set of rows.
      const path = randomDyckPathWithPeaks(n, weightedIndex(random, peakWeights(n, d)), random);
      const decorated = shuffleInPlace(kind.rows(path), random).slice(0, d).sort((a, b) => a - b);
      return { path, decorated };
    },
    key: (p) => `${p.path.map((s) => (s === 1 ? 'N' : 'E')).join('')}:${p.decorated.join(',')}`,
    testParams: [{ n: 1, k: 1 }, { n: 3, k: 3 }, { n: 3, k: 2 }, { n: 4, k: 3 }, { n: 4, k: 2 }, { n: 5, k: 2 }, { n: 6, k: 1 }],
  };
}
