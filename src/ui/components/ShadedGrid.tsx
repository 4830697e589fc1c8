/**
 * A table of counts drawn as a shaded grid: each cell shows its number behind a shade
 * (░ ▒ ▓ █ by quarter of the largest entry), so the shape of a table reads at a glance
 * with or without colour. The selected cell is bracketed.
 */
import { Box, Text } from 'ink';
import { useTheme } from '../ThemeContext.js';

const SHADES = [' ', '░', '▒', '▓', '█'] as const;

export function shadeOf(value: bigint, max: bigint): string {
  if (value === 0n || max <= 0n) return SHADES[0];
  const level = Number((value * 4n + max - 1n) / max); // 1..4, rounding up so small counts still show
  return SHADES[Math.min(4, Math.max(1, level))]!;
}

export interface ShadedGridProps {
  readonly table: readonly (readonly bigint[])[];
  readonly rowLabel: string; // e.g. "θ" for rows = θ-degree
  readonly colLabel: string; // e.g. "x"
  readonly selected?: readonly [number, number];
  readonly width: number;
  readonly height: number;
}

export function ShadedGrid(props: ShadedGridProps) {
  const theme = useTheme();
  const { table, selected } = props;
  let max = 0n;
  for (const row of table) for (const v of row) if (v > max) max = v;
  const cols = Math.max(0, ...table.map((r) => r.length));
  const cellW = Math.max(2, max.toString().length, String(cols - 1).length) + 3;
  // One axis: a single row of dimensions, labelled as such.
  const single = props.rowLabel === '';
  const rowName = (i: number) => (single ? 'dim' : `${props.rowLabel}${i}`);
  const corner = single ? `${props.colLabel}-deg` : `${props.rowLabel}\\${props.colLabel}`;
  const labelW = Math.max(corner.length, props.rowLabel.length + String(table.length - 1).length + 1, 3);
  const fitCols = Math.max(1, Math.floor((props.width - labelW - 1) / cellW));
  const fitRows = Math.max(1, props.height - 1);
  // Scroll so the selected cell stays visible.
  const c0 = selected ? Math.max(0, Math.min(selected[1] - fitCols + 1, cols - fitCols)) : 0;
  const r0 = selected ? Math.max(0, Math.min(selected[0] - fitRows + 1, table.length - fitRows)) : 0;
  const colIdx = Array.from({ length: Math.min(fitCols, cols - c0) }, (_, i) => c0 + i);
  const rowIdx = Array.from({ length: Math.min(fitRows, table.length - r0) }, (_, i) => r0 + i);
  return (
    <Box flexDirection="column">
      <Text wrap="truncate" {...theme.style('dim')}>
        {corner.padEnd(labelW)} {colIdx.map((j) => String(j).padStart(cellW - 1) + ' ').join('')}
      </Text>
      {rowIdx.map((i) => (
        <Text key={i} wrap="truncate">
          <Text {...theme.style('dim')}>{rowName(i).padEnd(labelW)}</Text>{' '}
          {colIdx.map((j) => {
            const v = table[i]?.[j] ?? 0n;
            const isSel = selected !== undefined && selected[0] === i && selected[1] === j;
            const body = shadeOf(v, max) + (v === 0n ? '·' : v.toString()).padStart(cellW - 3);
            return (
              <Text key={j} {...(isSel ? theme.style('selected') : {})}>
                {isSel ? `[${body}]` : ` ${body} `}
              </Text>
            );
          })}
        </Text>
      ))}
    </Box>
  );
}
