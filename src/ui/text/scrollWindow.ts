/**
 * The part of a list of lines that fits `height` rows, starting near `offset`, with a marker
 * line where lines are hidden above or below ("↑ 3 more above", "↓ 12 more below"), so
 * nothing is cut without a sign. `focus` (a range of line indices) is kept in view.
 */
import { line, type SLine } from './styledLine.js';

export interface ScrollWindow {
  readonly lines: SLine[];
  /** The offset actually used (clamped, moved to show the focus). */
  readonly offset: number;
  readonly above: number;
  readonly below: number;
}

function windowAt(all: readonly SLine[], height: number, offset: number, keys: readonly [string, string]): ScrollWindow {
  const h = Math.max(3, height);
  if (all.length <= height) return { lines: [...all], offset: 0, above: 0, below: 0 };
  const maxOff = all.length - (h - 1); // the last page has only the marker above
  const off = Math.max(0, Math.min(offset, maxOff));
  const top = off > 0 ? 1 : 0;
  let room = h - top;
  const bottom = off + room < all.length ? 1 : 0;
  room -= bottom;
  const shown = all.slice(off, off + room);
  const above = off;
  const below = all.length - off - shown.length;
  const out: SLine[] = [];
  if (top) out.push(line(`↑ ${above} more line${above === 1 ? '' : 's'} above (${keys[0]})`, 'dim'));
  out.push(...shown);
  if (bottom) out.push(line(`↓ ${below} more line${below === 1 ? '' : 's'} below (${keys[1]})`, 'dim'));
  return { lines: out, offset: off, above, below };
}

/** `keys` names the keys that scroll up and down, shown on the markers. */
export function scrollWindow(all: readonly SLine[], height: number, offset: number, focus?: readonly [number, number], keys: readonly [string, string] = ['PgUp', 'PgDn']): ScrollWindow {
  let w = windowAt(all, height, offset, keys);
  if (!focus || all.length <= height) return w;
  for (let i = 0; i < 3; i++) {
    const first = w.offset;
    const last = w.offset + w.lines.length - (w.above ? 1 : 0) - (w.below ? 1 : 0) - 1;
    let off = w.offset;
    if (focus[0] < first) off = focus[0];
    else if (focus[1] > last) off = w.offset + Math.min(focus[1] - last, Math.max(0, focus[0] - first));
    if (off === w.offset) break;
    w = windowAt(all, height, off, keys);
  }
  return w;
}
