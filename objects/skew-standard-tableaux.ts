/**
 * Standard tableaux of a skew shape λ/μ (English): the cells of λ not in μ filled with
 * 1..n increasing along rows and down columns. Counted by removing outer corners; the tests
 * compare with Aitken's determinant f^{λ/μ} = n!·det[1/(λ_i − μ_j − i + j)!] (Stanley, EC2
 * Cor. 7.16.3, numbering from memory). Order: 1, 2, … placed in the addable cells from the top row down.
 */
import { InputError } from '../src/core/errors.js';
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { listParam, validateBySpec } from './support/params.js';
import { fromGrid, randomSkewTableau, skewCount } from './support/skew.js';
import type { SkewTableau } from './types.js';

const ID = 'skew-standard-tableaux';
const PARAMS: readonly ParamSpec[] = [
  { name: 'outer', kind: 'partition', description: 'the outer shape λ', min: 0, max: 30 },
  { name: 'inner', kind: 'partition', description: 'the inner shape μ ⊆ λ (empty when omitted)', min: 0, max: 29, optional: true },
];

function shapes(params: Params): [number[], number[]] {
  validateBySpec(ID, PARAMS, params);
  const outer = listParam(params, 'outer').slice();
  const inner = params['inner'] === undefined ? [] : listParam(params, 'inner').slice();
  if (inner.length > outer.length || inner.some((x, i) => x > outer[i]!)) {
    throw new InputError(`${ID}: inner must fit inside outer (got inner ${inner.join(',')} and outer ${outer.join(',')})`, 'inner');
  }
  return [outer, inner];
}

export const skewStandardTableaux: Family<SkewTableau> = {
  id: ID,
  description: 'standard tableaux of the skew shape λ/μ (--outer λ, --inner μ)',
  source: 'standard (Stanley, EC2 §7.10 and Cor. 7.16.3; Sagan, The Symmetric Group, ch. 3)',
  params: PARAMS,
  validate: (params) => void shapes(params),
  *generate(params) {
    const [outer, inner] = shapes(params);
    const n = outer.reduce((a, b) => a + b, 0) - inner.reduce((a, b) => a + b, 0);
    const grid = outer.map((len) => new Array<number>(len).fill(0));
    const filled = outer.map((_, r) => inner[r] ?? 0); // columns filled so far in each row
    function* place(m: number): Generator<SkewTableau> {
      if (m > n) {
        yield fromGrid(outer, inner, grid);
        return;
      }
      for (let r = 0; r < outer.length; r++) {
        const c = filled[r]!;
        if (c < outer[r]! && (r === 0 || filled[r - 1]! > c)) {
          grid[r]![c] = m;
          filled[r]!++;
          yield* place(m + 1);
          filled[r]!--;
          grid[r]![c] = 0;
        }
      }
    }
    yield* place(1);
  },
  count(params) {
    const [outer, inner] = shapes(params);
    return skewCount(outer, inner);
  },
  render(t) {
    const all = t.rows.flat();
    if (all.length === 0) return '(empty tableau)';
    const w = Math.max(...all.map((x) => String(x).length));
    return t.rows.map((row, r) => [...new Array<string>(t.inner[r] ?? 0).fill('.'.padStart(w)), ...row.map((x) => String(x).padStart(w))].join(' ')).join('\n');
  },
  sample(params, random) {
    const [outer, inner] = shapes(params);
    return randomSkewTableau(outer, inner, random);
  },
  key: (t) => `${t.outer.join(',')}/${t.inner.join(',')}:${t.rows.map((r) => r.join(',')).join('/')}`,
  // Rows from the bottom up, each left to right: i + 1 precedes i exactly when it lies lower.
  readingWord: (t) => [...t.rows].reverse().flat(),
  testParams: [{ outer: [] }, { outer: [2, 1] }, { outer: [3, 2], inner: [1] }, { outer: [3, 3, 1], inner: [2, 1] }, { outer: [2, 2], inner: [1, 1] }, { outer: [4, 3, 2], inner: [2, 1] }, { outer: [3, 1], inner: [3, 1] }],
};
