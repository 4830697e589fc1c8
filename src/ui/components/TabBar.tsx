/**
 * The top line: the program name and one tab per screen with its jump key. Names shorten as
 * the window narrows (full, then short, then the jump key alone beside the current screen's
 * name), so every screen keeps a visible tab at any width.
 */
import { Text } from 'ink';
import { SCREENS, type ScreenId } from '../screens.js';
import { cellWidth } from '../text/cellWidth.js';
import { useTheme } from '../ThemeContext.js';

type Mode = 'wide' | 'full' | 'short' | 'keys';

function label(s: (typeof SCREENS)[number], mode: Mode, active: boolean): string {
  if (mode === 'wide') return `${s.jump} ${s.tab}`;
  if (mode === 'full') return `${s.jump}${s.tab}`;
  if (mode === 'short') return `${s.jump}${s.short}`;
  return active ? `${s.jump}${s.tab}` : s.jump;
}

export function tabBarText(current: ScreenId, width: number, color: boolean): { mode: Mode; parts: { text: string; active: boolean }[] } {
  for (const mode of ['wide', 'full', 'short', 'keys'] as const) {
    const parts = SCREENS.map((s) => {
      const active = s.id === current;
      const l = label(s, mode, active);
      return { text: active && !color ? `[${l}]` : l, active };
    });
    const w = cellWidth('gradus') + parts.reduce((n, p) => n + 1 + cellWidth(p.text), 0);
    if (w <= width || mode === 'keys') return { mode, parts };
  }
  throw new Error('unreachable');
}

export function TabBar({ current, width }: { readonly current: ScreenId; readonly width: number }) {
  const theme = useTheme();
  const { parts } = tabBarText(current, width, theme.color);
  return (
    <Text wrap="truncate">
      <Text {...theme.style('title')}>gradus</Text>
      {parts.map((p, i) => (
        <Text key={i}>
          {' '}
          <Text {...theme.style(p.active ? 'tabActive' : 'tab')}>{p.text}</Text>
        </Text>
      ))}
    </Text>
  );
}
