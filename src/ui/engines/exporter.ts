/**
 * Writing a session result to a file with the export engine (src/export), the same
 * functions `gradus export` calls. Until that engine exists this reports itself unavailable.
 */
import { InputError } from '../../core/errors.js';
import type { SessionItem } from '../session.js';

export const EXPORT_ENGINE_AVAILABLE = false;
export const EXPORT_FORMATS = ['latex', 'markdown', 'json'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

export const FORMAT_EXTENSION: Readonly<Record<ExportFormat, string>> = { latex: 'tex', markdown: 'md', json: 'json' };

export interface ExportDone {
  readonly path: string;
  readonly bytes: number;
}

/** Whether this item can be exported (it must carry an engine result). */
export function exportable(item: SessionItem): boolean {
  return item.payload !== undefined || item.target !== undefined;
}

export function exportItem(_item: SessionItem, _format: ExportFormat, _path: string, _force: boolean): ExportDone {
  throw new InputError('the export engine is not available in this build');
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
