/**
 * A sum as printed by the engines ("s(4) + (q^3 + q^2*t)*s(3,1) - 2*s(2,2)") split into its
 * top-level terms, each keeping its sign, so a long result reads one term per line.
 */
export function splitTerms(text: string): string[] {
  const out: string[] = [];
  let depth = 0;
  let start = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (c === '(') depth++;
    else if (c === ')') depth--;
    else if (depth === 0 && c === ' ' && (text[i + 1] === '+' || text[i + 1] === '-') && text[i + 2] === ' ') {
      out.push(text.slice(start, i));
      start = i + 1;
    }
  }
  out.push(text.slice(start));
  return out.filter((t) => t !== '');
}
