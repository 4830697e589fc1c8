/**
 * A target over n whose second grading (t, or the last axis of a table with three) may be a
 * marking variable: f(n) = Σ_j t^j g(n, j). Read apart, the entry (n, k = n − j) is the
 * coefficient g(n, j), and a family over (n, k) matches the union when it matches every slice
 * (its parameter mapping then also covers t^k and t^{k−1}). Slices j = 0..n are all entries,
 * zero ones included, so that the union holds nothing the target lacks.
 */
import { Poly } from '../core/poly.js';
import { qtSeries, schurSeries, type Series } from '../series/series.js';
import { makeTarget, type Target, type TargetEntry } from '../series/target.js';

export interface MarkedReading {
  readonly target: Target;
  readonly marker: string;
}

const AXIS_NAMES: Readonly<Record<string, string>> = { theta: 'θ', x: 'x', y: 'y' };

/** The coefficient of t^j of a polynomial, as a polynomial in q. */
function polySlice(p: Poly, j: number): Poly {
  return Poly.fromTerms([...p.terms()].filter(([, b]) => b === j).map(([a, , c]) => [a, 0, c] as const));
}

/** The slices of one series by its marking grading, or undefined when it has none. */
function slicesOf(s: Series): { slices: (j: number) => Series; top: number } | undefined {
  // an entry without t (n = 1, say) is its own slice j = 0
  if (s.kind === 'q') return { slices: (j) => qtSeries(j === 0 ? s.poly : Poly.zero), top: 0 };
  if (s.kind === 'qt') return { slices: (j) => qtSeries(polySlice(s.poly, j)), top: s.poly.degT() };
  if (s.kind === 'schur') {
    const top = Math.max(0, ...[...s.terms.values()].map((c) => c.degT()));
    return { slices: (j) => schurSeries([...s.terms].map(([l, c]) => [l, polySlice(c, j)] as const)), top };
  }
  if (s.kind === 'multi' && s.axes.length === 3) {
    const exps = [...s.terms.keys()].map((k) => k.split(',').map(Number));
    const top = Math.max(0, ...exps.map((e) => e[2]!));
    return {
      top,
      slices: (j) => qtSeries(Poly.fromTerms([...s.terms].map(([k, c]) => [k.split(',').map(Number), c] as const).filter(([e]) => e[2] === j).map(([e, c]) => [e[0]!, e[1]!, c] as const))),
    };
  }
  return undefined;
}

export function markedReading(t: Target): MarkedReading | undefined {
  if (t.marked || t.entries.some((e) => e.k !== undefined)) return undefined;
  const first = t.entries[0]?.series;
  const axis = first?.kind === 'multi' ? (AXIS_NAMES[first.axes[2]!] ?? first.axes[2]!) : 't';
  const entries: TargetEntry[] = [];
  let marked = false;
  for (const e of t.entries) {
    const s = slicesOf(e.series);
    if (!s || s.top > e.n) return undefined;
    if (s.top > 0) marked = true;
    for (let j = 0; j <= e.n; j++) entries.push({ n: e.n, k: e.n - j, series: s.slices(j) });
  }
  if (!marked) return undefined;
  const marker = `${axis}^{n−k}`;
  return { target: makeTarget(`${t.label}, read as Σ_k ${marker}·F(n, k)`, entries, marker), marker };
}
