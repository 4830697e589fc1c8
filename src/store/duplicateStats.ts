/**
 * Which statistics a family's units tally. A statistic read after a transform that gives the
 * same value as an earlier one on every object of the small units (every n up to a budget of
 * objects) is left out: its rows would repeat the earlier one's (inverse:inversions is
 * inversions). A transform that maps every small unit onto itself is a "self-map": the single
 * distributions of its statistics repeat the own ones, so those rows are not stored (their
 * joint distributions with the own statistics are).
 * The builds re-check each left-out statistic on a sample of the large units (rawTally).
 */
import type { Family, Params } from '../enumerate/plugin.js';
import type { TallyStat } from './statPlan.js';

/** Objects visited to compare statistics (all objects of the smallest sizes). */
export const DUPLICATE_CHECK_OBJECTS = 20_000;

export interface StatChoice {
  readonly kept: readonly TallyStat[];
  /** Left out, with the statistic it equals. */
  readonly dropped: readonly { readonly stat: TallyStat; readonly sameAs: string }[];
  /** Left out as undefined on some objects (a statistic read after a transform that leaves its domain). */
  readonly partial: readonly { readonly stat: TallyStat; readonly why: string }[];
  /** Transforms that map each checked unit onto itself. */
  readonly selfMaps: readonly string[];
  /** The sizes compared, e.g. "n ≤ 6 (4 213 objects)". */
  readonly checkedOn: string;
}

const memo = new Map<string, StatChoice>();

function visitAll(family: Family<unknown>, params: Params, f: (x: unknown) => void): void {
  if (family.visit) family.visit(params, f);
  else for (const x of family.generate(params)) f(x);
}

function hashColumn(col: readonly number[]): number {
  let h = 2166136261;
  for (const v of col) h = Math.imul(h ^ v, 16777619) >>> 0;
  return h;
}

function sameColumn(a: readonly number[], b: readonly number[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** Sizes looked at: the objects of the family at n = 1, 2, … until the budget is spent. */
const MAX_CHECK_N = 12;

/**
 * The choice for a family: `partsAt(n)` gives its units' parameter sets of size n (the sizes
 * are the family's, not the build's, so every build keeps the same list).
 */
export function chooseStats(family: Family<unknown>, partsAt: (n: number) => readonly Params[], all: readonly TallyStat[]): StatChoice {
  const key = `${family.id}|${all.map((s) => s.id).join(',')}`;
  const hit = memo.get(key);
  if (hit) return hit;
  const cols: number[][] = all.map(() => []);
  const failed: (string | undefined)[] = all.map(() => undefined);
  const maps = [...new Set(all.filter((s) => s.map).map((s) => s.map!))];
  const selfCandidates = new Set(maps.filter((t) => t.to === family.id));
  let objects = 0;
  let upTo = -1;
  for (let n = 1; n <= MAX_CHECK_N; n++) {
    const parts = partsAt(n);
    const count = parts.reduce((s, p) => s + Number(family.count(p)), 0);
    if (upTo >= 0 && objects + count > DUPLICATE_CHECK_OBJECTS) break;
    for (const p of parts) {
      const keys = new Set<string>();
      const images = new Map<string, Set<string>>([...selfCandidates].map((t) => [t.id, new Set<string>()]));
      visitAll(family, p, (x) => {
        const cache = new Map<string, unknown>();
        all.forEach((s, i) => {
          let y = x;
          if (s.map) {
            if (!cache.has(s.transform)) cache.set(s.transform, s.map.apply(x));
            y = cache.get(s.transform);
          }
          if (failed[i] !== undefined) return;
          try {
            cols[i]!.push(s.statistic.compute(y));
          } catch (e) {
            failed[i] = (e as Error).message;
          }
        });
        if (selfCandidates.size) {
          keys.add(family.key(x));
          for (const t of selfCandidates) images.get(t.id)!.add(family.key(cache.has(t.id) ? cache.get(t.id) : t.apply(x)));
        }
      });
      for (const t of [...selfCandidates]) {
        const im = images.get(t.id)!;
        if (im.size !== keys.size || [...im].some((k) => !keys.has(k))) selfCandidates.delete(t);
      }
    }
    objects += count;
    upTo = n;
  }
  const kept: TallyStat[] = [];
  const dropped: { stat: TallyStat; sameAs: string }[] = [];
  const seen = new Map<number, number[]>();
  const partial: { stat: TallyStat; why: string }[] = [];
  all.forEach((s, i) => {
    if (failed[i] !== undefined) {
      partial.push({ stat: s, why: failed[i]! });
      return;
    }
    const h = hashColumn(cols[i]!);
    const twin = s.map ? (seen.get(h) ?? []).find((j) => sameColumn(cols[j]!, cols[i]!)) : undefined;
    if (twin !== undefined) {
      dropped.push({ stat: s, sameAs: all[twin]!.id });
      return;
    }
    kept.push(s);
    seen.set(h, [...(seen.get(h) ?? []), i]);
  });
  const choice: StatChoice = {
    kept,
    dropped,
    partial,
    selfMaps: [...selfCandidates].map((t) => t.id),
    checkedOn: upTo < 0 ? 'nothing' : `n ≤ ${upTo} (${objects} objects)`,
  };
  memo.set(key, choice);
  return choice;
}
