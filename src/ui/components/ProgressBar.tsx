/** A progress bar with done/total, percentage and an estimate of the time left. */
import { Text } from 'ink';
import { formatCount, formatDuration } from '../../core/progress.js';
import { useTheme } from '../ThemeContext.js';

export interface ProgressState {
  readonly label: string;
  readonly done: number;
  readonly total: number | undefined;
  readonly elapsedMs: number;
}

export function progressText(p: ProgressState): string {
  const of = p.total ? `${formatCount(p.done)}/${formatCount(p.total)}` : `${formatCount(p.done)} done`;
  if (!p.total || p.done <= 0 || p.elapsedMs <= 0) return of;
  const left = ((p.total - p.done) * p.elapsedMs) / p.done / 1000;
  return `${of}  ${((100 * p.done) / p.total).toFixed(0)}%  ~${formatDuration(left)} left`;
}

export function ProgressBar({ state, width }: { readonly state: ProgressState; readonly width: number }) {
  const theme = useTheme();
  const text = progressText(state);
  const barWidth = Math.max(10, width - text.length - state.label.length - 6);
  const frac = state.total ? Math.min(1, state.done / state.total) : 0;
  const full = Math.round(frac * barWidth);
  return (
    <Text wrap="truncate">
      {state.label} <Text {...theme.style('ok')}>{'█'.repeat(full)}</Text>
      <Text {...theme.style('dim')}>{'░'.repeat(barWidth - full)}</Text> {text}
    </Text>
  );
}
