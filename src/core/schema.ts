/**
 * Input files (targets, saved searches, checkpoints, expression files) are checked against
 * a schema (zod) where they enter; the first problem becomes one line naming the file, the
 * place in it and what was expected (InputError, exit 2).
 */
import { readFileSync, statSync } from 'node:fs';
import type { z } from 'zod';
import { InputError } from './errors.js';
import { shown } from './shown.js';

export function parseWith<T>(schema: z.ZodType<T>, value: unknown, where: string, option?: string): T {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const issue = r.error.issues[0]!;
  const at = issue.path.length ? ` at ${issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '')}` : '';
  throw new InputError(`${where}${at}: ${shown(issue.message, 160)}`, option);
}

/** Read a JSON file of ours, refusing at once one larger than `maxBytes` or not JSON. */
export function readJsonFile(path: string, option: string, maxBytes: number, what: string): unknown {
  let size: number;
  try {
    const st = statSync(path);
    if (st.isDirectory()) throw new InputError(`--${option}: ${path} is a folder; give ${what}`, option);
    size = st.size;
  } catch (e) {
    if (e instanceof InputError) throw e;
    throw new InputError(`--${option}: cannot read ${path} (${(e as NodeJS.ErrnoException).code ?? 'error'})`, option);
  }
  if (size > maxBytes) throw new InputError(`--${option}: ${path} has ${size} bytes; ${what} is at most ${maxBytes} bytes`, option);
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    throw new InputError(`--${option}: cannot read ${path} (${(e as NodeJS.ErrnoException).code ?? 'error'})`, option);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new InputError(`--${option}: ${path} is not valid JSON (${shown((e as Error).message, 100)})`, option);
  }
}
