/**
 * Colours of the app. With NO_COLOR set (any value, common practice: no-color.org) every
 * style is empty, so no escape code reaches the terminal; selection is then shown by
 * text markers alone, which the components draw in every mode.
 */
import type { TextProps } from 'ink';

export type StyleName = 'title' | 'tab' | 'tabActive' | 'key' | 'dim' | 'ok' | 'warn' | 'error' | 'accent' | 'selected' | 'value';

export interface Theme {
  readonly color: boolean;
  style(name: StyleName): TextProps;
}

const STYLES: Readonly<Record<StyleName, TextProps>> = {
  title: { color: 'cyanBright', bold: true },
  tab: { color: 'gray' },
  tabActive: { color: 'black', backgroundColor: 'cyan' },
  key: { color: 'yellow' },
  dim: { color: 'gray' },
  ok: { color: 'green' },
  warn: { color: 'yellow' },
  error: { color: 'redBright', bold: true },
  accent: { color: 'magentaBright' },
  selected: { color: 'black', backgroundColor: 'yellow' },
  value: { color: 'cyan' },
};

export function makeTheme(env: Readonly<Record<string, string | undefined>>): Theme {
  // no-color.org: NO_COLOR present and not empty disables colour.
  const color = !(env['NO_COLOR'] !== undefined && env['NO_COLOR'] !== '');
  return {
    color,
    style: (name) => (color ? STYLES[name] : {}),
  };
}
