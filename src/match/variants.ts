/**
 * The target's own variants tried by the search: as given, q-reversed, ω (Frobenius
 * series), q and t swapped (series in q and t), and their compositions.
 */
import { seriesIsUnivariate } from '../series/series.js';
import { omegaSeries, reverseSeries, swapSeries } from '../series/seriesOps.js';
import type { Target } from '../series/target.js';

export interface Variant {
  readonly id: string;
  readonly description: string;
  readonly target: Target;
}

export function variantsOf(t: Target): Variant[] {
  const map = (f: (s: Target['entries'][number]['series']) => Target['entries'][number]['series']): Target => ({
    ...t,
    entries: t.entries.map((e) => ({ ...e, series: f(e.series) })),
  });
  const out: Variant[] = [{ id: 'as-given', description: 'the target as given', target: t }];
  const univariate = t.entries.every((e) => seriesIsUnivariate(e.series));
  if (t.kind === 'q' || t.kind === 'qt') {
    if (univariate) out.push({ id: 'q-reversed', description: 'q^deg f(1/q) of each entry', target: map(reverseSeries) });
    else {
      out.push({ id: 'q-t-swapped', description: 'q and t exchanged', target: map(swapSeries) });
      out.push({ id: 'q-reversed', description: 'q^deg_q f(1/q, t) of each entry', target: map(reverseSeries) });
    }
  }
  if (t.kind === 'schur') {
    out.push({ id: 'omega', description: 'ω applied (s_λ → s_λ\')', target: map(omegaSeries) });
    out.push({ id: 'q-reversed', description: 'q-reversed (whole Frobenius series of each entry)', target: map(reverseSeries) });
    out.push({ id: 'omega-q-reversed', description: 'ω and q-reversed', target: map((s) => reverseSeries(omegaSeries(s))) });
    if (!univariate) {
      out.push({ id: 'q-t-swapped', description: 'q and t exchanged', target: map(swapSeries) });
      out.push({ id: 'omega-q-t-swapped', description: 'ω with q and t exchanged', target: map((s) => swapSeries(omegaSeries(s))) });
    }
  }
  return out;
}
