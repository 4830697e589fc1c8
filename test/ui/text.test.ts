/** Wrapping and windowing of the screens' text: nothing too wide, nothing lost, markers that count right. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { appWords } from '../../src/ui/errorText.js';
import { cellWidth } from '../../src/ui/text/cellWidth.js';
import { scrollWindow } from '../../src/ui/text/scrollWindow.js';
import { splitTerms } from '../../src/ui/text/splitTerms.js';
import { line, sliceLine, wrapLine, type SLine } from '../../src/ui/text/styledLine.js';

const text = (l: SLine) => l.map((s) => s.text).join('');
const words = fc.array(fc.oneof(fc.constantFrom('q^2*t', '+', '(q', 't)*s(3,1)', 'H̃', 'θ', 'x1^2'), fc.string({ minLength: 1, maxLength: 30 }).map((s) => s.replace(/\s/g, 'a'))), { maxLength: 40 });

describe('screen text', () => {
  it('wrapped lines fit the width and keep every character, in order', () => {
    fc.assert(
      fc.property(words, fc.integer({ min: 8, max: 120 }), fc.integer({ min: 0, max: 8 }), (ws, width, hang) => {
        const src = ws.join(' ');
        const lines = wrapLine(line(src), width, hang);
        for (const l of lines) expect(cellWidth(text(l))).toBeLessThanOrEqual(width);
        expect(lines.map(text).join('').replace(/ /g, '')).toBe(src.replace(/ /g, ''));
      }),
    );
  });

  it('a window shows at most its height, with markers counting exactly the lines left out', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 200 }), fc.integer({ min: 3, max: 50 }), fc.integer({ min: 0, max: 300 }), (n, h, off) => {
        const all = Array.from({ length: n }, (_, i) => line(`line ${i}`));
        const w = scrollWindow(all, h, off);
        expect(w.lines.length).toBeLessThanOrEqual(Math.max(h, n <= h ? n : h));
        const shown = w.lines.filter((l) => text(l).startsWith('line '));
        expect(w.above + shown.length + w.below).toBe(n);
        expect(w.lines.some((l) => text(l).startsWith(`↑ ${w.above} more`))).toBe(w.above > 0);
        expect(w.lines.some((l) => text(l).startsWith(`↓ ${w.below} more`))).toBe(w.below > 0);
        if (shown.length) expect(text(shown[0]!)).toBe(`line ${w.above}`);
      }),
    );
  });

  it('a line cut sideways says so with … at the cut ends', () => {
    const l = line('0123456789abcdefghij');
    expect(text(sliceLine(l, 0, 8))).toBe('0123456…');
    expect(text(sliceLine(l, 5, 8))).toBe('…6789ab…');
    expect(text(sliceLine(l, 12, 8))).toBe('…defghij');
  });

  it('a Schur expansion splits into its terms, parentheses kept whole', () => {
    expect(splitTerms('s(4) + (q + t)*s(3,1) - 2*s(2,2)')).toEqual(['s(4)', '+ (q + t)*s(3,1)', '- 2*s(2,2)']);
  });

  it('engine messages are said with the keys and fields of the app', () => {
    expect(appWords('permutations with n=13 has 6227020800 objects, over the limit of 2000000000; raise it with --max-objects', 'statistics')).toBe(
      'permutations with n=13 has 6227020800 objects, over the limit of 2000000000; that is the most the app counts: lower n (-) or change the parameters (p)',
    );
    expect(appWords('--coeffs: coefficients must be integers (got "x")')).toBe('series: coefficients must be integers (got "x")');
    expect(appWords('estimated work 1e9 units (about 60 s) exceeds the limit 1e8; raise it with --max-work', 'modules')).toContain('add --max-work N to the request (e edits it)');
    expect(appWords('no catalogue at /x; fill one with `gradus catalogue build --n-max N --catalogue /x`')).toBe('no catalogue at /x; b on the Search screen builds one');
  });
});
