/**
 * The rows of one unit from its counts: single distributions, joint distributions of pairs
 * and their sums, and Frobenius-level sums Σ q^stat s_shape, Σ q^stat F_Des(word),
 * Σ q^stat F_iDes(word), Σ_μ m_μ Σ_{content μ} q^stat (singles and own pairs), with the slices
 * of the Frobenius-level pairs where one statistic is 0 (their t = 0 and q = 0 specialisations).
 */
import { partitionKey, partitionList } from '../core/partitions.js';
import { Poly, packExponents } from '../core/poly.js';
import type { Family, Statistic, Transform } from '../enumerate/plugin.js';
import { qtSeries, schurSeries, type Series } from '../series/series.js';
import type { Combine, DistributionRow } from './catalogue.js';
import { forEachCell, type Counter } from './counter.js';
import { fundamentalToSchurFast, monomialToSchurFast, type CountMap } from './fundamentalToSchurFast.js';
import { accumulate, pairsOf, type RawTally, type SymKind, type UnitPart } from './rawTally.js';
import { mappedStat, orderStats, ownCount, ownStat, type TallyStat } from './statPlan.js';

export type { TallyStat } from './statPlan.js';

export interface UnitResult {
  readonly rows: DistributionRow[];
  readonly objects: bigint;
}

/** Where a unit's rows are stored and what they are read from. */
export interface UnitShape {
  readonly family: Family<unknown>;
  /** The place of the rows (the family's parameters, or n and k for a unit summed over contents). */
  readonly params: Readonly<Record<string, number | readonly number[]>>;
  readonly n: number;
  readonly k?: number;
  readonly parts: readonly UnitPart[];
  /** The partition of each content index of a unit summed over contents. */
  readonly contents?: readonly (readonly number[])[];
  /** Transforms mapping the unit onto itself: their statistics' single rows repeat the own ones. */
  readonly selfMaps?: readonly string[];
}

/** The statistics of a unit, ordered for tallying (own first, then by transform). */
export function tallyStats(family: Family<unknown>, statistics: readonly Statistic<unknown>[], transforms: readonly { t: Transform<unknown, unknown>; stats: readonly Statistic<unknown>[] }[]): TallyStat[] {
  void family;
  return orderStats([...statistics.map(ownStat), ...transforms.flatMap(({ t, stats }) => stats.map((s) => mappedStat(t, s)))]);
}

/** A unit of one parameter set, tallied in this thread (tests, small builds). */
export function tallyUnit(family: Family<unknown>, params: Readonly<Record<string, number>>, stats: readonly TallyStat[]): UnitResult {
  const n = params['n'] ?? 0;
  const shape: UnitShape = { family, params, n, ...(params['k'] === undefined ? {} : { k: params['k'] }), parts: [{ params }] };
  return rowsOfTally(shape, stats, accumulate({ family, n, parts: shape.parts, stats }));
}

function polyOf(t: CountMap): Poly {
  const m = new Map<number, bigint>();
  for (const [k, c] of t) if (c) m.set(k, BigInt(c));
  return Poly.fromPackedMap(m);
}

function bump(m: CountMap, key: number, by: number): void {
  m.set(key, (m.get(key) ?? 0) + by);
}

/** The distributions of a finished tally. */
export function rowsOfTally(u: UnitShape, stats: readonly TallyStat[], raw: RawTally): UnitResult {
  const rows: DistributionRow[] = [];
  const base = { family: u.family.id, params: u.params as Readonly<Record<string, number>>, n: u.n, ...(u.k === undefined ? {} : { k: u.k }) };
  const transformOf = (ix: readonly number[]) => [...new Set(ix.map((i) => stats[i]!.transform).filter(Boolean))].join('+');
  const push = (ix: number[], combine: Combine, series: Series | undefined) => {
    if (series) rows.push({ ...base, statistics: ix.map((i) => stats[i]!.id), combine, transform: transformOf(ix), series });
  };
  const self = new Set(u.selfMaps ?? []);
  stats.forEach((s, i) => {
    if (self.has(s.transform)) return;
    const t: CountMap = new Map();
    forEachCell(raw.single[i]!, (a, _b, _m, c) => bump(t, packExponents(a, 0), c));
    push([i], 'single', qtSeries(polyOf(t)));
  });
  pairsOf(stats).forEach(([i, j], p) => {
    const joint: CountMap = new Map();
    const sum: CountMap = new Map();
    forEachCell(raw.pair[p]!, (a, b, _m, c) => {
      bump(joint, packExponents(a, b), c);
      bump(sum, packExponents(a + b, 0), c);
    });
    push([i, j], 'joint', { kind: 'qt', poly: polyOf(joint) });
    push([i, j], 'sum', qtSeries(polyOf(sum)));
  });
  const ownPairs = pairsOf(stats).filter(([, j]) => j < ownCount(stats));
  for (const { kind, single, pair } of raw.sym) {
    const toSchur = symmetric(kind, u);
    single.forEach((c, i) => push([i], kind, toSchur(c, (a) => packExponents(a, 0))));
    pair.forEach((c, p) => {
      const [i, j] = ownPairs[p]!;
      push([i, j], kind, toSchur(c, (a, b) => packExponents(a, b)));
      // the slices at 0 of either statistic: Σ over the objects with b = 0 (resp. a = 0) of q^a (resp. q^b)
      push([i, j], `${kind}-t0`, toSchur(c, (a, b) => (b === 0 ? packExponents(a, 0) : -1)));
      push([j, i], `${kind}-t0`, toSchur(c, (a, b) => (a === 0 ? packExponents(b, 0) : -1)));
    });
  }
  return { rows, objects: BigInt(raw.objects) };
}

/** The Schur series of a Frobenius-level counter (cells keyed by `key`, −1 left out); undefined when not symmetric or empty. */
function symmetric(kind: SymKind, u: UnitShape): (c: Counter, key: (a: number, b: number) => number) => Series | undefined {
  return (c, key) => {
    const byIndex = new Map<number, CountMap>();
    forEachCell(c, (a, b, m, v) => {
      const k = key(a, b);
      if (k < 0) return;
      let t = byIndex.get(m);
      if (!t) byIndex.set(m, (t = new Map()));
      bump(t, k, v);
    });
    if (byIndex.size === 0) return undefined;
    let terms: Map<string, CountMap> | undefined;
    if (kind === 'shape') {
      const shapes = partitionsByIndex(u.n);
      terms = new Map([...byIndex].map(([m, t]) => [shapes[m]!, t]));
    } else if (kind === 'content') {
      terms = monomialToSchurFast(u.n, new Map([...byIndex].map(([m, t]) => [partitionKey(u.contents![m]!), t])));
    } else terms = fundamentalToSchurFast(u.n, byIndex);
    if (!terms) return undefined;
    return schurSeries([...terms].map(([l, m]) => [l, polyOf(m)] as const));
  };
}

function partitionsByIndex(n: number): string[] {
  return partitionList(n).map((l) => partitionKey(l));
}
