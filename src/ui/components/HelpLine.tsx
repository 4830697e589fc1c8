/** The bottom line: the keys of the current screen, then the global ones, cut to fit. */
import { Text } from 'ink';
import type { KeyHelp } from '../screens.js';
import { useTheme } from '../ThemeContext.js';

export function HelpLine({ keys, width }: { readonly keys: readonly KeyHelp[]; readonly width: number }) {
  const theme = useTheme();
  // The global keys always show; the screen's own keys fill the room before them.
  const global: KeyHelp[] = [{ keys: 'Tab', action: 'screen' }, { keys: '?', action: 'help' }, { keys: 'q', action: 'quit' }];
  const len = (k: KeyHelp) => k.keys.length + 1 + k.action.length + 2;
  let used = global.reduce((s, k) => s + len(k), 0);
  const own: KeyHelp[] = [];
  for (const k of keys) {
    if (used + len(k) > width) break;
    own.push(k);
    used += len(k);
  }
  const parts = [...own, ...global];
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
