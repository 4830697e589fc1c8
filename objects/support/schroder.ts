/**
 * Schröder path helpers. A path from (0,0) to (n,n) never below the diagonal, steps
 * 1 = north, 0 = east, 2 = diagonal (1,1). Each north or diagonal step fills one row.
 */
import type { SchroderPath } from '../types.js';

/** Row data bottom to top: a_r = y − x at the start of the row's step, and whether it is diagonal. */
export function schroderRows(path: SchroderPath): { area: number[]; diagonal: boolean[] } {
  const area: number[] = [];
  const diagonal: boolean[] = [];
  let x = 0;
  let y = 0;
  for (const s of path) {
    if (s === 0) {
      x++;
      continue;
    }
    area.push(y - x);
    diagonal.push(s === 2);
    y++;
    if (s === 2) x++;
  }
  return { area, diagonal };
}

/** A small drawing, top row first: `|` north step, `/` diagonal step, `#` full cells, `\` the diagonal. */
export function drawSchroderPath(path: SchroderPath): string {
  const { area, diagonal } = schroderRows(path);
  const n = area.length;
  if (n === 0) return '(empty path)';
  const lines: string[] = [];
  for (let r = n; r >= 1; r--) {
    const c = r - 1 - area[r - 1]!; // x where the row's step starts
    let line = '';
    for (let col = 0; col < r; col++) {
      if (col < c) line += ' .';
      else if (col === c) line += diagonal[r - 1] ? ' /' : col === r - 1 ? '|\\' : '|#';
      else line += col === r - 1 ? ' \\' : ' #';
    }
    lines.push(line);
  }
  lines.push(path.map((s) => 'END'[s]).join(''));
  return lines.join('\n');
}
