/**
 * Identification against the catalogue, through its search entry point as every front end
 * calls it: the seed's Frobenius series over its places, then its Hilbert series by x-degree,
 * as targets. Complete matches (every place checked in the catalogue) become findings; what
 * the search adds later (expressions) arrives through the same call.
 */
import { searchCatalogue, type SearchMatch } from '../match/search.js';
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

export function identify(cat: Catalogue, label: string, data: readonly ModuleData[]): SweepFinding[] {
  if (data.length === 0 || cat.maxN() < Math.min(...data.map((d) => d.n))) return [];
  const targets: { what: string; entries: TargetEntry[] }[] = [];
  if (data.every((d) => d.frobenius)) targets.push({ what: 'Frobenius series', entries: data.map((d) => entryOf(d, d.frobenius!)) });
  targets.push({ what: 'Hilbert series by x-degree', entries: data.map((d) => entryOf(d, qSeries(d.byX))) });
  for (const t of targets) {
    const outcome = searchCatalogue(cat, makeTarget(`${label}: ${t.what}`, t.entries));
    const complete = outcome.matches.filter((m) => m.complete);
    if (complete.length > 0) return [matchFinding(complete[0]!, t.what, complete.length - 1)];
  }
  return [];
}
