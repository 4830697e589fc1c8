/** "Did you mean" suggestions for unknown names, by edit distance. */
import { shown } from './shown.js';

/** Names longer than this get no suggestion (the distance table grows with the product of lengths). */
const SUGGEST_MAX = 100;

export function editDistance(a: string, b: string): number {
  const d = Array.from({ length: a.length + 1 }, (_, i) => [i, ...new Array<number>(b.length).fill(0)]);
  for (let j = 1; j <= b.length; j++) d[0]![j] = j;
  for (let i = 1; i <= a.length; i++) {
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      d[i]![j] = Math.min(d[i - 1]![j]! + 1, d[i]![j - 1]! + 1, d[i - 1]![j - 1]! + cost);
    }
  }
  return d[a.length]![b.length]!;
}

/** The candidates nearest to name (prefix matches first), at most `count`. */
export function nearest(name: string, candidates: readonly string[], count = 3): string[] {
  if (name.length > SUGGEST_MAX) return [];
  const lower = name.toLowerCase();
  return [...candidates]
    .map((c) => ({
      c,
      score: c.toLowerCase().startsWith(lower) || lower.startsWith(c.toLowerCase()) ? -1 : editDistance(lower, c.toLowerCase()),
    }))
    .sort((x, y) => x.score - y.score || x.c.localeCompare(y.c))
    .slice(0, count)
    .map((x) => x.c);
}

/** A message such as `unknown family "perm" (nearest: permutations, …)`. */
export function unknownNameMessage(kind: string, name: string, candidates: readonly string[]): string {
  const near = nearest(name, candidates);
  return `unknown ${kind} "${shown(name, 60)}"` + (near.length ? ` (nearest: ${near.join(', ')})` : '');
}
