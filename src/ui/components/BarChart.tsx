/**
 * A horizontal bar chart of a distribution as lines: one per value of the statistic, the
 * bar scaled to the largest count. The screen scrolls the lines.
 */
import type { SLine } from '../text/styledLine.js';

export interface Bar {
  readonly label: string;
  readonly value: bigint;
}

export function barLength(value: bigint, max: bigint, width: number): number {
  if (max <= 0n || value <= 0n) return 0;
  // Exact integer scaling; a nonzero count always gets at least one cell.
  return Math.max(1, Number((value * BigInt(width)) / max));
}

export function barLines(bars: readonly Bar[], width: number): SLine[] {
  const max = bars.reduce((m, b) => (b.value > m ? b.value : m), 0n);
  const labelW = Math.max(1, ...bars.map((b) => b.label.length));
  const valueW = Math.max(1, ...bars.map((b) => b.value.toString().length));
  const barW = Math.max(4, width - labelW - valueW - 3);
  return bars.map((b) => [{ text: `${b.label.padStart(labelW)} ` }, { text: '█'.repeat(barLength(b.value, max, barW)), style: 'value' }, { text: ` ${b.value.toString()}` }]);
}
