/**
 * The product cites only published sources (common practice): no code, statistic or family
 * source, test, bench file, README.md or DEVELOPERS.md may point at the team's working notes
 * (MATH.md, DESIGN.md, the shared notes folder or a "design note" in it). This file is the
 * one exception, since it has to spell the names it looks for.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(fileURLToPath(new URL('../..', import.meta.url)));
const SELF = relative(ROOT, fileURLToPath(import.meta.url));
const DIRS = ['src', 'objects', 'statistics', 'test', 'bench'];
const FILES = ['README.md', 'DEVELOPERS.md'];
const NOTES = /MATH\.md|DESIGN\.md|\bshared\/|\bnotes\/|design note/i;

function walk(dir: string, out: string[]): void {
  for (const name of readdirSync(dir)) {
    if (name === 'node_modules' || name.startsWith('.')) continue;
    const path = join(dir, name);
    if (statSync(path).isDirectory()) walk(path, out);
    else out.push(path);
  }
}

/** Every line of a text file under the checked places that mentions the notes, as path:line: text. */
function offences(): { scanned: number; found: string[] } {
  const paths: string[] = [];
  for (const d of DIRS) walk(join(ROOT, d), paths);
  for (const f of FILES) paths.push(join(ROOT, f));
  const found: string[] = [];
  let scanned = 0;
  for (const path of paths) {
    const rel = relative(ROOT, path);
    if (rel === SELF) continue;
    const text = readFileSync(path, 'utf8');
    if (text.includes('\u0000')) continue; // not text
    scanned++;
    text.split('\n').forEach((line, i) => {
      if (NOTES.test(line)) found.push(`${rel}:${i + 1}: ${line.trim()}`);
    });
  }
  return { scanned, found };
}

describe('no citations of the team notes (common practice: the product cites only published sources)', () => {
  it('the pattern catches each way of naming the notes and passes published sources', () => {
    for (const bad of ['(MATH.md §3)', 'see DESIGN.md', '../shared/DESIGN.md', '/work/shared/x', 'notes/derivative-closures.md', '(design note, "Checks")'])
      expect(NOTES.test(bad), bad).toBe(true);
    for (const good of ['Macdonald, Symmetric Functions and Hall Polynomials, 2nd ed., ch. I', 'shared memory between threads', 'provenance.notes.join', 'mathjs stirlingS2'])
      expect(NOTES.test(good), good).toBe(false);
  });

  it('src, objects, statistics, test, bench, README.md and DEVELOPERS.md cite only published sources', () => {
    const { scanned, found } = offences();
    expect(scanned).toBeGreaterThan(300); // the walk really reached the tree
    expect(found, found.join('\n')).toEqual([]);
  });
});
