/**
 * The session's results in a file of our own format, so a session can be closed and opened
 * again:
 *   { "format": "gradus-session", "version": 1, "savedAt": "…", "gradus": "0.1.0",
 *     "items": [ { "title", "origin", "target"?: <target file JSON>, "document"?: {…} } ] }
 * A target is stored as our target-file JSON; a document is the engine's own JSON (what the
 * command's --json prints, or a saved search). Written atomically; checked with zod (and the
 * target and search checks of their own formats) when read, before anything is shown.
 */
import { existsSync, readFileSync, statSync } from 'node:fs';
import { z } from 'zod';
import { InputError } from '../core/errors.js';
import { parseWith } from '../core/schema.js';
import { toJsonText } from '../core/json-text.js';
import { checkSearchDocument } from '../match/searchDocument.js';
import { targetFromJson, targetToJson } from '../series/targetFile.js';
import { VERSION } from '../version.js';
import { appWrite } from './appWrite.js';
import type { ItemOrigin, NewItem, SessionItem } from './session.js';

export const SESSION_FORMAT = 'gradus-session';
export const SESSION_VERSION = 1;
/** Sessions hold results of small sizes; a larger file is refused before it is read. */
const MAX_SESSION_BYTES = 64 * 1024 * 1024;
const ORIGINS: readonly ItemOrigin[] = ['module', 'symfun', 'statistics', 'typed', 'search', 'family'];

const ITEM = z.object({
  title: z.string().min(1).max(2000),
  origin: z.enum(ORIGINS as [ItemOrigin, ...ItemOrigin[]]),
  target: z.unknown().optional(),
  document: z.record(z.string(), z.unknown()).optional(),
});

const SESSION = z.object({
  format: z.literal(SESSION_FORMAT, { error: `"format" must be "${SESSION_FORMAT}" (not a session file of gradus)` }),
  version: z.literal(SESSION_VERSION, { error: `"version" must be ${SESSION_VERSION} (the version this gradus reads)` }),
  savedAt: z.string().optional(),
  gradus: z.string().optional(),
  items: z.array(ITEM).max(100_000),
});

/** The engine document an item carries (its payload's JSON), if any. */
function documentOf(item: SessionItem): Record<string, unknown> | undefined {
  const j = (item.payload as { json?: unknown } | undefined)?.json;
  return j && typeof j === 'object' && !Array.isArray(j) ? (j as Record<string, unknown>) : undefined;
}

export function sessionText(items: readonly SessionItem[], now = new Date()): string {
  return (
    toJsonText({
      format: SESSION_FORMAT,
      version: SESSION_VERSION,
      savedAt: now.toISOString(),
      gradus: VERSION,
      items: items.map((x) => {
        const document = documentOf(x);
        return { title: x.title, origin: x.origin, ...(x.target ? { target: targetToJson(x.target) } : {}), ...(document ? { document } : {}) };
      }),
    }) + '\n'
  );
}

/** Write the session (an existing file only with `force`, given by `overwriteKey`); returns the bytes written. */
export function saveSession(items: readonly SessionItem[], path: string, force: boolean, overwriteKey: string): number {
  if (force && existsSync(path) && !isSessionFile(path)) {
    throw new InputError(`${path} is not a session file of gradus; it is left alone`, 'session file');
  }
  const text = sessionText(items);
  appWrite(path, text, force, overwriteKey);
  return Buffer.byteLength(text);
}

/** A file this program wrote as a session (only such a file is ever replaced). */
function isSessionFile(path: string): boolean {
  try {
    if (statSync(path).size > MAX_SESSION_BYTES) return false;
    return (JSON.parse(readFileSync(path, 'utf8')) as { format?: unknown }).format === SESSION_FORMAT;
  } catch {
    return false;
  }
}

/** Read and check a session file; every item is checked before any is returned. */
export function loadSession(path: string): NewItem[] {
  let text: string;
  try {
    const st = statSync(path);
    if (st.isDirectory()) throw new InputError(`session file ${path} is a folder; give a file name`, 'session file');
    if (st.size > MAX_SESSION_BYTES) throw new InputError(`session file ${path} has ${st.size} bytes; a session file is at most ${MAX_SESSION_BYTES}`, 'session file');
    text = readFileSync(path, 'utf8');
  } catch (e) {
    if (e instanceof InputError) throw e;
    throw new InputError(`cannot read session file ${path} (${(e as NodeJS.ErrnoException).code ?? 'error'})`, 'session file');
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw new InputError(`session file ${path} is not JSON (not a session file of gradus)`, 'session file');
  }
  const doc = parseWith(SESSION, json, `session file ${path}`, 'session file');
  return doc.items.map((x, i) => {
    const where = `session file ${path}: items[${i}]`;
    const target = x.target === undefined ? undefined : targetFromJson(x.target, `${where}.target`, 'session file');
    if (x.origin === 'search' && x.document) checkSearchDocument(x.document, `${where}.document`);
    return { title: x.title, origin: x.origin, ...(target ? { target } : {}), ...(x.document ? { payload: { json: x.document } } : {}) };
  });
}
