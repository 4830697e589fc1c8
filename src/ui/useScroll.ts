/**
 * Scrolling of a screen's text: the offset, and the keys that move it (PgUp/PgDn by a page,
 * Home/End to the ends; ↑/↓ by a line where the screen gives them no other use). The window
 * is computed at each draw (text/scrollWindow.ts); keys move from the offset last drawn.
 */
import { useRef, useState } from 'react';
import type { KeyInfo } from './keys/splitKeys.js';
import { scrollWindow, type ScrollWindow } from './text/scrollWindow.js';
import type { SLine } from './text/styledLine.js';

export interface Scroll {
  /** The window for this draw. */
  view(all: readonly SLine[], height: number, focus?: readonly [number, number], keys?: readonly [string, string]): ScrollWindow;
  /** Handles a scrolling key; true when it was one. */
  handle(input: string, key: KeyInfo, arrows: boolean): boolean;
  reset(): void;
}

export function useScroll(): Scroll {
  const [offset, setOffset] = useState(0);
  const drawn = useRef({ offset: 0, page: 1, max: 0 });
  return {
    view(all, height, focus, keys) {
      const w = scrollWindow(all, height, offset, focus, keys);
      drawn.current = { offset: w.offset, page: Math.max(1, height - 2), max: Math.max(0, all.length - 1) };
      return w;
    },
    handle(_input, key, arrows) {
      const d = drawn.current;
      let to: number | undefined;
      if (key.pageDown) to = d.offset + d.page;
      else if (key.pageUp) to = d.offset - d.page;
      else if (key.home) to = 0;
      else if (key.end) to = d.max;
      else if (arrows && key.downArrow) to = d.offset + 1;
      else if (arrows && key.upArrow) to = d.offset - 1;
      if (to === undefined) return false;
      const v = Math.max(0, Math.min(d.max, to));
      // The next draw clamps it to the last page; remember that start for the next key.
      drawn.current = { ...d, offset: v };
      setOffset(v);
      return true;
    },
    reset() {
      drawn.current = { ...drawn.current, offset: 0 };
      setOffset(0);
    },
  };
}
