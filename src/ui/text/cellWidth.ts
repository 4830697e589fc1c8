/**
 * Terminal cells taken by text: combining marks take none (the tilde of H̃), East Asian wide
 * and fullwidth characters and emoji take two, everything else one — the common convention of
 * terminals (and of the width function ink measures with).
 */

function charWidth(cp: number): number {
  if (cp < 0x300) return cp < 0x20 ? 0 : 1;
  if ((cp >= 0x300 && cp <= 0x36f) || (cp >= 0x1ab0 && cp <= 0x1aff) || (cp >= 0x1dc0 && cp <= 0x1dff) || (cp >= 0x20d0 && cp <= 0x20ff) || (cp >= 0xfe00 && cp <= 0xfe0f) || cp === 0x200b || cp === 0x200d) return 0;
  if (
    (cp >= 0x1100 && cp <= 0x115f) ||
    (cp >= 0x2e80 && cp <= 0xa4cf) ||
    (cp >= 0xac00 && cp <= 0xd7a3) ||
    (cp >= 0xf900 && cp <= 0xfaff) ||
    (cp >= 0xfe30 && cp <= 0xfe4f) ||
    (cp >= 0xff00 && cp <= 0xff60) ||
    (cp >= 0xffe0 && cp <= 0xffe6) ||
    (cp >= 0x1f300 && cp <= 0x1faff) ||
    (cp >= 0x20000 && cp <= 0x3fffd)
  ) {
    return 2;
  }
  return 1;
}

export function cellWidth(s: string): number {
  let w = 0;
  for (const ch of s) w += charWidth(ch.codePointAt(0)!);
  return w;
}

/** Characters with their widths, a combining mark kept with the character before it. */
export function cells(s: string): { ch: string; w: number }[] {
  const out: { ch: string; w: number }[] = [];
  for (const ch of s) {
    const w = charWidth(ch.codePointAt(0)!);
    if (w === 0 && out.length > 0) out[out.length - 1]!.ch += ch;
    else out.push({ ch, w });
  }
  return out;
}
