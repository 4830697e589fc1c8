/** What every screen receives from the app shell. */
import type { NewItem, Session } from './session.js';
import type { ScreenId } from './screens.js';

export interface ScreenProps {
  readonly width: number;
  readonly height: number;
  /** True when this screen is shown and owns the keyboard. */
  readonly active: boolean;
  readonly session: Session;
  /** Add a result to the session; returns its id. */
  addItem(item: NewItem): number;
  setCurrent(id: number): void;
  /** A text field is being edited: digits, q and ? then type instead of acting globally. */
  setEditing(editing: boolean): void;
  /** One line in the status bar (kind error shows in the error style). */
  notify(text: string, kind?: 'info' | 'error'): void;
  go(screen: ScreenId): void;
  /** Directory where exports are written by default. */
  readonly cwd: string;
  /** Environment (catalogue path, NO_COLOR). */
  readonly env: Readonly<Record<string, string | undefined>>;
}
