/** Short text of a series for one screen line. */
import type { Series } from '../../series/series.js';
import { entryKey, type Target } from '../../series/target.js';

export function seriesText(s: Series): string {
  switch (s.kind) {
    case 'q':
    case 'qt':
      return s.poly.toString();
    case 'schur':
      return [...s.terms].map(([k, c]) => `(${c.toString()})·s(${k})`).join(' + ') || '0';
    case 'multi':
      return `table over ${s.axes.join(', ')} (${s.terms.size} cells)`;
  }
}

export function targetLines(t: Target, max: number): string[] {
  const lines = t.entries.slice(0, max).map((e) => `${entryKey(e.n, e.k)}: ${seriesText(e.series)}`);
  if (t.entries.length > max) lines[max - 1] = `… ${t.entries.length - max + 1} more entries`;
  return lines;
}
