/**
 * Writing a session result to a file with the export engine (src/export): a search result
 * through the same model and renderers as `gradus export`, written atomically; a module or
 * expression result as the JSON document its own command prints with --json.
 */
import { InputError } from '../../core/errors.js';
import { toJsonText } from '../../core/json-text.js';
import { exportModel } from '../../export/exportModel.js';
import { renderJson } from '../../export/renderJson.js';
import { renderLatex } from '../../export/renderLatex.js';
import { renderMarkdown } from '../../export/renderMarkdown.js';
import { checkSearchDocument } from '../../match/searchDocument.js';
import { appWrite } from '../appWrite.js';
import type { SessionItem } from '../session.js';

export const EXPORT_ENGINE_AVAILABLE = true;
export const EXPORT_FORMATS = ['markdown', 'latex', 'json'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

export const FORMAT_EXTENSION: Readonly<Record<ExportFormat, string>> = { markdown: 'md', latex: 'tex', json: 'json' };

/** How many matches an export lists (as `gradus export` does by default). */
const EXPORT_MATCH_LIMIT = 10;

export interface ExportDone {
  readonly path: string;
  readonly bytes: number;
}

/** The engine JSON a session item carries: a saved-search document, or a module/expression document. */
function documentOf(item: SessionItem): { kind: 'search' | 'plain'; doc: unknown } | undefined {
  const p = item.payload as { json?: unknown } | undefined;
  if (!p || p.json === undefined) return undefined;
  return { kind: item.origin === 'search' ? 'search' : 'plain', doc: p.json };
}

export function exportable(item: SessionItem): boolean {
  return documentOf(item) !== undefined;
}

/** Formats this item can be written in. */
export function formatsFor(item: SessionItem): readonly ExportFormat[] {
  return documentOf(item)?.kind === 'search' ? EXPORT_FORMATS : ['json'];
}

export function exportItem(item: SessionItem, format: ExportFormat, path: string, force: boolean): ExportDone {
  const d = documentOf(item);
  if (!d) throw new InputError('this result carries nothing to export');
  let text: string;
  if (d.kind === 'search') {
    const model = exportModel(checkSearchDocument(d.doc, item.title), EXPORT_MATCH_LIMIT);
    text = format === 'markdown' ? renderMarkdown(model) : format === 'latex' ? renderLatex(model) : renderJson(model);
  } else {
    if (format !== 'json') throw new InputError(`a ${item.origin} result is exported as JSON (its command's --json document); ${format} is for search results`, 'format');
    text = toJsonText(d.doc) + '\n';
  }
  appWrite(path, text, force, 'f');
  return { path, bytes: Buffer.byteLength(text) };
}

/** A default file name from the item's title: plain letters, digits and dashes. */
export function defaultFileName(item: SessionItem, format: ExportFormat): string {
  const slug = item.title
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .toLowerCase()
    .slice(0, 40);
  return `gradus-${slug || 'result'}.${FORMAT_EXTENSION[format]}`;
}
