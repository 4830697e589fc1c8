/**
 * Text of the screens as lines of styled pieces, wrapped here (not by ink) so every screen
 * knows how many lines its content takes and can scroll it with markers instead of losing it.
 */
import type { StyleName } from '../theme.js';
import { cells } from './cellWidth.js';

export interface Seg {
  readonly text: string;
  readonly style?: StyleName;
}
export type SLine = readonly Seg[];

export const line = (text: string, style?: StyleName): SLine => [{ text, ...(style ? { style } : {}) }];

interface Cell {
  readonly ch: string;
  readonly w: number;
  readonly style: StyleName | undefined;
}

function toCells(l: SLine): Cell[] {
  return l.flatMap((s) => cells(s.text).map((c) => ({ ...c, style: s.style })));
}

function fromCells(cs: readonly Cell[]): SLine {
  const out: Seg[] = [];
  for (const c of cs) {
    const last = out[out.length - 1];
    if (last && last.style === c.style) out[out.length - 1] = { ...last, text: last.text + c.ch };
    else out.push({ text: c.ch, ...(c.style ? { style: c.style } : {}) });
  }
  return out;
}

/**
 * Word-wrap a line to `width` cells; continuation lines start with `hang` spaces. Breaks
 * after spaces; a word longer than a line is split.
 */
export function wrapLine(l: SLine, width: number, hang = 0): SLine[] {
  const w = Math.max(2, width);
  const h = Math.min(hang, Math.floor(w / 2));
  const all = toCells(l);
  if (all.reduce((s, c) => s + c.w, 0) <= w) return [l];
  // Tokens: a run of non-spaces with the spaces after it.
  const tokens: Cell[][] = [];
  let cur: Cell[] = [];
  for (let i = 0; i < all.length; i++) {
    const c = all[i]!;
    cur.push(c);
    const next = all[i + 1];
    if (c.ch === ' ' && (!next || next.ch !== ' ')) {
      tokens.push(cur);
      cur = [];
    }
  }
  if (cur.length) tokens.push(cur);
  const lines: Cell[][] = [];
  let row: Cell[] = [];
  let used = 0;
  const indent = (): Cell[] => Array.from({ length: h }, () => ({ ch: ' ', w: 1, style: undefined }));
  const newRow = () => {
    lines.push(row);
    row = indent();
    used = h;
  };
  for (const tok of tokens) {
    const bare = tok.filter((c, i) => !(c.ch === ' ' && tok.slice(i).every((d) => d.ch === ' ')));
    const bareW = bare.reduce((s, c) => s + c.w, 0);
    // A word longer than any line starts where it is and is split; others move to a new line.
    if (used + bareW > w && used > (lines.length ? h : 0) && bareW <= w - h) newRow();
    if (bareW > w - used) {
      // Longer than a line: split it cell by cell.
      for (const c of tok) {
        if (used + c.w > w) newRow();
        if (c.ch === ' ' && used === h && lines.length) continue;
        row.push(c);
        used += c.w;
      }
      continue;
    }
    for (const c of tok) {
      if (used + c.w > w) break; // trailing spaces past the edge
      row.push(c);
      used += c.w;
    }
  }
  lines.push(row);
  return lines.map((r) => {
    let end = r.length;
    while (end > 0 && r[end - 1]!.ch === ' ') end--;
    return fromCells(r.slice(0, end));
  });
}

export function wrapLines(ls: readonly SLine[], width: number, hang = 0): SLine[] {
  return ls.flatMap((l) => wrapLine(l, width, hang));
}

/** Cells [from, from + width) of a line (for sideways scrolling), with … where it is cut. */
export function sliceLine(l: SLine, from: number, width: number): SLine {
  const all = toCells(l);
  const out: Cell[] = [];
  let x = 0;
  const total = all.reduce((s, c) => s + c.w, 0);
  const cutLeft = from > 0 && total > 0;
  const cutRight = total - from > width;
  for (const c of all) {
    if (x >= from && x + c.w <= from + width) out.push(c);
    x += c.w;
  }
  if (cutLeft && out.length) out[0] = { ch: '…', w: 1, style: 'dim' };
  if (cutRight && out.length) {
    while (out.reduce((s, c) => s + c.w, 0) > width - 1) out.pop();
    out.push({ ch: '…', w: 1, style: 'dim' });
  }
  return fromCells(out);
}
