/**
 * Progress of long work as every front end reports it: a start with an optional total,
 * updates of the count done, a finish; and the shared text of counts, rates and time left.
 */

export interface Progress {
  start(label: string, total?: number): void;
  update(done: number): void;
  finish(): void;
}

export const silentProgress: Progress = { start() {}, update() {}, finish() {} };

export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds)) return '?';
  if (seconds < 60) return `${seconds.toFixed(seconds < 10 ? 1 : 0)}s`;
  const m = Math.floor(seconds / 60);
  if (m < 60) return `${m}m${String(Math.round(seconds % 60)).padStart(2, '0')}s`;
  return `${Math.floor(m / 60)}h${String(m % 60).padStart(2, '0')}m`;
}

export function formatCount(x: number): string {
  if (x >= 1e9) return `${(x / 1e9).toFixed(2)}G`;
  if (x >= 1e6) return `${(x / 1e6).toFixed(2)}M`;
  if (x >= 1e4) return `${(x / 1e3).toFixed(1)}k`;
  return String(Math.round(x));
}

/** One status line for the given state. */
export function progressLine(label: string, done: number, total: number | undefined, elapsedMs: number): string {
  const rate = elapsedMs > 0 ? (done * 1000) / elapsedMs : 0;
  const parts = [label, total ? `${formatCount(done)}/${formatCount(total)}` : formatCount(done)];
  if (total) parts.push(`${((100 * done) / total).toFixed(1)}%`);
  parts.push(`${formatCount(rate)}/s`);
  if (total && rate > 0) parts.push(`${formatDuration((total - done) / rate)} left`);
  return parts.join('  ');
}
