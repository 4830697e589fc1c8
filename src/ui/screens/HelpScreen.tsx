/** Every key of every screen, scrollable. */
import { Box, Text } from 'ink';
import { useState } from 'react';
import { GLOBAL_KEYS, SCREENS } from '../screens.js';
import { useKeys } from '../hooks.js';
import type { ScreenProps } from '../ScreenProps.js';
import { useTheme } from '../ThemeContext.js';

export function helpLines(): { text: string; key?: string; heading?: boolean }[] {
  const lines: { text: string; key?: string; heading?: boolean }[] = [{ text: 'Everywhere', heading: true }];
  for (const k of GLOBAL_KEYS) lines.push({ key: k.keys, text: k.action });
  for (const s of SCREENS) {
    if (s.id === 'help') continue;
    lines.push({ text: `${s.jump} ${s.tab} — ${s.title}`, heading: true });
    for (const k of s.keys) lines.push({ key: k.keys, text: k.action });
  }
  return lines;
}

export function HelpScreen(props: ScreenProps) {
  const theme = useTheme();
  const [offset, setOffset] = useState(0);
  const lines = helpLines();
  const room = props.height;
  const maxOff = Math.max(0, lines.length - room);
  useKeys(
    (_input, key) => {
      if (key.downArrow || key.pageDown) setOffset((o) => Math.min(maxOff, o + (key.pageDown ? room : 1)));
      if (key.upArrow || key.pageUp) setOffset((o) => Math.max(0, o - (key.pageUp ? room : 1)));
    },
    props.active,
  );
  const keyW = Math.max(...lines.map((l) => l.key?.length ?? 0)) + 2;
  return (
    <Box flexDirection="column">
      {lines.slice(offset, offset + room).map((l, i) =>
        l.heading ? (
          <Text key={i} wrap="truncate" {...theme.style('title')}>
            {l.text}
          </Text>
        ) : (
          <Text key={i} wrap="truncate">
            {'  '}
            <Text {...theme.style('key')}>{(l.key ?? '').padEnd(keyW)}</Text>
            {l.text}
          </Text>
        ),
      )}
    </Box>
  );
}
