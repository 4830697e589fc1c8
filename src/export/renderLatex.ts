/**
 * An export as a LaTeX fragment that compiles inside any article (no package needed). Long text
 * may break after punctuation; each value is a paragraph of its own, so a long series breaks
 * across lines and a long list of values across pages.
 */
import type { SearchMatch } from '../match/search.js';
import { byPartitionKey, type Series } from '../series/series.js';
import type { ExportModel } from './exportModel.js';
import { flagsText } from './flagsText.js';
import { latexId, latexText, latexTextBreakable } from './latexText.js';

function statLatex(id: string): string {
  const i = id.indexOf(':');
  return i < 0 ? `${latexId(id)}(x)` : `${latexId(id.slice(i + 1))}(${latexId(id.slice(0, i))}(x))`;
}

/** The candidate's formula in math, written in terms of the original target. */
export function matchLatex(m: SearchMatch): string {
  const [a, b] = m.statistics.map(statLatex);
  if (m.combine === 'slice') {
    const shift = /= k([+-]\d+)?$/.exec(m.mapping)?.[1] ?? '';
    return `\\sum_{x \\in ${latexId(m.family)}(n),\\ ${b} = k${shift}} q^{${a}}`;
  }
  const [qv, tv] = m.variant.includes('q-t-swapped') ? ['t', 'q'] : ['q', 't'];
  const sliced = m.combine.endsWith('-t0'); // Frobenius-level pair at t = 0: the objects with b = 0
  const form = sliced ? m.combine.slice(0, -3) : m.combine;
  // statistic names are long words in boxes: the line may break between the sum and the weight and between q and t
  const weight = m.combine === 'sum' ? `${qv}^{${a} + ${b}}` : b === undefined || sliced ? `${qv}^{${a}}` : `${qv}^{${a}} \\allowbreak ${tv}^{${b}}`;
  const sym = form === 'shape' ? ' s_{\\lambda(x)}' : form === 'fundamental' ? ' F_{\\mathrm{Des}(w(x))}' : form === 'ifundamental' ? ' F_{\\mathrm{iDes}(w(x))}' : '';
  // a shape or content following n by a template ("shape = (n−1,1)") is written out
  const lists = m.mapping.split(', ').filter((x) => / = \(/.test(x)).map((x) => `\\mbox{${latexText(x)}}`);
  const params = lists.length ? lists.join(',') : m.mapping.includes('k') ? 'n,k' : 'n';
  const where = sliced ? `,\\ ${b} = 0` : '';
  let body = form === 'content'
    ? `\\sum_{\\mu \\vdash n} m_\\mu \\sum_{x \\in ${latexId(m.family)}(\\mu${params.includes('k') ? ',k' : ''})${where}} \\allowbreak ${weight}`
    : `\\sum_{x \\in ${latexId(m.family)}(${params})${where}} \\allowbreak ${weight}${sym}`;
  if (m.variant.includes('q-reversed')) body = `\\mathrm{rev}_q\\left(${body}\\right)`;
  if (m.variant.startsWith('omega')) body = `\\omega\\left(${body}\\right)`;
  return body;
}

/** "θ^{n−k}" in math. */
function latexMarker(marker: string): string {
  return marker.replace('θ', '\\theta').replace('−', '-');
}

export function seriesLatex(s: Series): string {
  if (s.kind === 'q' || s.kind === 'qt') return s.poly.toLatex();
  if (s.kind === 'schur') {
    return [...s.terms].sort(byPartitionKey).map(([l, c]) => `${c.termCount === 1 && c.toLatex() === '1' ? '' : `(${c.toLatex()})\\,`}s_{${l ? `(${l})` : '\\emptyset'}}`).join(' + ') || '0';
  }
  return [...s.terms].map(([e, c]) => `${c}\\,x^{(${e})}`).join(' + ');
}

/** A long integer may break between groups of three digits. */
function breakDigits(d: string): string {
  if (d.length <= 9) return d;
  const groups: string[] = [];
  for (let i = d.length; i > 0; i -= 3) groups.unshift(d.slice(Math.max(0, i - 3), i));
  return groups.join('\\allowbreak{}');
}

export function renderLatex(m: ExportModel): string {
  const L: string[] = [];
  L.push('% gradus search export: a LaTeX fragment needing no package (\\input it inside a document)');
  // Ragged right: identifiers and series have few places to break, and a justified line
  // would rather run past the margin than leave a gap.
  L.push('\\begingroup\\raggedright');
  L.push(`\\section*{\\raggedright Search result: ${latexTextBreakable(m.title)}}`);
  L.push(`Target range: ${latexTextBreakable(m.range)}.`, '');
  const r = m.recognition;
  L.push('\\subsection*{Formula}', '\\begin{itemize}');
  if (r.formula) L.push(`\\item $f$ = \\texttt{${latexTextBreakable(r.formula)}} (verified on ${latexTextBreakable(m.range)})`);
  for (const x of r.recurrences) L.push(`\\item recurrence: \\texttt{${latexTextBreakable(x.text)}}${x.name ? ` (${latexText(x.name)})` : ''}, checked on ${x.checked} entries`);
  L.push(`\\item ${flagsText(r)}`, '\\end{itemize}', '');
  L.push(`\\subsection*{Expressions (${m.expressions.length} of ${m.totalExpressions}, simplest first)}`);
  if (m.expressions.length === 0) L.push('No expression of the library equals the target or its variants.', '');
  else {
    L.push('\\begin{enumerate}');
    for (const x of m.expressions) {
      L.push(`\\item ${x.marker ? `$\\sum_k ${latexMarker(x.marker)}\\cdot$ ` : ''}\\texttt{${latexTextBreakable(x.expression)}} --- ${latexText(x.title)}`, '\\begin{itemize}');
      L.push(`\\item verified: ${latexTextBreakable(x.verified)}${x.complete ? '' : ' (some entries not checked)'}; parameters ${latexTextBreakable(x.mapping)}; specialisation ${latexTextBreakable(x.specialisation)}${x.projection === 'hilbert' ? ' (Hilbert series)' : ''}; variant ${latexText(x.variant)}`);
      L.push(`\\item family \\texttt{${latexTextBreakable(x.family)}} (${latexText(x.origin)}); source: ${latexText(x.source)}`);
      L.push(`\\item at ${latexText(x.exampleAt)}: \\texttt{${latexTextBreakable(`gradus sym "${x.example}"`)}}`, '\\end{itemize}');
    }
    L.push('\\end{enumerate}', '');
  }
  L.push(`\\subsection*{Matches (${m.matches.length} of ${m.totalMatches}, simplest first)}`);
  if (m.matches.length === 0) {
    const t = m.tried;
    L.push(`No match. Tried ${t.candidates} candidates (${t.sameCount} with the same count at $q=1$) over the families ${latexTextBreakable(t.families.join(', '))}, with the variants ${latexTextBreakable(t.variants.join(', '))}.`, '');
  } else {
    L.push('\\begin{enumerate}');
    for (const x of m.matches) {
      L.push(`\\item ${x.match.marker ? `$\\sum_k ${latexMarker(x.match.marker)}\\cdot$ ` : ''}$${matchLatex(x.match)}$`, '\\begin{itemize}');
      L.push(`\\item verified: ${latexTextBreakable(x.match.verified)}${x.match.complete ? '' : ' (some entries not checked)'}; parameters ${latexTextBreakable(x.match.mapping)}; variant ${latexTextBreakable(x.match.variant)}`);
      L.push(`\\item family \\texttt{${latexTextBreakable(x.family.id)}}: ${latexText(x.family.description)} (source: ${latexText(x.family.source)})`);
      for (const s of x.statistics) {
        L.push(`\\item statistic \\texttt{${latexTextBreakable(s.id)}}: ${latexText(s.description)} (source: ${latexText(s.source)})${s.via ? `, read after \\texttt{${latexTextBreakable(s.via.id)}}: ${latexText(s.via.description)} (source: ${latexText(s.via.source)})` : ''}`);
      }
      L.push('\\end{itemize}');
    }
    L.push('\\end{enumerate}');
  }
  L.push('', '\\subsection*{Values}');
  // One paragraph per entry, hanging after its label: a long series breaks across lines
  // (after + and -) and a long list across pages, which no table row can do.
  for (const e of m.table) {
    const label = `$n=${e.n}${e.k === undefined ? '' : `,\\ k=${e.k}`}$:`;
    L.push(`\\par\\noindent\\hangindent=2em\\hangafter=1 ${label} $${seriesLatex(e.series)}$\\quad (value at $1$: ${breakDigits(e.count.toString())})\\par`);
  }
  L.push('');
  L.push('\\subsection*{Provenance}', `Search: ${latexText(m.provenance.search.method)}; ${latexText(m.provenance.search.time)}; gradus ${latexText(m.provenance.search.version)}. Exported by ${latexText(m.provenance.exportedBy)}.`, '\\par\\endgroup', '');
  return L.join('\n');
}
