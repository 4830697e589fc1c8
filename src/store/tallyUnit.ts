/**
 * One unit of the catalogue: every object of one family at one parameter set, streamed
 * once; every statistic computed once per object and tallied as single distributions,
 * joint distributions of pairs (and their sums), and Frobenius-level sums
 * Σ q^stat s_shape, Σ q^stat F_Des(word), Σ q^stat F_iDes(word) (and the same for pairs).
 */
import { Poly, packExponents } from '../core/poly.js';
import type { Family, Statistic, Transform } from '../enumerate/plugin.js';
import { qtSeries, schurSeries, type Series } from '../series/series.js';
import type { Combine, DistributionRow } from './catalogue.js';
import { fundamentalToSchurFast, type CountMap } from './fundamentalToSchurFast.js';
import { accumulate, pairsOf, WORD_BASE, type RawTally, type Tally } from './rawTally.js';

/** A statistic as tallied: an own statistic, or one read after a transform. */
export interface TallyStat {
  readonly id: string;
  readonly transform: string;
  readonly compute: (obj: unknown) => number;
}

export interface UnitResult {
  readonly rows: DistributionRow[];
  readonly objects: bigint;
}

function polyOf(t: Tally): Poly {
  const m = new Map<number, bigint>();
  for (const [k, c] of t) if (c) m.set(k, BigInt(c));
  return Poly.fromPackedMap(m);
}

export function tallyStats(family: Family<unknown>, statistics: readonly Statistic<unknown>[], transforms: readonly { t: Transform<unknown, unknown>; stats: readonly Statistic<unknown>[] }[]): TallyStat[] {
  const own: TallyStat[] = statistics.map((s) => ({ id: s.id, transform: '', compute: (o) => s.compute(o) }));
  const via: TallyStat[] = transforms.flatMap(({ t, stats }) => stats.map((s) => ({ id: `${t.id}:${s.id}`, transform: t.id, compute: (o: unknown) => s.compute(t.apply(o)) })));
  void family;
  return [...own, ...via];
}

export function tallyUnit(family: Family<unknown>, params: Readonly<Record<string, number>>, stats: readonly TallyStat[]): UnitResult {
  return rowsOfTally(family, params, stats, accumulate(family, params, stats));
}

/** The distributions of a finished tally. */
export function rowsOfTally(family: Family<unknown>, params: Readonly<Record<string, number>>, stats: readonly TallyStat[], raw: RawTally): UnitResult {
  const n = params['n'] ?? 0;
  const k = params['k'];
  const V = raw.V;
  const rows: DistributionRow[] = [];
  const base = { family: family.id, params, n, ...(k === undefined ? {} : { k }) };
  const transformOf = (...ix: number[]) => [...new Set(ix.map((i) => stats[i]!.transform).filter(Boolean))].join('+');
  const push = (ids: number[], combine: Combine, series: Series | undefined) => {
    if (series) rows.push({ ...base, statistics: ids.map((i) => stats[i]!.id), combine, transform: transformOf(...ids), series });
  };
  stats.forEach((_, i) => {
    const t: Tally = new Map(raw.overflow.get(`s${i}`) ?? []);
    for (let v = 0; v < V; v++) if (raw.singleDense[i * V + v]) t.set(packExponents(v, 0), raw.singleDense[i * V + v]!);
    push([i], 'single', qtSeries(polyOf(t)));
  });
  pairsOf(stats).forEach(([i, j], p) => {
    const t: Tally = new Map(raw.overflow.get(`p${p}`) ?? []);
    const at = p * V * V;
    for (let a = 0; a < V; a++) for (let b = 0; b < V; b++) {
      const c = raw.pairDense[at + a * V + b]!;
      if (c) t.set(packExponents(a, b), c);
    }
    push([i, j], 'joint', { kind: 'qt', poly: polyOf(t) });
    push([i, j], 'sum', qtSeries(sumOf(t)));
  });
  const own = stats.filter((s) => s.transform === '').length;
  const toSchur = (m: Map<string, Tally> | undefined): Series | undefined =>
    m && m.size ? schurSeries([...m].map(([l, t]) => [l, polyOf(t)] as const)) : undefined;
  if (typeof family.shape === 'function') {
    stats.forEach((_, i) => push([i], 'shape', toSchur(raw.shapeSingle[i])));
    for (let i = 0; i < own; i++) for (let j = i + 1; j < own; j++) push([i, j], 'shape', toSchur(raw.shapePair.get(`${i},${j}`)));
  }
  if (typeof family.readingWord === 'function' && n >= 1 && n <= 13) {
    const combos: Combine[] = ['fundamental', 'ifundamental'];
    for (let d = 0; d < 2; d++) {
      stats.forEach((_, i) => push([i], combos[d]!, fromFundamental(n, raw.wordSingle[d]![i]!, false)));
      for (let i = 0; i < own; i++) for (let j = i + 1; j < own; j++) {
        const t = raw.wordPair[d]!.get(`${i},${j}`);
        if (t) push([i, j], combos[d]!, fromFundamental(n, t, true));
      }
    }
  }
  return { rows, objects: BigInt(raw.objects) };
}

/** Σ_{a,b} c q^{a+b} from a joint tally. */
function sumOf(t: Tally): Poly {
  const m = new Map<number, bigint>();
  for (const [key, c] of t) {
    const b = key % 2 ** 21;
    const a = (key - b) / 2 ** 21;
    const e = packExponents(a + b, 0);
    m.set(e, (m.get(e) ?? 0n) + BigInt(c));
  }
  return Poly.fromPackedMap(m);
}

/** Σ q^stat F_mask -> Schur; undefined when the sum is not symmetric. */
function fromFundamental(n: number, t: Tally, pair: boolean): Series | undefined {
  const byMask = new Map<number, CountMap>();
  for (const [key, c] of t) {
    const mask = key % WORD_BASE;
    const e = (key - mask) / WORD_BASE;
    const m = byMask.get(mask) ?? new Map<number, number>();
    const kk = pair ? e : packExponents(e, 0);
    m.set(kk, (m.get(kk) ?? 0) + c);
    byMask.set(mask, m);
  }
  const f = fundamentalToSchurFast(n, byMask);
  if (!f) return undefined;
  return schurSeries([...f].map(([l, m]) => [l, polyOf(m)] as const));
}
