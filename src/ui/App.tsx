/**
 * The app shell: a tab bar, the current screen, a status line and a help line with the
 * keys of the current screen. Every screen stays mounted (hidden ones keep their state and
 * any running work); only the current one receives keys.
 */
import { Box, Text, useApp, useStdout } from 'ink';
import { setKeyErrorListener, useKeys } from './hooks.js';
import { errorText } from './errorText.js';
import { useCallback, useEffect, useMemo, useState, type ReactElement } from 'react';
import { ErrorBoundary } from './components/ErrorBoundary.js';
import { HelpLine } from './components/HelpLine.js';
import { TabBar } from './components/TabBar.js';
import type { ScreenProps } from './ScreenProps.js';
import { EDIT_KEYS, SCREENS, screenInfo, type ScreenId } from './screens.js';
import { ExportScreen } from './screens/ExportScreen.js';
import { FamiliesScreen } from './screens/FamiliesScreen.js';
import { HelpScreen } from './screens/HelpScreen.js';
import { ModulesScreen } from './screens/ModulesScreen.js';
import { SearchScreen } from './screens/SearchScreen.js';
import { StatisticsScreen } from './screens/StatisticsScreen.js';
import { SweepScreen } from './screens/SweepScreen.js';
import { SymfunScreen } from './screens/SymfunScreen.js';
import { TourScreen } from './screens/TourScreen.js';
import { addItem, EMPTY_SESSION, type NewItem, type Session } from './session.js';
import { makeTheme } from './theme.js';
import { ThemeContext } from './ThemeContext.js';

export interface AppProps {
  /** Fixed size (tests); otherwise the terminal's, following resizes. */
  readonly size?: { readonly columns: number; readonly rows: number };
  readonly env?: Readonly<Record<string, string | undefined>>;
  readonly cwd?: string;
  readonly initialScreen?: ScreenId;
}

const SCREEN_COMPONENTS: Readonly<Record<ScreenId, (p: ScreenProps) => ReactElement | null>> = {
  tour: TourScreen,
  families: FamiliesScreen,
  statistics: StatisticsScreen,
  modules: ModulesScreen,
  symfun: SymfunScreen,
  search: SearchScreen,
  export: ExportScreen,
  sweep: SweepScreen,
  help: HelpScreen,
};

function useTerminalSize(fixed: AppProps['size']): { columns: number; rows: number } {
  const { stdout } = useStdout();
  const read = () => ({ columns: stdout.columns || 80, rows: stdout.rows || 24 });
  const [size, setSize] = useState(read);
  useEffect(() => {
    if (fixed) return;
    const onResize = () => setSize(read());
    stdout.on('resize', onResize);
    return () => {
      stdout.off('resize', onResize);
    };
  }, [stdout, fixed]);
  return fixed ?? size;
}

export function App(props: AppProps) {
  const env = props.env ?? process.env;
  const theme = useMemo(() => makeTheme(env), [env]);
  const { exit } = useApp();
  const { columns, rows } = useTerminalSize(props.size);
  const [screen, setScreen] = useState<ScreenId>(props.initialScreen ?? 'tour');
  const [editing, setEditing] = useState(false);
  const [session, setSession] = useState<Session>(EMPTY_SESSION);
  const [status, setStatus] = useState<{ text: string; kind: 'info' | 'error' }>({
    text: 'Welcome. Enter runs the demo step by step; Tab moves between screens.',
    kind: 'info',
  });

  const go = useCallback((id: ScreenId) => {
    setEditing(false);
    setScreen(id);
  }, []);
  const add = useCallback((item: NewItem) => {
    let newId = 0;
    setSession((s) => {
      const [next, id] = addItem(s, item);
      newId = id;
      return next;
    });
    return newId;
  }, []);
  const setCurrent = useCallback((id: number) => setSession((s) => ({ ...s, current: id })), []);
  const notify = useCallback((text: string, kind: 'info' | 'error' = 'info') => setStatus({ text, kind }), []);
  useEffect(() => setKeyErrorListener((e) => notify(errorText(e), 'error')), [notify]);

  useKeys((input, key) => {
    if (key.tab) {
      // Functional update: keys typed faster than a redraw still move one screen each.
      setEditing(false);
      setScreen((cur) => {
        const order = SCREENS.filter((s) => s.id !== 'help');
        const idx = Math.max(0, order.findIndex((s) => s.id === cur));
        return order[(idx + (key.shift ? order.length - 1 : 1)) % order.length]!.id;
      });
      return;
    }
    if (editing) return;
    if (input === 'q') return exit();
    if (input === '?') return go(screen === 'help' ? 'tour' : 'help');
    const target = SCREENS.find((s) => s.jump === input);
    if (target) go(target.id);
  }, true);

  // One line each for the tab bar, status and help line; one spare so the frame never
  // fills the terminal (a full frame makes ink clear the screen on every redraw).
  const bodyHeight = Math.max(6, rows - 4);
  const width = Math.max(40, columns);
  const common = { width, height: bodyHeight, session, addItem: add, setCurrent, setEditing, notify, go, cwd: props.cwd ?? process.cwd(), env };
  return (
    <ThemeContext.Provider value={theme}>
      <Box flexDirection="column" width={width}>
        <TabBar current={screen} width={width} />
        <Box height={bodyHeight} flexDirection="column" overflow="hidden">
          {SCREENS.map((s) => {
            const Screen = SCREEN_COMPONENTS[s.id];
            return (
              <Box key={s.id} display={s.id === screen ? 'flex' : 'none'} flexDirection="column" height={bodyHeight}>
                <ErrorBoundary resetKey={screen}>
                  <Screen {...common} active={s.id === screen} />
                </ErrorBoundary>
              </Box>
            );
          })}
        </Box>
        <Text wrap="truncate" {...theme.style(status.kind === 'error' ? 'error' : 'dim')}>
          {status.kind === 'error' ? '✗ ' : ''}
          {status.text}
        </Text>
        <HelpLine keys={editing ? EDIT_KEYS : screenInfo(screen).keys} width={width} />
      </Box>
    </ThemeContext.Provider>
  );
}
