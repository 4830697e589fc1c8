/**
 * One unit of the catalogue: every object of one family at one parameter set, streamed
 * once; every statistic computed once per object and tallied as single distributions,
 * joint distributions of each pair (and their sums), and Frobenius-level sums
 * Σ q^stat s_shape, Σ q^stat F_Des(word), Σ q^stat F_iDes(word) (and the same for pairs).
 */
import { partitionKey } from '../core/partitions.js';
import { Poly, packExponents } from '../core/poly.js';
import type { Family, Statistic, Transform } from '../enumerate/plugin.js';
import { qtSeries, schurSeries, type Series } from '../series/series.js';
import type { Combine, DistributionRow } from './catalogue.js';
import { descentMask, inverseDescentMask } from './descentMasks.js';
import { fundamentalToSchurFast, type CountMap } from './fundamentalToSchurFast.js';

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

/** Masks of words up to n = 13 fit below 2^12; packed pair keys below 2^33; products stay below 2^53. */
const WORD_BASE = 4096;

type Tally = Map<number, number>; // packed (a, b) or (a, extra) -> count

function bump(m: Tally, key: number): void {
  m.set(key, (m.get(key) ?? 0) + 1);
}

function polyOf(t: Tally): Poly {
  const m = new Map<number, bigint>();
  for (const [k, c] of t) m.set(k, BigInt(c));
  return Poly.fromPackedMap(m);
}

export function tallyStats(family: Family<unknown>, statistics: readonly Statistic<unknown>[], transforms: readonly { t: Transform<unknown, unknown>; stats: readonly Statistic<unknown>[] }[]): TallyStat[] {
  const own: TallyStat[] = statistics.map((s) => ({ id: s.id, transform: '', compute: (o) => s.compute(o) }));
  const via: TallyStat[] = transforms.flatMap(({ t, stats }) => stats.map((s) => ({ id: `${t.id}:${s.id}`, transform: t.id, compute: (o: unknown) => s.compute(t.apply(o)) })));
  void family;
  return [...own, ...via];
}

/**
 * Pairs tallied: own × own and own × transformed (a statistic against one read after a
 * transform); Frobenius-level pairs only own × own. Singles and pairs use dense counters
 * below a value bound V, with a map for any larger value.
 */
export function tallyUnit(family: Family<unknown>, params: Readonly<Record<string, number>>, stats: readonly TallyStat[]): UnitResult {
  const n = params['n'] ?? 0;
  const k = params['k'];
  const S = stats.length;
  const own = stats.filter((s) => s.transform === '').length;
  const V = Math.max(64, (n * (n + 1)) / 2 + 2);
  const pairList: [number, number][] = [];
  for (let i = 0; i < own; i++) for (let j = i + 1; j < S; j++) pairList.push([i, j]);
  const P = pairList.length;
  const singleDense = new Float64Array(S * V);
  const pairDense = new Float64Array(P * V * V);
  const overflow = new Map<string, Tally>();
  const over = (name: string, key: number) => {
    let m = overflow.get(name);
    if (!m) overflow.set(name, (m = new Map()));
    bump(m, key);
  };
  const hasShape = typeof family.shape === 'function';
  const hasWord = typeof family.readingWord === 'function' && n >= 1 && n <= 13;
  const shapeKeys = new Map<string, number>();
  const shapeSingle: Tally[] = stats.map(() => new Map());
  const shapePair: Tally[][] = stats.map(() => stats.map(() => new Map()));
  const wordSingle: Tally[][] = [0, 1].map(() => stats.map(() => new Map()));
  const wordPair: Tally[][][] = [0, 1].map(() => stats.map(() => stats.map(() => new Map())));
  const vals = new Array<number>(S).fill(0);
  let objects = 0n;
  const visit = (obj: unknown): void => {
    objects++;
    for (let i = 0; i < S; i++) {
      const v = stats[i]!.compute(obj);
      if (!Number.isInteger(v) || v < 0 || v >= 4096) throw new Error(`statistic ${stats[i]!.id} gave ${v} (expected an integer from 0 to 4095)`);
      vals[i] = v;
      if (v < V) singleDense[i * V + v]!++;
      else over(`s${i}`, packExponents(v, 0));
    }
    for (let p = 0; p < P; p++) {
      const [i, j] = pairList[p]!;
      const a = vals[i]!;
      const b = vals[j]!;
      if (a < V && b < V) pairDense[(p * V + a) * V + b]!++;
      else over(`p${p}`, packExponents(a, b));
    }
    if (hasShape) {
      const key = partitionKey(family.shape!(obj));
      let id = shapeKeys.get(key);
      if (id === undefined) shapeKeys.set(key, (id = shapeKeys.size));
      for (let i = 0; i < S; i++) {
        bump(shapeSingle[i]!, vals[i]! * 4096 + id);
        if (i < own) for (let j = i + 1; j < own; j++) bump(shapePair[i]![j]!, packExponents(vals[i]!, vals[j]!) * 4096 + id);
      }
    }
    if (hasWord) {
      const w = family.readingWord!(obj);
      const masks = [descentMask(w), inverseDescentMask(w)];
      for (let d = 0; d < 2; d++) {
        const m = masks[d]!;
        for (let i = 0; i < S; i++) {
          bump(wordSingle[d]![i]!, vals[i]! * WORD_BASE + m);
          if (i < own) for (let j = i + 1; j < own; j++) bump(wordPair[d]![i]![j]!, packExponents(vals[i]!, vals[j]!) * WORD_BASE + m);
        }
      }
    }
  };
  if (family.visit) family.visit(params, visit);
  else for (const o of family.generate(params)) visit(o);

  const singleTally = (i: number): Tally => {
    const t: Tally = new Map(overflow.get(`s${i}`) ?? []);
    for (let v = 0; v < V; v++) if (singleDense[i * V + v]) t.set(packExponents(v, 0), singleDense[i * V + v]!);
    return t;
  };
  const pairTally = (p: number): Tally => {
    const t: Tally = new Map(overflow.get(`p${p}`) ?? []);
    const base = p * V * V;
    for (let a = 0; a < V; a++) for (let b = 0; b < V; b++) {
      const c = pairDense[base + a * V + b]!;
      if (c) t.set(packExponents(a, b), c);
    }
    return t;
  };
  const rows: DistributionRow[] = [];
  const base = { family: family.id, params, n, ...(k === undefined ? {} : { k }) };
  const transformOf = (...ix: number[]) => [...new Set(ix.map((i) => stats[i]!.transform).filter(Boolean))].join('+');
  const push = (ids: number[], combine: Combine, series: Series | undefined) => {
    if (series) rows.push({ ...base, statistics: ids.map((i) => stats[i]!.id), combine, transform: transformOf(...ids), series });
  };
  for (let i = 0; i < S; i++) push([i], 'single', qtSeries(polyOf(singleTally(i))));
  pairList.forEach(([i, j], p) => {
    const t = pairTally(p);
    push([i, j], 'joint', { kind: 'qt', poly: polyOf(t) });
    push([i, j], 'sum', qtSeries(sumOf(t)));
  });
  if (hasShape) {
    const names = [...shapeKeys.keys()];
    const toSchur = (t: Tally, pair: boolean): Series => {
      const terms = new Map<string, Map<number, bigint>>();
      for (const [key, c] of t) {
        const id = key % 4096;
        const e = (key - id) / 4096;
        const m = terms.get(names[id]!) ?? new Map<number, bigint>();
        m.set(pair ? e : packExponents(e, 0), BigInt(c));
        terms.set(names[id]!, m);
      }
      return schurSeries([...terms].map(([l, m]) => [l, Poly.fromPackedMap(m)] as const));
    };
    for (let i = 0; i < S; i++) {
      push([i], 'shape', toSchur(shapeSingle[i]!, false));
      if (i < own) for (let j = i + 1; j < own; j++) push([i, j], 'shape', toSchur(shapePair[i]![j]!, true));
    }
  }
  if (hasWord) {
    const combos: Combine[] = ['fundamental', 'ifundamental'];
    for (let d = 0; d < 2; d++) {
      for (let i = 0; i < S; i++) {
        push([i], combos[d]!, fromFundamental(n, wordSingle[d]![i]!, false));
        if (i < own) for (let j = i + 1; j < own; j++) push([i, j], combos[d]!, fromFundamental(n, wordPair[d]![i]![j]!, true));
      }
    }
  }
  return { rows, objects };
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
    const k = pair ? e : packExponents(e, 0);
    m.set(k, (m.get(k) ?? 0) + c);
    byMask.set(mask, m);
  }
  const f = fundamentalToSchurFast(n, byMask);
  if (!f) return undefined;
  return schurSeries([...f].map(([l, m]) => [l, polyOf(m)] as const));
}
