/**
 * Splitting what a terminal sends into keys. Sequences: xterm's and the VT220's (common
 * practice: CSI A–D arrows, H/F and 1~/4~ Home/End, 5~/6~ PgUp/PgDn, 3~ Delete, Z Shift+Tab;
 * SS3 O A–D arrows), DEL (127) for Backspace, Ctrl+letter as 1–26.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { firstOf, splitKeys, type KeyPress } from '../../../src/ui/keys/splitKeys.js';

/** A short name per key press, for comparing sequences. */
function names(ps: readonly KeyPress[]): string[] {
  return ps.map((p) => {
    const k = p.key;
    const named = Object.entries(k).find(([n, v]) => v === true && !['ctrl', 'shift', 'meta'].includes(n))?.[0];
    if (named) return `${k.shift ? 'shift+' : ''}${named}`;
    return k.ctrl ? `ctrl+${p.input}` : JSON.stringify(p.input);
  });
}

describe('splitKeys', () => {
  it('splits a burst of arrows, of printable keys, and text mixed with Backspace and Enter', () => {
    expect(names(splitKeys('\u001b[C\u001b[C\u001b[C'))).toEqual(['rightArrow', 'rightArrow', 'rightArrow']);
    expect(names(splitKeys('+++'))).toEqual(['"+++"']);
    expect(names(splitKeys('n=6\u007f4\r'))).toEqual(['"n=6"', 'backspace', '"4"', 'return']);
    expect(names(splitKeys('\u001bOA\u001b[B\u001b[1;2C\u001b[D'))).toEqual(['upArrow', 'downArrow', 'shift+rightArrow', 'leftArrow']);
    expect(names(splitKeys('\u001b[5~\u001b[6~\u001b[H\u001b[F\u001b[1~\u001b[4~\u001b[3~\u001b[Z\t'))).toEqual([
      'pageUp', 'pageDown', 'home', 'end', 'home', 'end', 'delete', 'shift+tab', 'tab',
    ]);
    expect(names(splitKeys('\u0015\u0003a\r\n'))).toEqual(['ctrl+u', 'ctrl+c', '"a"', 'return']);
  });

  it('reads Esc followed at once by another key as Esc, then that key', () => {
    expect(names(splitKeys('\u001bq'))).toEqual(['escape', '"q"']);
    expect(names(splitKeys('\u001b'))).toEqual(['escape']);
    expect(names(splitKeys('x\u001b\u001b[A'))).toEqual(['"x"', 'escape', 'upArrow']);
  });

  it('a printable run splits into its characters, one at a time', () => {
    const [head, rest] = firstOf(splitKeys('+-θ')[0]!);
    expect(head.input).toBe('+');
    expect(rest?.input).toBe('-θ');
  });

  it('loses nothing: the keys of any sequence of presses, sent together, come back in order', () => {
    const KEYS: Record<string, string> = { up: '\u001b[A', down: '\u001b[B', left: '\u001b[D', right: '\u001b[C', enter: '\r', backspace: '\u007f', tab: '\t', pgdn: '\u001b[6~', esc: '\u001b' };
    const press = fc.oneof(fc.constantFrom(...Object.keys(KEYS)), fc.constantFrom('a', 'q', '+', '-', '7', '?', 'θ'));
    fc.assert(
      fc.property(fc.array(press, { maxLength: 30 }), (seq) => {
        const sent = seq.map((k) => KEYS[k] ?? k).join('');
        const got = splitKeys(sent).flatMap((p) => (p.input.length > 1 && !p.key.ctrl ? [...p.input].map((c) => ({ ...p, input: c })) : [p]));
        expect(got.length).toBe(seq.length);
        got.forEach((p, i) => {
          const k = seq[i]!;
          if (KEYS[k] === undefined) expect(p.input).toBe(k);
          else expect(p.input).toBe('');
        });
      }),
    );
  });
});
