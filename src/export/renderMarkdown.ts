/** An export as Markdown. */
import { byPartitionKey, type Series } from '../series/series.js';
import type { ExportModel } from './exportModel.js';
import { flagsText } from './flagsText.js';

export function seriesText(s: Series): string {
  if (s.kind === 'q' || s.kind === 'qt') return s.poly.toString();
  if (s.kind === 'schur') return [...s.terms].sort(byPartitionKey).map(([l, c]) => `(${c.toString()}) s(${l})`).join(' + ') || '0';
  return [...s.terms].map(([e, c]) => `${c}·x^(${e})`).join(' + ');
}

const cell = (t: string) => t.replace(/\|/g, '\\|');

export function renderMarkdown(m: ExportModel): string {
  const L: string[] = [];
  L.push(`# Search result: ${m.title}`, '', `Target range: ${m.range}.`, '');
  const r = m.recognition;
  L.push('## Formula', '');
  if (r.formula) L.push(`- f = \`${r.formula}\` (verified on ${m.range})`);
  for (const x of r.recurrences) L.push(`- recurrence: \`${x.text}\`${x.name ? ` (${x.name})` : ''}, checked on ${x.checked} entries`);
  L.push(`- ${flagsText(r)}`, '');
  L.push(`## Expressions (${m.expressions.length} of ${m.totalExpressions}, simplest first)`, '');
  if (m.expressions.length === 0) L.push('No expression of the library equals the target or its variants.', '');
  m.expressions.forEach((x, i) => {
    L.push(`${i + 1}. \`${x.marker ? `Σ_k ${x.marker} · ` : ''}${x.expression}\` — ${x.title}`);
    L.push(`   - verified: ${x.verified}${x.complete ? '' : ' (some entries not checked)'}; parameters ${x.mapping}; specialisation ${x.specialisation}${x.projection === 'hilbert' ? ' (Hilbert series)' : ''}; variant ${x.variant}`);
    L.push(`   - family \`${x.family}\` (${x.origin}); source: ${x.source}`);
    L.push(`   - at ${x.exampleAt}: \`gradus sym "${x.example}"\``);
  });
  if (m.expressions.length) L.push('');
  L.push(`## Matches (${m.matches.length} of ${m.totalMatches}, simplest first)`, '');
  if (m.matches.length === 0) {
    const t = m.tried;
    L.push(`No match. Tried ${t.candidates} candidates (${t.sameCount} with the same count at q = 1) over the families ${t.families.join(', ')}, with the variants ${t.variants.join(', ')}.`, '');
  }
  m.matches.forEach((x, i) => {
    L.push(`${i + 1}. \`${x.match.marker ? `Σ_k ${x.match.marker} · ` : ''}${x.match.formula}\``);
    L.push(`   - verified: ${x.match.verified}${x.match.complete ? '' : ' (some entries not checked)'}; parameters ${x.match.mapping}; variant ${x.match.variant}`);
    L.push(`   - family \`${x.family.id}\`: ${x.family.description} (source: ${x.family.source})`);
    for (const s of x.statistics) {
      L.push(`   - statistic \`${s.id}\`: ${s.description} (source: ${s.source})${s.via ? `, read after \`${s.via.id}\`: ${s.via.description} (source: ${s.via.source})` : ''}`);
    }
  });
  L.push('', '## Values', '');
  const hasK = m.table.some((e) => e.k !== undefined);
  L.push(hasK ? '| n | k | series | value at 1 |' : '| n | series | value at 1 |', hasK ? '|---|---|---|---|' : '|---|---|---|');
  for (const e of m.table) L.push(`| ${e.n} |${hasK ? ` ${e.k ?? ''} |` : ''} ${cell(seriesText(e.series))} | ${e.count} |`);
  L.push('', '## Provenance', '', `- search: ${m.provenance.search.method}; ${m.provenance.search.time}; gradus ${m.provenance.search.version}`, `- exported by ${m.provenance.exportedBy}`, '');
  return L.join('\n');
}
