/** An export as a LaTeX fragment that compiles inside any article (no package needed). */
import type { SearchMatch } from '../match/search.js';
import { byPartitionKey, type Series } from '../series/series.js';
import type { ExportModel } from './exportModel.js';
import { flagsText } from './flagsText.js';
import { latexId, latexText } from './latexText.js';

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
  const weight = m.combine === 'sum' ? `${qv}^{${a} + ${b}}` : b === undefined || sliced ? `${qv}^{${a}}` : `${qv}^{${a}} ${tv}^{${b}}`;
  const sym = form === 'shape' ? ' s_{\\lambda(x)}' : form === 'fundamental' ? ' F_{\\mathrm{Des}(w(x))}' : form === 'ifundamental' ? ' F_{\\mathrm{iDes}(w(x))}' : '';
  // a shape or content following n by a template ("shape = (n−1,1)") is written out
  const lists = m.mapping.split(', ').filter((x) => / = \(/.test(x)).map((x) => `\\mbox{${latexText(x)}}`);
  const params = lists.length ? lists.join(',') : m.mapping.includes('k') ? 'n,k' : 'n';
  const where = sliced ? `,\\ ${b} = 0` : '';
  let body = form === 'content'
    ? `\\sum_{\\mu \\vdash n} m_\\mu \\sum_{x \\in ${latexId(m.family)}(\\mu${params.includes('k') ? ',k' : ''})${where}} ${weight}`
    : `\\sum_{x \\in ${latexId(m.family)}(${params})${where}} ${weight}${sym}`;
  if (m.variant.includes('q-reversed')) body = `\\mathrm{rev}_q\\left(${body}\\right)`;
  if (m.variant.startsWith('omega')) body = `\\omega\\left(${body}\\right)`;
  return body;
}

export function seriesLatex(s: Series): string {
  if (s.kind === 'q' || s.kind === 'qt') return s.poly.toLatex();
  if (s.kind === 'schur') {
    return [...s.terms].sort(byPartitionKey).map(([l, c]) => `${c.termCount === 1 && c.toLatex() === '1' ? '' : `(${c.toLatex()})\\,`}s_{${l || '\\emptyset'}}`).join(' + ') || '0';
  }
  return [...s.terms].map(([e, c]) => `${c}\\,x^{(${e})}`).join(' + ');
}

export function renderLatex(m: ExportModel): string {
  const L: string[] = [];
  L.push('% gradus search export: a LaTeX fragment needing no package (\\input it inside a document)');
  L.push(`\\section*{Search result: \\texttt{${latexText(m.title)}}}`);
  L.push(`Target range: ${latexText(m.range)}.`, '');
  const r = m.recognition;
  L.push('\\subsection*{Formula}', '\\begin{itemize}');
  if (r.formula) L.push(`\\item $f$ = \\texttt{${latexText(r.formula)}} (verified on ${latexText(m.range)})`);
  for (const x of r.recurrences) L.push(`\\item recurrence: \\texttt{${latexText(x.text)}}${x.name ? ` (${latexText(x.name)})` : ''}, checked on ${x.checked} entries`);
  L.push(`\\item ${flagsText(r)}`, '\\end{itemize}', '');
  L.push(`\\subsection*{Matches (${m.matches.length} of ${m.totalMatches}, simplest first)}`);
  if (m.matches.length === 0) {
    const t = m.tried;
    L.push(`No match. Tried ${t.candidates} candidates (${t.sameCount} with the same count at $q=1$) over the families ${latexText(t.families.join(', '))}, with the variants ${latexText(t.variants.join(', '))}.`, '');
  } else {
    L.push('\\begin{enumerate}');
    for (const x of m.matches) {
      L.push(`\\item $${matchLatex(x.match)}$`, '\\begin{itemize}');
      L.push(`\\item verified: ${latexText(x.match.verified)}${x.match.complete ? '' : ' (some entries not checked)'}; parameters ${latexText(x.match.mapping)}; variant ${latexText(x.match.variant)}`);
      L.push(`\\item family \\texttt{${latexText(x.family.id)}}: ${latexText(x.family.description)} (source: ${latexText(x.family.source)})`);
      for (const s of x.statistics) {
        L.push(`\\item statistic \\texttt{${latexText(s.id)}}: ${latexText(s.description)} (source: ${latexText(s.source)})${s.via ? `, read after \\texttt{${latexText(s.via.id)}}: ${latexText(s.via.description)} (source: ${latexText(s.via.source)})` : ''}`);
      }
      L.push('\\end{itemize}');
    }
    L.push('\\end{enumerate}');
  }
  L.push('', '\\subsection*{Values}');
  const hasK = m.table.some((e) => e.k !== undefined);
  L.push(`\\begin{tabular}{${hasK ? 'rr' : 'r'}p{0.62\\linewidth}r}`, `$n$ & ${hasK ? '$k$ & ' : ''}series & at $1$ \\\\ \\hline`);
  for (const e of m.table) L.push(`${e.n} & ${hasK ? `${e.k ?? ''} & ` : ''}$${seriesLatex(e.series)}$ & ${e.count} \\\\`);
  L.push('\\end{tabular}', '');
  L.push('\\subsection*{Provenance}', `Search: ${latexText(m.provenance.search.method)}; ${latexText(m.provenance.search.time)}; gradus ${latexText(m.provenance.search.version)}. Exported by ${latexText(m.provenance.exportedBy)}.`, '');
  return L.join('\n');
}
