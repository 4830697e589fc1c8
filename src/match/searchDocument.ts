/**
 * Our saved-search format ("gradus-search", version 1): the target, what the search
 * found and tried, the recognised formulas, and provenance. `gradus export` reads it.
 */
import { InputError } from '../core/errors.js';
import type { Provenance } from '../store/provenance.js';
import type { Target } from '../series/target.js';
import { targetToJson } from '../series/targetFile.js';
import type { Recognition } from './recognise.js';
import type { SearchOutcome } from './search.js';

export const SEARCH_FORMAT = 'gradus-search';
export const SEARCH_VERSION = 1;

export interface SearchDocument {
  readonly format: typeof SEARCH_FORMAT;
  readonly version: typeof SEARCH_VERSION;
  readonly target: ReturnType<typeof targetToJson>;
  readonly range: string;
  readonly recognition: {
    readonly formula?: string;
    readonly recurrences: readonly { text: string; name?: string; checked: number }[];
    readonly palindromic: boolean;
    readonly unimodal: boolean;
  };
  readonly matches: SearchOutcome['matches'];
  readonly tried: SearchOutcome['tried'];
  readonly provenance: Provenance;
}

export function searchDocument(target: Target, range: string, rec: Recognition, outcome: SearchOutcome, prov: Provenance): SearchDocument {
  return {
    format: SEARCH_FORMAT,
    version: SEARCH_VERSION,
    target: targetToJson(target),
    range,
    recognition: {
      ...(rec.formula ? { formula: rec.formula.text } : {}),
      recurrences: rec.recurrences.map((r) => ({ text: r.text, ...(r.name ? { name: r.name } : {}), checked: r.checked })),
      palindromic: rec.palindromic,
      unimodal: rec.unimodal,
    },
    matches: outcome.matches,
    tried: outcome.tried,
    provenance: prov,
  };
}

export function checkSearchDocument(doc: unknown, where: string): SearchDocument {
  const o = doc as Record<string, unknown> | null;
  if (!o || typeof o !== 'object' || o['format'] !== SEARCH_FORMAT) throw new InputError(`${where}: not a saved search ("format" must be "${SEARCH_FORMAT}")`, 'result');
  if (o['version'] !== SEARCH_VERSION) throw new InputError(`${where}: saved-search version ${String(o['version'])} is not read by this gradus (reads ${SEARCH_VERSION})`, 'result');
  if (!Array.isArray(o['matches']) || typeof o['target'] !== 'object') throw new InputError(`${where}: the saved search has no "matches" or "target"`, 'result');
  return doc as SearchDocument;
}
