/** The bottom line: the keys of the current screen, then the global ones, cut to fit. */
import { Text } from 'ink';
import type { KeyHelp } from '../screens.js';
import { useTheme } from '../ThemeContext.js';

export function HelpLine({ keys, width }: { readonly keys: readonly KeyHelp[]; readonly width: number }) {
  const theme = useTheme();
  const all: KeyHelp[] = [...keys, { keys: 'Tab', action: 'screen' }, { keys: '?', action: 'help' }, { keys: 'q', action: 'quit' }];
  const parts: KeyHelp[] = [];
  let used = 0;
  for (const k of all) {
    const len = k.keys.length + 1 + k.action.length + 2;
    if (used + len > width) break;
    parts.push(k);
    used += len;
  }
  return (
    <Text wrap="truncate">
      {parts.map((k, i) => (
        <Text key={i}>
          <Text {...theme.style('key')}>{k.keys}</Text> {k.action}
          {i < parts.length - 1 ? '  ' : ''}
        </Text>
      ))}
    </Text>
  );
}
