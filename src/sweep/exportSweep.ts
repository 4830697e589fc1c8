/**
 * The findings table of a sweep as a file: Markdown, LaTeX (a fragment that needs no package;
 * the caller passes the escaping of text, so one escaping serves every LaTeX export) or JSON
 * (the sweep document itself, format "gradus-sweep"). Every row carries the commands that
 * reproduce it; the table is preceded by the command that reproduces the whole sweep.
 */
import { toJsonText } from '../core/json-text.js';
import type { SweepRow } from './analyse.js';
import { placesText } from './findings.js';
import { countsText, rowDimensionsText, rowPlacesText, stateText, KIND_LABEL } from './summary.js';
import type { SweepDocument } from './sweepDocument.js';

export const SWEEP_EXPORT_FORMATS = ['markdown', 'latex', 'json'] as const;
export type SweepExportFormat = (typeof SWEEP_EXPORT_FORMATS)[number];

function rowsOf(d: SweepDocument, limit: number): SweepRow[] {
  return d.rows.filter((r) => r.places.length > 0).slice(0, limit);
}

/** Text inside Markdown: the characters that would start emphasis, code or a table cell escaped. */
function md(text: string): string {
  return text.replace(/[\\`*_|]/g, (c) => `\\${c}`).replace(/\n/g, ' ');
}

export function sweepMarkdown(d: SweepDocument, limit: number): string {
  const rows = rowsOf(d, limit);
  const out: string[] = [];
  out.push(`# Sweep ${d.id}`, '', '```sh', `gradus ${d.key}`, '```', '', `${countsText(d)}; ${stateText(d)}.`, '');
  if (d.catalogueNote) out.push(`Note: ${md(d.catalogueNote)}`, '');
  out.push('| rank | seed | operators | places | findings |', '|---:|---|---|---|---|');
  for (const r of rows) {
    out.push(`| ${r.rank} | ${md(r.seed)} | ${r.ops.join(', ')} | ${md(rowPlacesText(r))}; ${rowDimensionsText(r)} | ${md(r.findings.map((f) => KIND_LABEL[f.kind]).join(', ') || '—')} |`);
  }
  for (const r of rows) {
    out.push('', `## ${r.rank}. ${md(r.seed)} under ${r.ops.join(', ')}`, '');
    for (const f of r.findings) out.push(`- **${KIND_LABEL[f.kind]}**: ${md(f.claim)}. Verified: ${md(f.verified)}; on ${placesText(f.places)}.`);
    if (r.findings.length === 0) out.push('- nothing remarkable found');
    for (const m of r.missing) out.push(`- not computed at n = ${m.n}${m.k !== undefined ? `, k = ${m.k}` : ''}: ${md(m.why)}`);
    out.push('', 'Reproduce:', '', '```sh', ...r.reproduce, '```');
  }
  out.push('', `Computed by gradus ${d.provenance.version}; ${d.provenance.confirmation}; ${d.provenance.time}.`, '');
  return out.join('\n');
}

export function sweepLatex(d: SweepDocument, limit: number, text: (s: string) => string): string {
  const rows = rowsOf(d, limit);
  const tt = (s: string) => `\\texttt{${text(s)}}`;
  const out: string[] = [];
  out.push(`% gradus sweep ${d.id}: a fragment needing no package (\\input it in any article)`);
  out.push(`\\paragraph{Sweep ${d.id}.} ${tt(`gradus ${d.key}`)}`, '', `${text(countsText(d))}; ${text(stateText(d))}.`, '');
  if (d.catalogueNote) out.push(`Note: ${text(d.catalogueNote)}`, '');
  out.push('\\begin{tabular}{r p{5cm} l p{6cm}}', '\\hline', 'rank & seed & places & findings \\\\', '\\hline');
  for (const r of rows) {
    out.push(`${r.rank} & ${text(`${r.seed} under ${r.ops.join(', ')}`)} & ${text(`${rowPlacesText(r)}`)} & ${text(r.findings.map((f) => KIND_LABEL[f.kind]).join(', ') || '--')} \\\\`);
  }
  out.push('\\hline', '\\end{tabular}', '');
  out.push('\\begin{enumerate}');
  for (const r of rows) {
    out.push(`\\item[${r.rank}.] ${text(`${r.seed} under ${r.ops.join(', ')}; ${rowDimensionsText(r)}`)}`, '\\begin{itemize}');
    for (const f of r.findings) out.push(`\\item \\textbf{${text(KIND_LABEL[f.kind])}}: ${text(f.claim)}. Verified: ${text(f.verified)}; on ${text(placesText(f.places))}.`);
    if (r.findings.length === 0) out.push('\\item nothing remarkable found');
    for (const c of r.reproduce) out.push(`\\item reproduce: ${tt(c)}`);
    out.push('\\end{itemize}');
  }
  out.push('\\end{enumerate}', '', `Computed by gradus ${text(d.provenance.version)}; ${text(d.provenance.confirmation)}; ${text(d.provenance.time)}.`, '');
  return out.join('\n');
}

export function sweepJson(d: SweepDocument, limit: number): string {
  const shown = rowsOf(d, limit);
  const rest = d.rows.filter((r) => !shown.includes(r) && r.places.length > 0).length;
  return toJsonText({ ...d, rows: shown, ...(rest ? { rowsLeftOut: rest } : {}) }) + '\n';
}

export function renderSweep(d: SweepDocument, format: SweepExportFormat, limit: number, latexText: (s: string) => string): string {
  return format === 'markdown' ? sweepMarkdown(d, limit) : format === 'latex' ? sweepLatex(d, limit, latexText) : sweepJson(d, limit);
}
