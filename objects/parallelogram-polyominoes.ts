/**
 * Parallelogram polyominoes of semiperimeter n (width + height = n): columns of cells, each
 * an interval [bottom, top) of rows, the first starting at row 0, bottoms and tops weakly
 * rising from column to column, consecutive columns sharing an edge. All, or of width k:
 * counted by the Narayana numbers N(n−1, k) = C(n−1,k)·C(n−1,k−1)/(n−1), Catalan(n−1) in all
 * (Delest–Viennot, "Algebraic languages and polyominoes enumeration", Theoret. Comput. Sci. 34
 * (1984); Aval–D'Adderio–Dukes–Hicks–Le Borgne, "Statistics on parallelogram polyominoes and a
 * q,t-analogue of the Narayana numbers", J. Combin. Theory Ser. A 123 (2014)).
 * Order: by width, then column by column (bottom, then top, increasing).
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { narayana } from './support/dyck-peaks.js';
import { checkAtMost, emptyFamilyError, intParam, optIntParam, validateBySpec } from './support/params.js';
import { weightedIndex } from './support/random.js';
import type { ParallelogramPolyomino } from './types.js';

const ID = 'parallelogram-polyominoes';
const PARAMS: readonly ParamSpec[] = [
  { name: 'n', kind: 'int', description: 'semiperimeter n = width + height (2..20)', min: 2, max: 20 },
  { name: 'k', kind: 'int', description: 'width k (1..n−1); any width when omitted', min: 1, max: 19, optional: true },
];
function validate(params: Params): void {
  validateBySpec(ID, PARAMS, params);
  checkAtMost(ID, 'k', optIntParam(params, 'k'), intParam(params, 'n') - 1, 'n − 1');
}
const widths = (params: Params): number[] => {
  const k = optIntParam(params, 'k');
  return k !== undefined ? [k] : Array.from({ length: intParam(params, 'n') - 1 }, (_, i) => i + 1);
};

const memo = new Map<string, bigint>();
/** Completions after column i = [b, t) with w columns in all and height h. */
function completions(w: number, h: number, i: number, b: number, t: number): bigint {
  if (i === w - 1) return t === h ? 1n : 0n;
  const key = `${w},${h},${i},${b},${t}`;
  let v = memo.get(key);
  if (v === undefined) {
    v = 0n;
    for (let b2 = b; b2 < t; b2++) for (let t2 = Math.max(t, b2 + 1); t2 <= h; t2++) v += completions(w, h, i + 1, b2, t2);
    memo.set(key, v);
  }
  return v;
}

export const parallelogramPolyominoes: Family<ParallelogramPolyomino> = {
  id: ID,
  description: 'parallelogram polyominoes of semiperimeter n (width + height), of width k',
  source: 'Delest–Viennot, Theoret. Comput. Sci. 34 (1984); Aval–D\'Adderio–Dukes–Hicks–Le Borgne, J. Combin. Theory Ser. A 123 (2014)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    for (const w of widths(params)) {
      const h = n - w;
      const cols: [number, number][] = [];
      function* column(i: number, b: number, t: number): Generator<ParallelogramPolyomino> {
        if (i === w) {
          if (t === h) yield cols.map((c) => [c[0], c[1]] as const);
          return;
        }
        const b0 = i === 0 ? 0 : b;
        const b1 = i === 0 ? 0 : t - 1;
        for (let b2 = b0; b2 <= b1; b2++) {
          for (let t2 = Math.max(i === 0 ? 1 : t, b2 + 1); t2 <= h; t2++) {
            cols.push([b2, t2]);
            yield* column(i + 1, b2, t2);
            cols.pop();
          }
        }
      }
      yield* column(0, 0, 0);
    }
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    return widths(params).reduce((s, w) => s + narayana(n - 1, w), 0n);
  },
  render(p) {
    const h = p.reduce((m, c) => Math.max(m, c[1]), 0);
    const lines: string[] = [];
    for (let y = h - 1; y >= 0; y--) lines.push(p.map(([b, t]) => (y >= b && y < t ? '#' : '.')).join(''));
    return lines.join('\n') || '(empty)';
  },
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    const ws = widths(params);
    const counts = ws.map((w) => narayana(n - 1, w));
    if (counts.every((c) => c === 0n)) throw emptyFamilyError(ID, params);
    const w = ws[weightedIndex(random, counts)]!;
    const h = n - w;
    // Column by column, each choice weighted by its completions: uniform.
    const out: [number, number][] = [];
    let options: [number, number][] = Array.from({ length: h }, (_, j) => [0, j + 1]);
    for (let i = 0; i < w; i++) {
      const pick = options[weightedIndex(random, options.map(([b, t]) => completions(w, h, i, b, t)))]!;
      out.push(pick);
      const [b, t] = pick;
      options = [];
      for (let b2 = b; b2 < t; b2++) for (let t2 = Math.max(t, b2 + 1); t2 <= h; t2++) options.push([b2, t2]);
    }
    return out;
  },
  key: (p) => p.map(([b, t]) => `${b}-${t}`).join(','),
  testParams: [{ n: 2 }, { n: 3 }, { n: 5 }, { n: 6, k: 3 }, { n: 7, k: 2 }, { n: 6 }],
};
