/**
 * The bottom line: the keys of the current screen, then the global ones. Keys that do not
 * fit are left out whole (never cut mid-word) and a … says so; the help screen (?) lists all.
 */
import { Text } from 'ink';
import type { KeyHelp } from '../screens.js';
import { cellWidth } from '../text/cellWidth.js';
import { useTheme } from '../ThemeContext.js';

const GLOBAL: readonly KeyHelp[] = [{ keys: 'Tab', action: 'screen' }, { keys: '?', action: 'help' }, { keys: 'q', action: 'quit' }];

export function helpLineParts(keys: readonly KeyHelp[], width: number): { parts: KeyHelp[]; more: boolean } {
  const len = (k: KeyHelp) => cellWidth(k.keys) + 1 + cellWidth(k.action) + 2;
  let used = GLOBAL.reduce((s, k) => s + len(k), 0) + 3;
  const own: KeyHelp[] = [];
  let more = false;
  for (const k of keys) {
    if (more || used + len(k) > width) {
      more = true;
      continue;
    }
    own.push(k);
    used += len(k);
  }
  return { parts: [...own, ...GLOBAL], more };
}

export function HelpLine({ keys, width }: { readonly keys: readonly KeyHelp[]; readonly width: number }) {
  const theme = useTheme();
  const { parts, more } = helpLineParts(keys, width);
  const own = parts.length - GLOBAL.length;
  return (
    <Text wrap="truncate">
      {parts.map((k, i) => (
        <Text key={i}>
          {i === own && more ? <Text {...theme.style('dim')}>…  </Text> : null}
          <Text {...theme.style('key')}>{k.keys}</Text> {k.action}
          {i < parts.length - 1 ? '  ' : ''}
        </Text>
      ))}
    </Text>
  );
}
