/**
 * The families and statistics the screens offer: the registries of objects/ and
 * statistics/, exactly as the command line lists them.
 */
import { FAMILIES } from '../../../objects/index.js';
import { STATISTICS } from '../../../statistics/index.js';
import type { Family, Params, Statistic } from '../../enumerate/plugin.js';

export interface Catalog {
  readonly families: readonly Family<unknown>[];
  readonly statistics: readonly Statistic<unknown>[];
}

/** Undefined when the registries are not part of this build. */
export function loadCatalog(): Catalog | undefined {
  return FAMILIES.length ? { families: FAMILIES, statistics: STATISTICS } : undefined;
}

export function statisticsOf(catalog: Catalog, familyId: string): readonly Statistic<unknown>[] {
  return catalog.statistics.filter((s) => s.family === familyId);
}

/** A first parameter set to show: the largest test set with at most `max` objects. */
export function defaultParams(family: Family<unknown>, max = 5000n): Params {
  let best: Params | undefined;
  let bestCount = -1n;
  for (const p of family.testParams) {
    try {
      const c = family.count(p);
      if (c <= max && c > bestCount) {
        best = p;
        bestCount = c;
      }
    } catch {
      // A test set the family refuses is simply not offered.
    }
  }
  return best ?? family.testParams[0] ?? {};
}
