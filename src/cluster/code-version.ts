/**
 * The code a plan was made with: the gradus version and a hash of the source tree (sources,
 * families, statistics, the launcher and the dependency lock). Shards of one plan must all be
 * computed by the same code, so a cluster whose checkout changed between array tasks is caught
 * rather than merged.
 */
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { VERSION } from '../version.js';

export interface CodeVersion {
  readonly gradus: string;
  /** sha256 over the paths and bytes of the tree, first 16 hex digits. */
  readonly source: string;
}

/** The root of this gradus checkout (where package.json is). */
export const GRADUS_ROOT = fileURLToPath(new URL('../..', import.meta.url));

const TREES = ['src', 'objects', 'statistics', 'bin'];
const FILES = ['package.json', 'package-lock.json'];

function walk(dir: string, out: string[]): void {
  let names: string[];
  try {
    names = readdirSync(dir);
  } catch {
    return;
  }
  for (const name of names) {
    const path = join(dir, name);
    const st = statSync(path);
    if (st.isDirectory()) walk(path, out);
    else if (st.isFile()) out.push(path);
  }
}

let cached: CodeVersion | undefined;

export function codeVersion(): CodeVersion {
  if (cached) return cached;
  const files: string[] = [];
  for (const t of TREES) walk(join(GRADUS_ROOT, t), files);
  for (const f of FILES) files.push(join(GRADUS_ROOT, f));
  const hash = createHash('sha256');
  for (const path of files.map((f) => relative(GRADUS_ROOT, f)).sort()) {
    let bytes: Buffer;
    try {
      bytes = readFileSync(join(GRADUS_ROOT, path));
    } catch {
      continue; // a lock file may be absent in an installed copy
    }
    hash.update(`${path}\0${bytes.length}\0`).update(bytes);
  }
  cached = { gradus: VERSION, source: hash.digest('hex').slice(0, 16) };
  return cached;
}

export function codeText(c: CodeVersion): string {
  return `gradus ${c.gradus} (source ${c.source})`;
}

export function sameCode(a: CodeVersion, b: CodeVersion): boolean {
  return a.gradus === b.gradus && a.source === b.source;
}
