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

/**
 * A first parameter set to show: the largest test set with at most `max` objects on which
 * the first statistics shown (`stats`, the first two) are defined — a statistic such as
 * charge needs a partition content, so a set where it fails is not the one a screen opens on.
 */
export function defaultParams(family: Family<unknown>, max = 5000n, stats: readonly Statistic<unknown>[] = []): Params {
  const sized: { p: Params; count: bigint }[] = [];
  for (const p of family.testParams) {
    try {
      const c = family.count(p);
      if (c <= max) sized.push({ p, count: c });
    } catch {
      // A test set the family refuses is simply not offered.
    }
  }
  sized.sort((x, y) => (y.count > x.count ? 1 : y.count < x.count ? -1 : 0));
  const shown = stats.slice(0, 2);
  const works = (p: Params): boolean => {
    try {
      let seen = 0;
      for (const obj of family.generate(p)) {
        for (const s of shown) s.compute(obj);
        if (++seen >= 3) break;
      }
      return true;
    } catch {
      return false;
    }
  };
  return (sized.find((x) => works(x.p)) ?? sized[0])?.p ?? family.testParams[0] ?? {};
}
