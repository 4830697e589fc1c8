/**
 * Identification against the catalogue, through its search entry point as every front end
 * calls it: the seed's Frobenius series over its places, then its Hilbert series by x-degree,
 * as targets. Complete matches (every place checked in the catalogue) become findings: an
 * expression of the library (written so that `gradus sym` evaluates it) and a statistic.
 */
import { searchCatalogue, type ExpressionMatch, type SearchMatch } from '../match/search.js';
import { qSeries } from '../series/series.js';
import { makeTarget, type TargetEntry } from '../series/target.js';
import type { Catalogue } from '../store/catalogue.js';
import { finding, type SweepFinding } from './findings.js';
import type { ModuleData } from './moduleData.js';

function entryOf(d: ModuleData, series: TargetEntry['series']): TargetEntry {
  return { n: d.n, ...(d.k !== undefined ? { k: d.k } : {}), series };
}

function matchFinding(m: SearchMatch, what: string, others: number): SweepFinding {
  const stats = m.statistics.join(' & ');
  return finding(
    'statistic',
    `${what} = ${m.formula}${others > 0 ? ` (and ${others} more match${others === 1 ? '' : 'es'})` : ''}`,
    `equal to the catalogue's distribution of ${stats} on ${m.family} (${m.combine}${m.transform ? ` via ${m.transform}` : ''}, ${m.mapping}, ${m.variant}) on ${m.verified}`,
    m.verifiedEntries,
  );
}

function expressionFinding(m: ExpressionMatch, what: string, others: number): SweepFinding {
  return finding(
    'expression',
    `${what} = ${m.marker ? `Σ_k ${m.marker}·` : ''}${m.expression}${others > 0 ? ` (and ${others} more expression${others === 1 ? '' : 's'})` : ''}`,
    `equal to the expression library's ${m.family} (${m.title}; ${m.specialisation === 'none' ? '' : `${m.specialisation}, `}${m.projection === 'hilbert' ? 'Hilbert series, ' : ''}${m.mapping}, ${m.variant}) on ${m.verified}; at ${m.exampleAt}: gradus sym "${m.example}"; source: ${m.source}`,
    m.verifiedEntries,
  );
}

export function identify(cat: Catalogue, label: string, data: readonly ModuleData[]): SweepFinding[] {
  if (data.length === 0 || cat.maxN() < Math.min(...data.map((d) => d.n))) return [];
  const targets: { what: string; entries: TargetEntry[] }[] = [];
  if (data.every((d) => d.frobenius)) targets.push({ what: 'Frobenius series', entries: data.map((d) => entryOf(d, d.frobenius!)) });
  targets.push({ what: 'Hilbert series by x-degree', entries: data.map((d) => entryOf(d, qSeries(d.byX))) });
  // the first target (the finer one) that gives an expression, and the first that gives a statistic
  let expression: SweepFinding | undefined;
  let statistic: SweepFinding | undefined;
  for (const t of targets) {
    if (expression && statistic) break;
    const outcome = searchCatalogue(cat, makeTarget(`${label}: ${t.what}`, t.entries));
    const expressions = outcome.expressions.filter((m) => m.complete);
    const complete = outcome.matches.filter((m) => m.complete);
    if (!expression && expressions.length > 0) expression = expressionFinding(expressions[0]!, t.what, expressions.length - 1);
    if (!statistic && complete.length > 0) statistic = matchFinding(complete[0]!, t.what, complete.length - 1);
  }
  return [...(expression ? [expression] : []), ...(statistic ? [statistic] : [])];
}
