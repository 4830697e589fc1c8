/**
 * A horizontal bar chart of a distribution: one line per value of the statistic, the bar
 * scaled to the largest count. Scrolls when there are more values than lines.
 */
import { Box, Text } from 'ink';
import { useTheme } from '../ThemeContext.js';

export interface Bar {
  readonly label: string;
  readonly value: bigint;
}

export function barLength(value: bigint, max: bigint, width: number): number {
  if (max <= 0n || value <= 0n) return 0;
  // Exact integer scaling; a nonzero count always gets at least one cell.
  return Math.max(1, Number((value * BigInt(width)) / max));
}

export function BarChart(props: { readonly bars: readonly Bar[]; readonly width: number; readonly height: number; readonly offset?: number }) {
  const theme = useTheme();
  const { bars, width, height } = props;
  const max = bars.reduce((m, b) => (b.value > m ? b.value : m), 0n);
  const labelW = Math.max(1, ...bars.map((b) => b.label.length));
  const valueW = Math.max(1, ...bars.map((b) => b.value.toString().length));
  const barW = Math.max(4, width - labelW - valueW - 4);
  const rows = bars.length > height ? Math.max(1, height - 1) : bars.length;
  const offset = Math.max(0, Math.min(props.offset ?? 0, bars.length - rows));
  const shown = bars.slice(offset, offset + rows);
  return (
    <Box flexDirection="column">
      {shown.map((b, i) => (
        <Text key={i} wrap="truncate">
          {b.label.padStart(labelW)} <Text {...theme.style('value')}>{'█'.repeat(barLength(b.value, max, barW))}</Text>{' '}
          {b.value.toString()}
        </Text>
      ))}
      {bars.length > rows ? (
        <Text {...theme.style('dim')} wrap="truncate">
          rows {offset + 1}–{offset + rows} of {bars.length}
        </Text>
      ) : null}
    </Box>
  );
}
