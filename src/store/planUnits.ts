/**
 * The units a catalogue build fills: every family whose parameters are n (and k), for
 * n = 1..nMax (and k = 1..n), with the family's statistics and those read after each
 * transform leaving the family.
 */
import { FAMILIES } from '../../objects/index.js';
import { transformsFrom } from '../../objects/transforms/index.js';
import { statisticsOfFamily } from '../../statistics/index.js';
import { InputError } from '../core/errors.js';
import { makeProvenance, type Provenance } from '../core/provenance.js';
import { unknownNameMessage } from '../core/suggest.js';
import type { Family } from '../enumerate/plugin.js';
import { tallyStats, type TallyStat } from './tallyUnit.js';

export interface Unit {
  readonly family: Family<unknown>;
  readonly params: Readonly<Record<string, number>>;
  readonly stats: readonly TallyStat[];
  readonly objects: bigint;
}

export interface Plan {
  readonly units: readonly Unit[];
  /** Families left out, with the reason. */
  readonly skipped: readonly { family: string; why: string }[];
}

/**
 * The plan of a build, with every named family checked first: an unknown name or a family the
 * catalogue does not hold is an InputError naming it (never an empty build reported as done).
 */
export function planUnits(nMax: number, only?: readonly string[]): Plan {
  if (only) {
    const all = planOf(nMax);
    for (const id of only) {
      if (!FAMILIES.some((f) => f.id === id)) throw new InputError(`--families: ${unknownNameMessage('family', id, FAMILIES.map((f) => f.id))}`, 'families');
      const left = all.skipped.find((x) => x.family === id);
      if (left) throw new InputError(`--families: ${id} is not catalogued (${left.why})`, 'families');
    }
  }
  return planOf(nMax, only);
}

function planOf(nMax: number, only?: readonly string[]): Plan {
  const units: Unit[] = [];
  const skipped: { family: string; why: string }[] = [];
  for (const family of FAMILIES) {
    if (only && !only.includes(family.id)) continue;
    const names = family.params.filter((p) => !p.optional).map((p) => p.name);
    if (!family.params.some((p) => p.name === 'n') || names.some((x) => x !== 'n' && x !== 'k')) {
      skipped.push({ family: family.id, why: `parameters ${family.params.map((p) => p.name).join(', ')} (the catalogue fills families indexed by n, and k)` });
      continue;
    }
    const stats = statsOfFamily(family);
    if (stats.length === 0) {
      skipped.push({ family: family.id, why: 'no statistics' });
      continue;
    }
    const nSpec = family.params.find((p) => p.name === 'n')!;
    const top = Math.min(nMax, nSpec.max ?? nMax);
    for (let n = Math.max(1, nSpec.min ?? 1); n <= top; n++) {
      const ks: (number | undefined)[] = names.includes('k') ? Array.from({ length: n }, (_, i) => i + 1) : [undefined];
      for (const k of ks) {
        const params: Record<string, number> = k === undefined ? { n } : { n, k };
        try {
          family.validate(params);
        } catch {
          continue;
        }
        units.push({ family, params, stats, objects: family.count(params) });
      }
    }
  }
  return { units, skipped };
}

/** The statistics tallied for a family: its own, then each one read after a transform. */
export function statsOfFamily(family: Family<unknown>): TallyStat[] {
  const own = statisticsOfFamily(family.id);
  const via = transformsFrom(family.id).map((t) => ({ t, stats: statisticsOfFamily(t.to) })).filter((x) => x.stats.length > 0);
  return tallyStats(family, own, via);
}

/** The statistics of a unit as one text (a change of the registry makes units stale). */
export function statsSignature(u: Unit): string {
  return u.stats.map((s) => s.id).join(',');
}

/** Provenance of a unit's rows: the unit, how it was tallied, how long it took. */
export function unitProvenance(u: Unit, method: string, seconds: number): Provenance {
  return makeProvenance({ request: `catalogue unit ${u.family.id} ${paramsText(u.params)}`, method, seconds, notes: [`${u.stats.length} statistics`] });
}

function paramsText(p: Readonly<Record<string, number>>): string {
  return Object.entries(p).map(([k, v]) => `${k}=${v}`).join(' ');
}
