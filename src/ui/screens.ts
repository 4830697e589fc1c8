/** The screens of the app, in tab order, with their jump keys and help-line keys. */

export type ScreenId = 'tour' | 'families' | 'statistics' | 'modules' | 'symfun' | 'search' | 'export' | 'sweep' | 'help';

export interface KeyHelp {
  readonly keys: string;
  readonly action: string;
}

export interface ScreenInfo {
  readonly id: ScreenId;
  readonly jump: string;
  readonly tab: string;
  /** The tab's name in a narrow window. */
  readonly short: string;
  readonly title: string;
  readonly keys: readonly KeyHelp[];
}

const SCROLL: KeyHelp = { keys: 'PgUp/PgDn', action: 'scroll' };

export const SCREENS: readonly ScreenInfo[] = [
  {
    id: 'tour',
    jump: '1',
    tab: 'Tour',
    short: 'Tour',
    title: 'Demo session: a seed of our own, its module, a search, an export',
    keys: [
      { keys: 'Enter', action: 'run the next step' },
      { keys: 'x', action: 'cancel' },
      { keys: '←/→', action: 'show another step' },
      { keys: '↑/↓ PgUp/PgDn', action: 'scroll' },
      { keys: 'r', action: 'start over' },
    ],
  },
  {
    id: 'families',
    jump: '2',
    tab: 'Families',
    short: 'Fam',
    title: 'Families of objects with statistics',
    keys: [
      { keys: '←/→', action: 'family' },
      { keys: '↑/↓ PgUp/PgDn', action: 'scroll' },
      { keys: '</>', action: 'scroll sideways' },
      { keys: 'p', action: 'edit parameters' },
      { keys: 'a', action: 'add statistic' },
      { keys: 's', action: 'change last statistic' },
      { keys: 'd', action: 'drop last statistic' },
    ],
  },
  {
    id: 'statistics',
    jump: '3',
    tab: 'Statistics',
    short: 'Stat',
    title: 'Distribution of a statistic, or the joint table of two',
    keys: [
      { keys: '←/→', action: 'family' },
      { keys: '↑/↓', action: 'statistic' },
      { keys: 'j', action: 'second statistic (joint table)' },
      { keys: '+/-', action: 'size n' },
      { keys: 'p', action: 'edit parameters' },
      SCROLL,
      { keys: '</>', action: 'table columns' },
      { keys: 'g', action: 'search n = 1..N (all k)' },
      { keys: 'x', action: 'cancel a long count' },
    ],
  },
  {
    id: 'modules',
    jump: '4',
    tab: 'Modules',
    short: 'Mod',
    title: 'Closure of a seed under operators: Hilbert and Frobenius series',
    keys: [
      { keys: 'e', action: 'edit request' },
      { keys: 'Enter', action: 'compute' },
      { keys: 's', action: 'next example seed' },
      { keys: '+/-', action: 'n' },
      { keys: 'x', action: 'cancel' },
      { keys: 'arrows', action: 'select cell' },
      SCROLL,
      { keys: 'g', action: 'search the selected row' },
      { keys: 'G', action: 'search the whole table (q,t)' },
    ],
  },
  {
    id: 'symfun',
    jump: '5',
    tab: 'SymFun',
    short: 'Sym',
    title: 'Symmetric functions: evaluate an expression',
    keys: [
      { keys: 'e', action: 'edit expression' },
      { keys: 'Enter', action: 'evaluate' },
      { keys: '+/-', action: 'size {n}' },
      { keys: '↑/↓ PgUp/PgDn', action: 'scroll' },
      { keys: 'x', action: 'cancel' },
      { keys: 'g', action: 'search n = 1..N (all k)' },
      { keys: 'a', action: 'keep as an expression family' },
    ],
  },
  {
    id: 'search',
    jump: '6',
    tab: 'Search',
    short: 'Srch',
    title: 'Search the catalogue for a series',
    keys: [
      { keys: 'Enter', action: 'search' },
      { keys: '[/]', action: 'choose the series' },
      { keys: 'e', action: 'type coefficients' },
      { keys: '↑/↓', action: 'browse candidates' },
      SCROLL,
      { keys: 'x', action: 'cancel' },
      { keys: 'b', action: 'build the catalogue' },
    ],
  },
  {
    id: 'export',
    jump: '7',
    tab: 'Export',
    short: 'Exp',
    title: 'Write a result to a file; save or open the session',
    keys: [
      { keys: '↑/↓', action: 'result' },
      { keys: '←/→', action: 'format' },
      { keys: 'Enter', action: 'write' },
      { keys: 'e', action: 'edit file name' },
      { keys: 'f', action: 'overwrite an existing file' },
      { keys: 'w', action: 'save the session' },
      { keys: 'o', action: 'open a session file' },
      SCROLL,
    ],
  },
  {
    id: 'sweep',
    jump: '8',
    tab: 'Sweep',
    short: 'Swp',
    title: 'Sweep a family of seeds and rank what is remarkable',
    keys: [
      { keys: 'Enter', action: 'run the sweep' },
      { keys: 'e', action: 'edit the sweep' },
      { keys: 's', action: 'next example sweep' },
      { keys: 'x', action: 'cancel' },
      { keys: '↑/↓ PgUp/PgDn', action: 'select a seed' },
      { keys: 'o', action: 'open its module (←/→ other places, Esc back)' },
      { keys: 'g', action: 'search its Hilbert series' },
      { keys: 'f', action: 'export format' },
      { keys: 'w / W', action: 'write the table / overwrite' },
    ],
  },
  {
    id: 'help',
    jump: '?',
    tab: 'Help',
    short: 'Help',
    title: 'Every key of every screen',
    keys: [
      { keys: '↑/↓ PgUp/PgDn', action: 'scroll' },
      { keys: 'Esc or ?', action: 'back' },
    ],
  },
];

export const GLOBAL_KEYS: readonly KeyHelp[] = [
  { keys: 'Tab / Shift+Tab', action: 'next / previous screen' },
  { keys: '1–8', action: 'jump to a screen (when no field is being edited)' },
  { keys: '?', action: 'this help; ? or Esc goes back' },
  { keys: 'Esc', action: 'leave the field being edited, keeping what it held before (Enter submits it; Ctrl+U clears it)' },
  { keys: 'q or Ctrl+C', action: 'quit; asks first when results of the session are not saved (Ctrl+C also while editing)' },
];

/** The help line while a text field is being edited. */
export const EDIT_KEYS: readonly KeyHelp[] = [
  { keys: 'Enter', action: 'submit' },
  { keys: 'Esc', action: 'cancel' },
  { keys: '←/→ Home/End', action: 'move' },
  { keys: 'Ctrl+U', action: 'clear' },
];

export function screenInfo(id: ScreenId): ScreenInfo {
  return SCREENS.find((s) => s.id === id) ?? SCREENS[0]!;
}
