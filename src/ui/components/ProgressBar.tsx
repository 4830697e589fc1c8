/**
 * Progress of long work as lines of text: a bar with done/total, the time elapsed, and an
 * estimate. Work in equal steps (objects counted) is extrapolated from its rate; work whose
 * steps differ widely (the module engine's subgroup tasks) uses the engine's own estimate of
 * the whole run, said as such — never a countdown the steps cannot support.
 */
import { formatCount, formatDuration } from '../../core/progress.js';
import { line, wrapLine, type SLine } from '../text/styledLine.js';
import { Lines } from './Lines.js';

export interface ProgressState {
  readonly label: string;
  readonly done: number;
  readonly total: number | undefined;
  readonly elapsedMs: number;
  /** The engine's estimate of the whole run in seconds (wall clock), when it gave one. */
  readonly estimateSeconds?: number | undefined;
  /** Time since that estimate arrived (the run it estimates starts then). */
  readonly sinceEstimateMs?: number | undefined;
}

export function progressText(p: ProgressState): string {
  const elapsed = p.elapsedMs / 1000;
  const parts: string[] = [];
  if (p.total) parts.push(`${formatCount(p.done)}/${formatCount(p.total)}`, `${((100 * p.done) / p.total).toFixed(0)}%`);
  else if (p.done > 0) parts.push(`${formatCount(p.done)} done`);
  parts.push(`${formatDuration(elapsed)} elapsed`);
  if (p.estimateSeconds !== undefined) {
    const est = p.estimateSeconds;
    const since = (p.sinceEstimateMs ?? p.elapsedMs) / 1000;
    // The engine's cost model counts processor time; a busy machine takes longer.
    parts.push(since <= est ? `estimate ~${formatDuration(est)} in all (~${formatDuration(Math.max(0, est - since))} left)` : `over the estimate of ~${formatDuration(est)}`);
  } else if (p.total && p.done > 0 && p.elapsedMs > 0) {
    parts.push(`~${formatDuration(((p.total - p.done) * elapsed) / p.done)} left`);
  }
  return parts.join('  ');
}

export function progressLines(p: ProgressState, width: number): SLine[] {
  const text = progressText(p);
  const frac = p.total ? Math.min(1, p.done / p.total) : 0;
  const barFor = (w: number): SLine => {
    const full = Math.round(frac * w);
    return [{ text: '█'.repeat(full), style: 'ok' }, { text: '░'.repeat(w - full), style: 'dim' }];
  };
  const oneLine = width - [...p.label].length - [...text].length - 2;
  if (oneLine >= 8) return [[{ text: `${p.label} ` }, ...barFor(oneLine), { text: ` ${text}` }]];
  // Narrow: the label and figures on their own lines, the bar across.
  return [...wrapLine(line(p.label), width, 2), ...wrapLine(line(text, 'dim'), width, 2), barFor(Math.max(4, width))];
}

export function ProgressBar({ state, width }: { readonly state: ProgressState; readonly width: number }) {
  return <Lines lines={progressLines(state, width)} />;
}
