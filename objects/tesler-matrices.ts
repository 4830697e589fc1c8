/**
 * Tesler matrices of size n: upper triangular matrices of non-negative integers whose hook
 * sums a_ii + Σ_{j>i} a_ij − Σ_{j<i} a_ji all equal 1 (Haglund, "A polynomial expression for the
 * Hilbert series of the quotient ring of diagonal coinvariants", Adv. Math. 227 (2011)).
 * Row i spreads 1 + (what flows into column i from above) over a_ii, a_i,i+1, …, a_in.
 * No closed count is known; count() runs that recursion on the amounts flowing into the
 * later columns (memoized). Order: rows top-down, each row's entries lexicographic.
 */
import type { Family, ParamSpec, Params } from '../src/enumerate/plugin.js';
import { intParam, validateBySpec } from './support/params.js';
import { weightedIndex } from './support/random.js';
import type { TeslerMatrix } from './types.js';

const ID = 'tesler-matrices';
// n = 8 has 2 766 572 matrices; n = 9 about 10^8.
const PARAMS: readonly ParamSpec[] = [{ name: 'n', kind: 'int', description: 'size n (n × n matrices)', min: 1, max: 8 }];
const validate = (params: Params): void => validateBySpec(ID, PARAMS, params);

/** Every way to write `total` as an ordered sum of `parts` non-negative integers. */
function* weakCompositions(total: number, parts: number): Generator<number[]> {
  if (parts === 1) {
    yield [total];
    return;
  }
  for (let first = total; first >= 0; first--) for (const rest of weakCompositions(total - first, parts - 1)) yield [first, ...rest];
}

const memo = new Map<string, bigint>();

/** Completions from row i, given the amounts inflow[j] already flowing into columns j ≥ i. */
function completions(n: number, i: number, inflow: readonly number[]): bigint {
  if (i === n) return 1n;
  const key = `${n}:${i}:${inflow.slice(i).join(',')}`;
  let v = memo.get(key);
  if (v === undefined) {
    v = 0n;
    for (const row of weakCompositions(1 + inflow[i]!, n - i)) v += completions(n, i + 1, inflow.map((x, j) => (j > i ? x + row[j - i]! : x)));
    memo.set(key, v);
  }
  return v;
}

export const teslerMatrices: Family<TeslerMatrix> = {
  id: ID,
  description: 'Tesler matrices of size n (upper triangular, non-negative, all hook sums 1)',
  source: 'Haglund, Adv. Math. 227 (2011); Mészáros–Morales–Rhoades, "The polytope of Tesler matrices", Selecta Math. 23 (2017)',
  params: PARAMS,
  validate,
  *generate(params) {
    validate(params);
    const n = intParam(params, 'n');
    const a = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    function* row(i: number): Generator<TeslerMatrix> {
      if (i === n) {
        yield a.map((r) => r.slice());
        return;
      }
      let total = 1;
      for (let j = 0; j < i; j++) total += a[j]![i]!;
      for (const entries of weakCompositions(total, n - i)) {
        entries.forEach((x, t) => (a[i]![i + t] = x));
        yield* row(i + 1);
      }
      a[i]!.fill(0);
    }
    yield* row(0);
  },
  count(params) {
    validate(params);
    const n = intParam(params, 'n');
    return completions(n, 0, new Array<number>(n).fill(0));
  },
  render(m) {
    const w = Math.max(1, ...m.flat().map((x) => String(x).length));
    return m.map((r, i) => r.map((x, j) => (j < i ? '.' : String(x)).padStart(w)).join(' ')).join('\n');
  },
  sample(params, random) {
    validate(params);
    const n = intParam(params, 'n');
    // Row by row, each possible row weighted by its completions: uniform.
    const a = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    let inflow = new Array<number>(n).fill(0);
    for (let i = 0; i < n; i++) {
      const rows = [...weakCompositions(1 + inflow[i]!, n - i)];
      const next = rows.map((r) => inflow.map((x, j) => (j > i ? x + r[j - i]! : x)));
      const pick = weightedIndex(random, next.map((f) => completions(n, i + 1, f)));
      rows[pick]!.forEach((x, t) => (a[i]![i + t] = x));
      inflow = next[pick]!;
    }
    return a;
  },
  key: (m) => m.map((r) => r.join(',')).join('/'),
  testParams: [{ n: 1 }, { n: 2 }, { n: 3 }, { n: 4 }],
};
