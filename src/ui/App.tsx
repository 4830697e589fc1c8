/**
 * The app shell: a tab bar, the current screen, a status line and a help line with the
 * keys of the current screen. Every screen stays mounted (hidden ones keep their state and
 * any running work); only the current one receives keys. All keys go through one queue
 * (keys/keyBus.ts), handled one at a time, so keys sent together are never lost.
 */
import { Box, Text, useApp, useStdin, useStdout } from 'ink';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { useCallback, useEffect, useMemo, useRef, useState, type ReactElement } from 'react';
import { ErrorBoundary } from './components/ErrorBoundary.js';
import { HelpLine } from './components/HelpLine.js';
import { Lines } from './components/Lines.js';
import { TabBar } from './components/TabBar.js';
import { errorText } from './errorText.js';
import { useKeys } from './hooks.js';
import { KeyBus } from './keys/keyBus.js';
import { KeysContext } from './keys/KeysContext.js';
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
import { addItem, addSavedItems, EMPTY_SESSION, markSaved, unsavedCount, type NewItem, type Session } from './session.js';
import { loadSession, saveSession } from './sessionFile.js';
import { line, wrapLine, type SLine } from './text/styledLine.js';
import { makeTheme } from './theme.js';
import { ThemeContext } from './ThemeContext.js';

export interface AppProps {
  /** Fixed size (tests); otherwise the terminal's, following resizes. */
  readonly size?: { readonly columns: number; readonly rows: number };
  readonly env?: Readonly<Record<string, string | undefined>>;
  readonly cwd?: string;
  readonly initialScreen?: ScreenId;
  /** A session file to open at start. */
  readonly sessionFile?: string;
  /** The key queue to use (tests watch it to know when every key sent has been handled). */
  readonly keyBus?: KeyBus;
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

/** The status line may take this many lines before it is cut (with …). */
const STATUS_LINES = 3;

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

/** A session file name in `dir` that is not taken yet. */
function freshSessionPath(dir: string): string {
  for (let i = 1; ; i++) {
    const p = join(dir, i === 1 ? 'gradus-session.json' : `gradus-session-${i}.json`);
    if (!existsSync(p)) return p;
  }
}

export function App(props: AppProps) {
  const env = props.env ?? process.env;
  const theme = useMemo(() => makeTheme(env), [env]);
  const bus = useMemo(() => props.keyBus ?? new KeyBus(), [props.keyBus]);
  return (
    <KeysContext.Provider value={bus}>
      <ThemeContext.Provider value={theme}>
        <Shell {...props} bus={bus} />
      </ThemeContext.Provider>
    </KeysContext.Provider>
  );
}

function Shell(props: AppProps & { readonly bus: KeyBus }) {
  const env = props.env ?? process.env;
  const cwd = props.cwd ?? process.cwd();
  const bus = props.bus;
  const { exit } = useApp();
  const { internal_eventEmitter: input, setRawMode, isRawModeSupported } = useStdin();
  const { columns, rows } = useTerminalSize(props.size);
  const [screen, setScreen] = useState<ScreenId>(props.initialScreen ?? 'tour');
  const [back, setBack] = useState<ScreenId>('tour');
  const [editing, setEditing] = useState(false);
  const [session, setSession] = useState<Session>(EMPTY_SESSION);
  // The session file: `ours` once this session has written or read it (then saving replaces it).
  const [sessionFile, setSessionFile] = useState(() => ({ path: props.sessionFile ? resolve(cwd, props.sessionFile) : freshSessionPath(cwd), ours: false }));
  const [confirmQuit, setConfirmQuit] = useState(false);
  const [status, setStatus] = useState<{ text: string; kind: 'info' | 'error' }>({
    text: 'Welcome. Enter runs the demo step by step; Tab moves between screens; ? lists every key.',
    kind: 'info',
  });
  const sessionRef = useRef(session);
  sessionRef.current = session;
  const sessionFileRef = useRef(sessionFile);
  sessionFileRef.current = sessionFile;

  const notify = useCallback((text: string, kind: 'info' | 'error' = 'info') => setStatus({ text, kind }), []);
  useEffect(() => {
    bus.onError = (e) => notify(errorText(e), 'error');
  }, [bus, notify]);

  // Raw input goes to the key queue; ink's own per-component input is not used.
  useEffect(() => {
    if (isRawModeSupported) setRawMode(true);
    const onInput = (chunk: string) => bus.push(chunk);
    input.on('input', onInput);
    return () => {
      input.off('input', onInput);
      bus.stop();
      if (isRawModeSupported) setRawMode(false);
    };
  }, [bus, input, setRawMode, isRawModeSupported]);

  const go = useCallback((id: ScreenId) => {
    setEditing(false);
    setScreen((cur) => {
      if (id === 'help' && cur !== 'help') setBack(cur);
      return id;
    });
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

  const save = useCallback(
    (path: string, force: boolean): boolean => {
      const s = sessionRef.current;
      try {
        // The session's own file (written or read by it) is replaced; any other file only with W.
        const own = sessionFileRef.current.ours && sessionFileRef.current.path === path;
        const bytes = saveSession(s.items, path, force || own, 'W');
        setSession(markSaved);
        setSessionFile({ path, ours: true });
        notify(`session saved: ${s.items.length} result${s.items.length === 1 ? '' : 's'}, ${bytes} bytes in ${path}`);
        return true;
      } catch (e) {
        notify(errorText(e, 'session'), 'error');
        return false;
      }
    },
    [notify],
  );
  const open = useCallback(
    (path: string): boolean => {
      try {
        const items = loadSession(path);
        setSession((s) => addSavedItems(s, items));
        setSessionFile({ path, ours: true });
        notify(`session opened: ${items.length} result${items.length === 1 ? '' : 's'} from ${path}`);
        return true;
      } catch (e) {
        notify(errorText(e, 'session'), 'error');
        return false;
      }
    },
    [notify],
  );
  const opened = useRef(false);
  useEffect(() => {
    if (props.sessionFile && !opened.current && existsSync(resolve(cwd, props.sessionFile))) open(resolve(cwd, props.sessionFile));
    opened.current = true;
  }, [props.sessionFile, cwd, open]);

  const quit = () => {
    if (unsavedCount(sessionRef.current) === 0) return exit();
    setConfirmQuit(true);
  };

  useKeys(
    (ch, key) => {
      if (confirmQuit) {
        setConfirmQuit(false);
        if (ch === 'y' || (key.ctrl && ch === 'c')) exit();
        else if (ch === 's') {
          // Never over a file this session did not write or read.
          const path = sessionFile.ours || !existsSync(sessionFile.path) ? sessionFile.path : freshSessionPath(cwd);
          if (save(path, false)) exit();
        } else notify('not quitting');
        return true;
      }
      if (key.ctrl && ch === 'c') {
        quit();
        return true;
      }
      if (key.tab) {
        // Functional update: keys typed faster than a redraw still move one screen each.
        setEditing(false);
        setScreen((cur) => {
          const order = SCREENS.filter((s) => s.id !== 'help');
          const idx = Math.max(0, order.findIndex((s) => s.id === (cur === 'help' ? back : cur)));
          return order[(idx + (key.shift ? order.length - 1 : 1)) % order.length]!.id;
        });
        return true;
      }
      if (bus.textMode()) return false;
      if (ch === 'q') {
        quit();
        return true;
      }
      if (ch === '?' || (key.escape && screen === 'help')) {
        go(screen === 'help' ? back : 'help');
        return true;
      }
      const target = SCREENS.find((s) => s.jump === ch);
      if (target) {
        go(target.id);
        return true;
      }
      return false;
    },
    true,
    { global: true },
  );

  // The last column stays empty: content never reaches the terminal's edge (where some
  // terminals wrap), so a line as wide as the window can only be one cut by the layout.
  const width = Math.max(40, columns) - 1;
  const unsaved = unsavedCount(session);
  const statusLine: SLine = confirmQuit
    ? [
        { text: `Quit? ${unsaved} result${unsaved === 1 ? '' : 's'} of this session ${unsaved === 1 ? 'is' : 'are'} not saved. `, style: 'warn' },
        { text: 'y', style: 'key' },
        { text: ' quits, ' },
        { text: 's', style: 'key' },
        { text: ' saves the session and quits, any other key stays.' },
      ]
    : line(`${status.kind === 'error' ? '✗ ' : ''}${status.text}`, status.kind === 'error' ? 'error' : 'dim');
  let statusLines = wrapLine(statusLine, width, 2);
  if (statusLines.length > STATUS_LINES) {
    statusLines = statusLines.slice(0, STATUS_LINES);
    statusLines[STATUS_LINES - 1] = [...statusLines[STATUS_LINES - 1]!, { text: '…', style: 'dim' }];
  }
  // One line each for the tab bar and help line, the status lines, and one spare so the
  // frame never fills the terminal (a full frame makes ink clear the screen on every redraw).
  const bodyHeight = Math.max(6, rows - 3 - statusLines.length);
  // A file given at start that could not be read as a session is never offered for saving.
  const savePath = sessionFile.ours || !existsSync(sessionFile.path) ? sessionFile.path : freshSessionPath(cwd);
  const common = { width, height: bodyHeight, session, sessionPath: savePath, addItem: add, setCurrent, setEditing, notify, go, saveSession: save, openSession: open, cwd, env };
  return (
    <Box flexDirection="column" width={width}>
      <TabBar current={screen} width={width} />
      <Box minHeight={bodyHeight} flexDirection="column">
        {SCREENS.map((s) => {
          const Screen = SCREEN_COMPONENTS[s.id];
          return (
            <Box key={s.id} display={s.id === screen ? 'flex' : 'none'} flexDirection="column">
              <ErrorBoundary resetKey={screen}>
                <Screen {...common} active={s.id === screen && !confirmQuit} />
              </ErrorBoundary>
            </Box>
          );
        })}
      </Box>
      <Lines lines={statusLines} />
      {confirmQuit ? <Text> </Text> : <HelpLine keys={editing ? EDIT_KEYS : screenInfo(screen).keys} width={width} />}
    </Box>
  );
}
