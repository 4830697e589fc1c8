/**
 * Text for a LaTeX fragment that needs no package: special characters escaped and the
 * Unicode symbols our descriptions use written as math (others as [U+XXXX]).
 */
const SPECIAL: Record<string, string> = {
  '\\': '\\textbackslash{}', '{': '\\{', '}': '\\}', _: '\\_', '^': '\\^{}', '#': '\\#', '%': '\\%', '&': '\\&', $: '\\$', '~': '\\~{}', '<': '$<$', '>': '$>$', '|': '$|$',
};
const MATH: Record<string, string> = {
  '·': '\\cdot', 'Σ': '\\Sigma', '∈': '\\in', '↦': '\\mapsto', 'ω': '\\omega', '≤': '\\le', '≥': '\\ge', '⟨': '\\langle', '⟩': '\\rangle',
  'θ': '\\theta', 'δ': '\\delta', 'Δ': '\\Delta', '∇': '\\nabla', 'λ': '\\lambda', 'μ': '\\mu', 'ε': '\\varepsilon', '→': '\\to', '×': '\\times',
  '∂': '\\partial', 'π': '\\pi', 'σ': '\\sigma', 'τ': '\\tau', 'α': '\\alpha', 'β': '\\beta', 'ζ': '\\zeta', '≠': '\\ne', '∑': '\\sum', '∏': '\\prod',
  '⊆': '\\subseteq', '∖': '\\setminus', '⊂': '\\subset', '≅': '\\cong', '↔': '\\leftrightarrow', '⇒': '\\Rightarrow', '∪': '\\cup', '∩': '\\cap', '∅': '\\emptyset', '′': '\\prime', '∞': '\\infty', '±': '\\pm', 'ℓ': '\\ell', '≡': '\\equiv', '⋯': '\\cdots',
};
const PLAIN: Record<string, string> = { '§': '\\S{}', '¶': '\\P{}', '−': '-', '–': '--', '—': '---', '…': '\\ldots{}', '’': "'", '‘': '`', '“': '``', '”': "''", ' ': ' ', 'é': "\\'e", 'è': '\\`e', 'ö': '\\"o', 'ü': '\\"u', 'ä': '\\"a' };

export function latexText(s: string): string {
  let out = '';
  const chars = [...s];
  for (let i = 0; i < chars.length; i++) {
    const ch = chars[i]!;
    // a letter with a combining tilde (H̃) is the text accent \~{H}
    if (chars[i + 1] === '\u0303' && /[A-Za-z]/.test(ch)) {
      out += `\\~{${ch}}`;
      i++;
    } else if (SPECIAL[ch] !== undefined) out += SPECIAL[ch];
    else if (MATH[ch] !== undefined) out += `$${MATH[ch]}$`;
    else if (PLAIN[ch] !== undefined) out += PLAIN[ch];
    else if (ch.charCodeAt(0) > 126) out += `[U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}]`;
    else out += ch;
  }
  return out;
}

/** An identifier such as osp-inv set upright inside math. */
export function latexId(id: string): string {
  return `\\mbox{\\texttt{${latexText(id)}}}`;
}

/**
 * latexText that may break a line after , ; : / = and - (titles and targets such as
 * "n=3:1,2,2,1;n=4:…" have no spaces, and would run past the margin).
 */
export function latexTextBreakable(s: string): string {
  let out = '';
  for (const ch of s) out += latexText(ch) + (',;:/=-'.includes(ch) ? '\\allowbreak{}' : '');
  return out;
}
