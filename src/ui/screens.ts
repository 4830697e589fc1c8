/** The screens of the app, in tab order, with their jump keys and help-line keys. */

export type ScreenId = 'tour' | 'families' | 'statistics' | 'modules' | 'symfun' | 'search' | 'export' | 'help';

export interface KeyHelp {
  readonly keys: string;
  readonly action: string;
}

export interface ScreenInfo {
  readonly id: ScreenId;
  readonly jump: string;
  readonly tab: string;
  readonly title: string;
  readonly keys: readonly KeyHelp[];
}

export const SCREENS: readonly ScreenInfo[] = [
  {
    id: 'tour',
    jump: '1',
    tab: 'Tour',
    title: 'Demo session: a seed of our own, its module, a search, an export',
    keys: [
      { keys: 'Enter', action: 'run the next step' },
      { keys: 'x', action: 'cancel' },
      { keys: '←/→', action: 'show another step' },
      { keys: 'r', action: 'start over' },
    ],
  },
  {
    id: 'families',
    jump: '2',
    tab: 'Families',
    title: 'Families of objects with statistics',
    keys: [
      { keys: '←/→', action: 'family' },
      { keys: '↑/↓ PgUp/PgDn', action: 'scroll' },
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
    title: 'Distribution of a statistic, or the joint table of two',
    keys: [
      { keys: '←/→', action: 'family' },
      { keys: '↑/↓', action: 'statistic' },
      { keys: 'j', action: 'second statistic (joint table)' },
      { keys: '+/-', action: 'size n' },
      { keys: 'p', action: 'edit parameters' },
      { keys: '[/]', action: 'scroll the chart' },
      { keys: 'g', action: 'search n = 1..N (all k)' },
      { keys: 'x', action: 'cancel a long count' },
    ],
  },
  {
    id: 'modules',
    jump: '4',
    tab: 'Modules',
    title: 'Closure of a seed under operators: Hilbert and Frobenius series',
    keys: [
      { keys: 'e', action: 'edit request' },
      { keys: 'Enter', action: 'compute' },
      { keys: 's', action: 'next example seed' },
      { keys: '+/-', action: 'n' },
      { keys: 'x', action: 'cancel' },
      { keys: 'arrows', action: 'select cell' },
      { keys: 'g', action: 'search the selected row' },
      { keys: 'G', action: 'search the whole table (q,t)' },
    ],
  },
  {
    id: 'symfun',
    jump: '5',
    tab: 'SymFun',
    title: 'Symmetric functions: evaluate an expression',
    keys: [
      { keys: 'e', action: 'edit expression' },
      { keys: 'Enter', action: 'evaluate' },
      { keys: '+/-', action: 'size {n}' },
      { keys: 'x', action: 'cancel' },
      { keys: '↑/↓', action: 'scroll' },
      { keys: 'g', action: 'search n = 1..N (all k)' },
      { keys: 'a', action: 'keep as an expression family' },
    ],
  },
  {
    id: 'search',
    jump: '6',
    tab: 'Search',
    title: 'Search the catalogue for a series',
    keys: [
      { keys: '[/]', action: 'choose the series' },
      { keys: 'e', action: 'type coefficients' },
      { keys: 'Enter', action: 'search' },
      { keys: 'x', action: 'cancel' },
      { keys: '↑/↓', action: 'browse candidates' },
      { keys: 'b', action: 'build the catalogue' },
    ],
  },
  {
    id: 'export',
    jump: '7',
    tab: 'Export',
    title: 'Write a result to a file',
    keys: [
      { keys: '↑/↓', action: 'result' },
      { keys: '←/→', action: 'format' },
      { keys: 'e', action: 'edit file name' },
      { keys: 'Enter', action: 'write' },
      { keys: 'f', action: 'overwrite an existing file' },
    ],
  },
  {
    id: 'help',
    jump: '?',
    tab: 'Help',
    title: 'Every key of every screen',
    keys: [{ keys: '↑/↓', action: 'scroll' }],
  },
];

export const GLOBAL_KEYS: readonly KeyHelp[] = [
  { keys: 'Tab / Shift+Tab', action: 'next / previous screen' },
  { keys: '1–7', action: 'jump to a screen (when no field is being edited)' },
  { keys: '?', action: 'this help' },
  { keys: 'Esc', action: 'leave the field being edited (Enter submits it; Ctrl+U clears it)' },
  { keys: 'q or Ctrl+C', action: 'quit (Ctrl+C also while editing)' },
];

/** The help line while a text field is being edited. */
export const EDIT_KEYS: readonly KeyHelp[] = [
  { keys: 'Enter', action: 'submit' },
  { keys: 'Esc', action: 'leave' },
  { keys: '←/→ Home/End', action: 'move' },
  { keys: 'Ctrl+U', action: 'clear' },
];

export function screenInfo(id: ScreenId): ScreenInfo {
  return SCREENS.find((s) => s.id === id) ?? SCREENS[0]!;
}
