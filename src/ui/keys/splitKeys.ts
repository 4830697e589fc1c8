/**
 * Splits what the terminal sent into single key presses. Keys that arrive together (auto-repeat,
 * a paste, a slow remote link) come as one chunk such as "\u001b[C\u001b[C", "+++" or
 * "n=6\u007f4\r": escape sequences, control characters and printable text are told apart and
 * returned in order. A printable run stays one entry (a text field inserts it whole; other
 * handlers take it one character at a time).
 */

export interface KeyInfo {
  readonly upArrow: boolean;
  readonly downArrow: boolean;
  readonly leftArrow: boolean;
  readonly rightArrow: boolean;
  readonly pageUp: boolean;
  readonly pageDown: boolean;
  readonly home: boolean;
  readonly end: boolean;
  readonly return: boolean;
  readonly escape: boolean;
  readonly tab: boolean;
  readonly backspace: boolean;
  readonly delete: boolean;
  readonly ctrl: boolean;
  readonly shift: boolean;
  readonly meta: boolean;
}

export interface KeyPress {
  /** Printable text (one or more characters), the letter of a Ctrl+letter, or '' for other keys. */
  readonly input: string;
  readonly key: KeyInfo;
}

const NONE: KeyInfo = {
  upArrow: false, downArrow: false, leftArrow: false, rightArrow: false, pageUp: false, pageDown: false, home: false, end: false,
  return: false, escape: false, tab: false, backspace: false, delete: false, ctrl: false, shift: false, meta: false,
};

const press = (input: string, key: Partial<KeyInfo> = {}): KeyPress => ({ input, key: { ...NONE, ...key } });

/** The key of a CSI or SS3 sequence by its final byte and parameters (xterm and VT conventions, common practice). */
function sequenceKey(params: string, final: string): KeyPress | undefined {
  // "1;2A": the second parameter is 1 + a modifier mask (1 shift, 2 alt, 4 ctrl).
  const parts = params.split(';');
  const mod = Number(parts[1] ?? '1') - 1;
  const mods = { shift: (mod & 1) !== 0, meta: (mod & 2) !== 0, ctrl: (mod & 4) !== 0 };
  switch (final) {
    case 'A': return press('', { upArrow: true, ...mods });
    case 'B': return press('', { downArrow: true, ...mods });
    case 'C': return press('', { rightArrow: true, ...mods });
    case 'D': return press('', { leftArrow: true, ...mods });
    case 'H': return press('', { home: true, ...mods });
    case 'F': return press('', { end: true, ...mods });
    case 'Z': return press('', { tab: true, shift: true });
    case '~':
      switch (parts[0]) {
        case '1': case '7': return press('', { home: true, ...mods });
        case '4': case '8': return press('', { end: true, ...mods });
        case '3': return press('', { delete: true, ...mods });
        case '5': return press('', { pageUp: true, ...mods });
        case '6': return press('', { pageDown: true, ...mods });
        default: return undefined;
      }
    default:
      return undefined;
  }
}

/** Length of the escape sequence starting at i (s[i] is ESC), and its key (undefined: ignored). */
function escapeAt(s: string, i: number): { length: number; key: KeyPress | undefined } {
  const next = s[i + 1];
  if (next === '[') {
    let j = i + 2;
    if (s[j] === '[') j++; // legacy "ESC [ [ A" function keys
    const start = j;
    while (j < s.length && /[0-?]/.test(s[j]!)) j++;
    const params = s.slice(start, j);
    while (j < s.length && /[ -/]/.test(s[j]!)) j++;
    if (j >= s.length || !/[@-~]/.test(s[j]!)) return { length: j - i, key: undefined };
    return { length: j + 1 - i, key: sequenceKey(params, s[j]!) };
  }
  if (next === 'O' && i + 2 < s.length) return { length: 3, key: sequenceKey('', s[i + 2]!) };
  // A lone ESC, or ESC followed by an ordinary key or another ESC: Esc, then that key on its
  // own (an Esc typed just before another key arrives like this on a slow link; the app has
  // no Alt+key, which some terminals send the same way).
  return { length: 1, key: press('', { escape: true, meta: true }) };
}

function controlKey(c: string): KeyPress | undefined {
  switch (c) {
    case '\r':
    case '\n':
      return press('', { return: true });
    case '\t':
      return press('', { tab: true });
    case '\u007f':
    case '\b':
      return press('', { backspace: true });
    default: {
      const code = c.charCodeAt(0);
      // Ctrl+A … Ctrl+Z arrive as 1 … 26.
      if (code >= 1 && code <= 26) return press(String.fromCharCode(code + 96), { ctrl: true });
      return undefined;
    }
  }
}

const isPrintable = (c: string) => c >= ' ' && c !== '\u007f';

export function splitKeys(chunk: string): KeyPress[] {
  const out: KeyPress[] = [];
  let i = 0;
  while (i < chunk.length) {
    const c = chunk[i]!;
    if (c === '\u001b') {
      const { length, key } = escapeAt(chunk, i);
      if (key) out.push(key);
      i += length;
    } else if (isPrintable(c)) {
      let j = i + 1;
      while (j < chunk.length && isPrintable(chunk[j]!)) j++;
      out.push(press(chunk.slice(i, j), { shift: /^[A-Z]$/.test(chunk.slice(i, j)) }));
      i = j;
    } else {
      // "\r\n" is one Enter.
      if (c === '\r' && chunk[i + 1] === '\n') i++;
      const key = controlKey(c);
      if (key) out.push(key);
      i++;
    }
  }
  return out;
}

/** The first character of a printable run as its own key press (the rest follows). */
export function firstOf(p: KeyPress): [KeyPress, KeyPress | undefined] {
  const chars = [...p.input];
  if (chars.length <= 1) return [p, undefined];
  const head = chars[0]!;
  return [press(head, { shift: /^[A-Z]$/.test(head) }), press(chars.slice(1).join(''), { shift: /^[A-Z]$/.test(chars.slice(1).join('')) })];
}

/** True for a run of printable text (as opposed to a named key). */
export function isText(p: KeyPress): boolean {
  return p.input !== '' && !p.key.ctrl && !p.key.meta;
}
