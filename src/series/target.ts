/**
 * A target: a family of series over a range of n (and k), all of one kind, with a label
 * saying where it came from.
 */
import { InputError } from '../core/errors.js';
import type { Series, SeriesKind } from './series.js';

export interface TargetEntry {
  readonly n: number;
  readonly k?: number;
  readonly series: Series;
}

export interface Target {
  readonly kind: SeriesKind;
  /** Where the values came from (a command line, a file, typed coefficients). */
  readonly label: string;
  readonly entries: readonly TargetEntry[];
  /**
   * A marked union read apart: each entry (n, k) is the coefficient of the marking variable's
   * power named here (e.g. "θ^{n−k}") in a series over n.
   */
  readonly marked?: string;
}

/** Build a target; its kind is the widest of its entries' kinds (q inside q,t). */
export function makeTarget(label: string, entries: readonly TargetEntry[], marked?: string): Target {
  if (entries.length === 0) throw new InputError('a target needs at least one entry (n, series)');
  const kinds = new Set(entries.map((e) => e.series.kind));
  let kind: SeriesKind;
  if (kinds.size === 1) kind = [...kinds][0]!;
  else if ([...kinds].every((k) => k === 'q' || k === 'qt')) kind = 'qt';
  else throw new InputError(`a target's entries must be of one kind (got ${[...kinds].join(', ')}${kinds.has('multi') ? '; some entries have three or more varying gradings' : ''})`);
  const seen = new Set<string>();
  for (const e of entries) {
    if (!Number.isInteger(e.n) || e.n < 0) throw new InputError(`n must be a non-negative integer (got ${e.n})`, 'n');
    if (e.k !== undefined && (!Number.isInteger(e.k) || e.k < 0)) throw new InputError(`k must be a non-negative integer (got ${e.k})`, 'k');
    const key = entryKey(e.n, e.k);
    if (seen.has(key)) throw new InputError(`the target has two entries for ${key}`);
    seen.add(key);
  }
  const sorted = [...entries].sort((a, b) => a.n - b.n || (a.k ?? 0) - (b.k ?? 0));
  return { kind, label, entries: sorted, ...(marked ? { marked } : {}) };
}

export function entryKey(n: number, k?: number): string {
  return k === undefined ? `n=${n}` : `n=${n},k=${k}`;
}

export function targetHasK(t: Target): boolean {
  return t.entries.some((e) => e.k !== undefined);
}

/** "n = 1..7", "n = 2..6, all k" or an explicit list of (n, k). */
export function rangeText(entries: readonly { n: number; k?: number }[]): string {
  if (entries.length === 0) return 'nothing';
  const ns = [...new Set(entries.map((e) => e.n))].sort((a, b) => a - b);
  const contiguous = ns.every((n, i) => i === 0 || n === ns[i - 1]! + 1);
  const nText = contiguous && ns.length > 1 ? `n = ${ns[0]}..${ns[ns.length - 1]}` : `n = ${ns.join(', ')}`;
  if (!entries.some((e) => e.k !== undefined)) return nText;
  for (const from of [1, 0]) {
    const allK = ns.every((n) => {
      const ks = new Set(entries.filter((e) => e.n === n).map((e) => e.k));
      for (let k = from; k <= n; k++) if (!ks.has(k)) return false;
      return ks.size === n - from + 1;
    });
    if (allK) return `${nText}, all k = ${from}..n`;
  }
  return entries.map((e) => `(${e.n},${e.k ?? '-'})`).join(' ');
}
