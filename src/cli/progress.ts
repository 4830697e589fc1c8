/**
 * Progress on stderr for long work: done / total, rate and time left, redrawn at most
 * a few times a second, and only after the work has run for `delayMs` (runs under a
 * second stay quiet).
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

export function stderrProgress(write: (s: string) => void, isTTY: boolean, delayMs = 1000): Progress {
  let label = '';
  let total: number | undefined;
  let t0 = 0;
  let lastDraw = 0;
  let drawn = false;
  return {
    start(l, tot) {
      label = l;
      total = tot;
      t0 = Date.now();
      lastDraw = 0;
      drawn = false;
    },
    update(done) {
      const now = Date.now();
      if (now - t0 < delayMs || now - lastDraw < (isTTY ? 200 : 5000)) return;
      lastDraw = now;
      drawn = true;
      const line = progressLine(label, done, total, now - t0);
      write(isTTY ? `\r\x1b[K${line}` : `${line}\n`);
    },
    finish() {
      if (drawn && isTTY) write('\r\x1b[K');
      drawn = false;
    },
  };
}
