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

const STEPS: readonly (readonly [Mode, boolean])[] = [['wide', true], ['full', true], ['full', false], ['short', true], ['keys', true]];

export function tabBarText(current: ScreenId, width: number, color: boolean): { mode: Mode; title: boolean; parts: { text: string; active: boolean }[] } {
  for (const [mode, title] of STEPS) {
    const parts = SCREENS.map((s) => {
      const active = s.id === current;
      const l = label(s, mode, active);
      return { text: active && !color ? `[${l}]` : l, active };
    });
    const w = (title ? cellWidth('gradus') : -1) + parts.reduce((n, p) => n + 1 + cellWidth(p.text), 0);
    if (w <= width || mode === 'keys') return { mode, title, parts };
  }
  throw new Error('unreachable');
}

export function TabBar({ current, width }: { readonly current: ScreenId; readonly width: number }) {
  const theme = useTheme();
  const { title, parts } = tabBarText(current, width, theme.color);
  return (
    <Text wrap="truncate">
      {title ? <Text {...theme.style('title')}>gradus</Text> : null}
      {parts.map((p, i) => (
        <Text key={i}>
          {title || i > 0 ? ' ' : ''}
          <Text {...theme.style(p.active ? 'tabActive' : 'tab')}>{p.text}</Text>
        </Text>
      ))}
    </Text>
  );
}
