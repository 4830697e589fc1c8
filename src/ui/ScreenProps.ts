/** What every screen receives from the app shell. */
import type { NewItem, Session } from './session.js';
import type { ScreenId } from './screens.js';

export interface ScreenProps {
  readonly width: number;
  /** Lines the screen may use; its content scrolls (with markers) within them. */
  readonly height: number;
  /** True when this screen is shown and owns the keyboard. */
  readonly active: boolean;
  readonly session: Session;
  /** Where the session is saved (the last file saved or opened, or a fresh name). */
  readonly sessionPath: string;
  /** Add a result to the session; returns its id. */
  addItem(item: NewItem): number;
  setCurrent(id: number): void;
  /** A text field is being edited (shown on the help line). */
  setEditing(editing: boolean): void;
  /** One line in the status bar (kind error shows in the error style). */
  notify(text: string, kind?: 'info' | 'error'): void;
  go(screen: ScreenId): void;
  /** Write the session's results to a file (true when written). */
  saveSession(path: string, force: boolean): boolean;
  /** Add the results of a session file to this session (true when read). */
  openSession(path: string): boolean;
  /** Directory where exports are written by default. */
  readonly cwd: string;
  /** Environment (catalogue path, NO_COLOR). */
  readonly env: Readonly<Record<string, string | undefined>>;
}
