/**
 * Progress on stderr for long work: done / total, rate and time left, redrawn at most
 * a few times a second, and only after the work has run for `delayMs` (runs under a
 * second stay quiet).
 */
import { progressLine, type Progress } from '../core/progress.js';

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

/**
 * The request model's progress callback drawn on a Progress: a new bar when the total
 * changes or the count goes back (a new phase), else an update.
 */
export function progressReporter(progress: Progress): (label: string, done: number, total?: number) => void {
  let started = false;
  let lastTotal: number | undefined;
  let lastDone = 0;
  return (label, done, total) => {
    if (!started || total !== lastTotal || done < lastDone) {
      progress.start(label, total);
      started = true;
      lastTotal = total;
    }
    lastDone = done;
    progress.update(done);
  };
}
