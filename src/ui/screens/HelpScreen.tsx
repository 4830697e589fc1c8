/** Every key of every screen, wrapped to the window and scrollable. */
import { useKeys } from '../hooks.js';
import { Lines } from '../components/Lines.js';
import { GLOBAL_KEYS, SCREENS, type KeyHelp } from '../screens.js';
import type { ScreenProps } from '../ScreenProps.js';
import { line, wrapLine, type SLine } from '../text/styledLine.js';
import { useScroll } from '../useScroll.js';

export function helpLines(width: number): SLine[] {
  const keyW = Math.min(18, Math.max(...[...GLOBAL_KEYS, ...SCREENS.flatMap((s) => s.keys)].map((k) => [...k.keys].length)) + 2);
  const entry = (k: KeyHelp): SLine[] => wrapLine([{ text: '  ' }, { text: k.keys.padEnd(keyW), style: 'key' }, { text: k.action }], width, keyW + 2);
  const out: SLine[] = [line('Everywhere', 'title'), ...GLOBAL_KEYS.flatMap(entry)];
  for (const s of SCREENS) {
    if (s.id === 'help') continue;
    out.push(...wrapLine(line(`${s.jump} ${s.tab} — ${s.title}`, 'title'), width, 2));
    out.push(...s.keys.flatMap(entry));
  }
  return out;
}

export function HelpScreen(props: ScreenProps) {
  const scroll = useScroll();
  useKeys((input, key) => void scroll.handle(input, key, true), props.active);
  const win = scroll.view(helpLines(props.width), props.height, undefined, ['↑/PgUp', '↓/PgDn']);
  return <Lines lines={win.lines} />;
}
