/**
 * Standard fillings of a diagram μ (French: rows[0] is the bottom row, of length μ_1):
 * the entries 1..n each once, no increase condition — the n! fillings of the
 * Haglund–Haiman–Loehr formula for H̃_μ (J. Amer. Math. Soc. 18 (2005)). Streamed by writing the
 * permutations of 1..n (lexicographic) into the cells row by row from the bottom.
 */
import { factorial } from '../src/core/integers.js';
import type { Partition } from '../src/core/partitions.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { nextPermutationFrom } from './permutations.js';
import { drawRows } from './support/diagram.js';
import { visitRearrangements } from './support/multiset-visit.js';
import { listParam, validateBySpec } from './support/params.js';
import { shuffleInPlace } from './support/random.js';
import type { Filling } from './types.js';

const PARAMS: readonly ParamSpec[] = [{ name: 'shape', kind: 'partition', description: 'the diagram μ (rows bottom-up, French)', min: 0, max: 12 }];
const validate = (params: Params): void => validateBySpec('fillings', PARAMS, params);

function fill(shape: Partition, w: readonly number[]): Filling {
  let at = 0;
  return { shape, rows: shape.map((len) => w.slice(at, (at += len))) };
}

/**
 * The reading word of the filling formula: rows from top to bottom, each left to right.
 * H̃_μ = Σ q^inv t^maj F_{iDes(word)} over standard fillings (Haglund–
 * Haiman–Loehr 2005); with μ = (2) this gives s_2 + q s_11, with μ = (1,1) s_2 + t s_11.
 */
export function fillingReadingWord(f: Filling): number[] {
  return [...f.rows].reverse().flat();
}

export const fillings: Family<Filling> = {
  id: 'fillings',
  description: 'standard fillings of a diagram μ (French), n! of them, for the Macdonald filling formula',
  source: 'Haglund–Haiman–Loehr, J. Amer. Math. Soc. 18 (2005)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const shape = listParam(params, 'shape');
    const w = Array.from({ length: shape.reduce((a, b) => a + b, 0) }, (_, i) => i + 1);
    do yield fill(shape, w);
    while (nextPermutationFrom(w, 0));
  },
  visit(params, f, shard) {
    validate(params);
    const shape = listParam(params, 'shape');
    const rows = shape.map((len) => new Array<number>(len).fill(0));
    const obj: Filling = { shape, rows };
    const n = shape.reduce((a, b) => a + b, 0);
    visitRearrangements(Array.from({ length: n }, (_, i) => i + 1), (w) => {
      let at = 0;
      for (const row of rows) for (let c = 0; c < row.length; c++) row[c] = w[at++]!;
      f(obj);
    }, shard);
  },
  count(params) {
    validate(params);
    return factorial(listParam(params, 'shape').reduce((a, b) => a + b, 0));
  },
  render: (f) => drawRows([...f.rows].reverse()),
  sample(params, random) {
    validate(params);
    const shape = listParam(params, 'shape');
    return fill(shape, shuffleInPlace(Array.from({ length: shape.reduce((a, b) => a + b, 0) }, (_, i) => i + 1), random));
  },
  key: (f) => `${f.shape.join(',')}:${f.rows.map((r) => r.join(',')).join('/')}`,
  readingWord: fillingReadingWord,
  testParams: [{ shape: [] }, { shape: [2] }, { shape: [1, 1] }, { shape: [2, 1] }, { shape: [3, 1, 1] }],
};
