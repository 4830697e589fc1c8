/**
 * What the screens share: the results computed so far (each may carry a series to search
 * and an engine result to export), which of them is "current" for the search, and which are
 * kept in a session file (the others would be lost on quitting).
 */
import type { Target } from '../series/target.js';

export type ItemOrigin = 'module' | 'symfun' | 'statistics' | 'typed' | 'search' | 'family';

export interface SessionItem {
  readonly id: number;
  readonly title: string;
  readonly origin: ItemOrigin;
  /** A target (series over n, k) the search can take. */
  readonly target?: Target;
  /** The engine's own result, kept whole for export. */
  readonly payload?: unknown;
  /** Written to (or read from) a session file since it was added. */
  readonly saved?: boolean;
}

export interface Session {
  readonly items: readonly SessionItem[];
  /** Id of the item the search screen starts from. */
  readonly current: number | undefined;
}

export const EMPTY_SESSION: Session = { items: [], current: undefined };

export type NewItem = Omit<SessionItem, 'id'>;

/** Add an item (the newest first in lists); an item with a series becomes current. */
export function addItem(s: Session, item: NewItem): [Session, number] {
  const id = s.items.reduce((m, x) => Math.max(m, x.id), 0) + 1;
  const items = [...s.items, { ...item, id }];
  return [{ items, current: item.target ? id : s.current }, id];
}

/** Items read from a session file, added after those already here (nothing is replaced). */
export function addSavedItems(s: Session, items: readonly NewItem[]): Session {
  let out = s;
  for (const x of items) out = addItem(out, { ...x, saved: true })[0];
  return out;
}

export function markSaved(s: Session): Session {
  return { ...s, items: s.items.map((x) => (x.saved ? x : { ...x, saved: true })) };
}

export function unsavedCount(s: Session): number {
  return s.items.filter((x) => !x.saved).length;
}

export function currentItem(s: Session): SessionItem | undefined {
  return s.items.find((x) => x.id === s.current);
}
