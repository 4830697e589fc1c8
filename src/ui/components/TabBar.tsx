/** The top line: the program name and one tab per screen with its jump key. */
import { Text } from 'ink';
import { SCREENS, type ScreenId } from '../screens.js';
import { useTheme } from '../ThemeContext.js';

export function TabBar({ current, width }: { readonly current: ScreenId; readonly width: number }) {
  const theme = useTheme();
  const wide = width >= 96;
  // every tab stays visible: the program name gives way first when the tabs fill the line
  const tabs = SCREENS.reduce((n, s) => n + 1 + s.jump.length + s.tab.length + (wide ? 1 : 0), 0) + (theme.color ? 0 : 2);
  return (
    <Text wrap="truncate">
      {tabs + 6 <= width ? <Text {...theme.style('title')}>gradus</Text> : null}
      {SCREENS.map((s) => {
        const active = s.id === current;
        const label = wide ? `${s.jump} ${s.tab}` : `${s.jump}${s.tab}`;
        return (
          <Text key={s.id}>
            {' '}
            <Text {...theme.style(active ? 'tabActive' : 'tab')}>{active && !theme.color ? `[${label}]` : label}</Text>
          </Text>
        );
      })}
    </Text>
  );
}
