/**
 * A table of counts drawn as a shaded grid: each cell shows its number behind a shade
 * (░ ▒ ▓ █ by quarter of the largest entry), so the shape of a table reads at a glance
 * with or without colour. The selected cell is bracketed. A table wider than the window
 * shows a window of its columns, with ‹ and › on every row where columns are hidden and a
 * line saying which columns are shown; the rows are lines the screen scrolls.
 */
import type { SLine } from '../text/styledLine.js';

const SHADES = [' ', '░', '▒', '▓', '█'] as const;

export function shadeOf(value: bigint, max: bigint): string {
  if (value === 0n || max <= 0n) return SHADES[0];
  const level = Number((value * 4n + max - 1n) / max); // 1..4, rounding up so small counts still show
  return SHADES[Math.min(4, Math.max(1, level))]!;
}

export interface GridOptions {
  readonly table: readonly (readonly bigint[])[];
  readonly rowLabel: string; // e.g. "θ" for rows = θ-degree
  readonly colLabel: string; // e.g. "x"
  readonly selected?: readonly [number, number];
  readonly width: number;
  /** First column shown when nothing is selected (sideways scrolling). */
  readonly colOffset?: number;
  /** The keys that scroll sideways, named on the caption line. */
  readonly sideKeys?: string;
}

export interface Grid {
  readonly lines: SLine[];
  /** Index in `lines` of the first table row. */
  readonly firstRow: number;
  readonly colStart: number;
  readonly colsShown: number;
  readonly cols: number;
}

export function gridLines(o: GridOptions): Grid {
  const { table, selected } = o;
  let max = 0n;
  for (const row of table) for (const v of row) if (v > max) max = v;
  const cols = Math.max(1, ...table.map((r) => r.length));
  const cellW = Math.max(2, max.toString().length, String(cols - 1).length) + 3;
  // One axis: a single row of dimensions, labelled as such.
  const single = o.rowLabel === '';
  const rowName = (i: number) => (single ? 'dim' : `${o.rowLabel}${i}`);
  const corner = single ? `${o.colLabel}-deg` : `${o.rowLabel}\\${o.colLabel}`;
  const labelW = Math.max(corner.length, o.rowLabel.length + String(table.length - 1).length + 1, 3);
  // Columns that fit beside the row label and the two marker cells.
  const fitCols = Math.max(1, Math.floor((o.width - labelW - 2) / cellW));
  const maxStart = Math.max(0, cols - fitCols);
  // Start at the offset asked for, moved just enough to show the selected cell.
  let c0 = o.colOffset ?? 0;
  if (selected) c0 = Math.min(Math.max(c0, selected[1] - fitCols + 1), selected[1]);
  c0 = Math.max(0, Math.min(c0, maxStart));
  const shown = Math.min(fitCols, cols - c0);
  const left = c0 > 0;
  const right = c0 + shown < cols;
  const lm: SLine = [{ text: left ? '‹' : ' ', style: 'dim' }];
  const rm: SLine = right ? [{ text: '›', style: 'dim' }] : [];
  const colIdx = Array.from({ length: shown }, (_, i) => c0 + i);
  const lines: SLine[] = [];
  lines.push([{ text: corner.padEnd(labelW), style: 'dim' }, ...lm, { text: colIdx.map((j) => String(j).padStart(cellW - 1) + ' ').join(''), style: 'dim' }, ...rm]);
  table.forEach((row, i) => {
    const segs: SLine[number][] = [{ text: rowName(i).padEnd(labelW), style: 'dim' }, ...lm];
    for (const j of colIdx) {
      const v = row[j] ?? 0n;
      const isSel = selected !== undefined && selected[0] === i && selected[1] === j;
      const body = shadeOf(v, max) + (v === 0n ? '·' : v.toString()).padStart(cellW - 3);
      segs.push(isSel ? { text: `[${body}]`, style: 'selected' } : { text: ` ${body} ` });
    }
    lines.push([...segs, ...rm]);
  });
  if (left || right) {
    lines.push([{ text: `${o.colLabel}-degree columns ${c0}–${c0 + shown - 1} of 0–${cols - 1}${o.sideKeys ? ` (${o.sideKeys} for the others)` : ''}`, style: 'dim' }]);
  }
  return { lines, firstRow: 1, colStart: c0, colsShown: shown, cols };
}
