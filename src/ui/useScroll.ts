/**
 * Scrolling of a screen's text: the offset, and the keys that move it (PgUp/PgDn by a page,
 * Home/End to the ends; ↑/↓ by a line where the screen gives them no other use). The window
 * is computed at each draw (text/scrollWindow.ts); keys move from the offset last drawn. A
 * selection (the focus) is brought into view when it moves; otherwise the user's scrolling
 * stands, so the lines past a selection can be read too.
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
  const [, redraw] = useState(0);
  // The offset as last drawn (clamped to the text), the page size, and the last focus seen.
  const state = useRef({ offset: 0, page: 1, max: 0, focus: '' });
  const move = (to: number) => {
    state.current.offset = Math.max(0, Math.min(state.current.max, to));
    redraw((n) => n + 1);
  };
  return {
    view(all, height, focus, keys) {
      const s = state.current;
      const f = focus ? `${focus[0]},${focus[1]}` : '';
      const moved = f !== s.focus;
      const w = scrollWindow(all, height, s.offset, moved ? focus : undefined, keys);
      state.current = { offset: w.offset, page: Math.max(1, height - 2), max: Math.max(0, all.length - 1), focus: f };
      return w;
    },
    handle(_input, key, arrows) {
      const s = state.current;
      if (key.pageDown) move(s.offset + s.page);
      else if (key.pageUp) move(s.offset - s.page);
      else if (key.home) move(0);
      else if (key.end) move(s.max);
      else if (arrows && key.downArrow) move(s.offset + 1);
      else if (arrows && key.upArrow) move(s.offset - 1);
      else return false;
      return true;
    },
    reset() {
      move(0);
      state.current.focus = '';
    },
  };
}
