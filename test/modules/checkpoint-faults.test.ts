/**
 * --resume pointed at files gradus did not write, and at checkpoints changed after gradus wrote
 * them: refused with one line, and nothing of the file is changed (common practice: never
 * damage what the program did not write).
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { computeModule, type ModuleSpec } from '../../src/modules/compute-module.js';
import { Catalogue } from '../../src/store/catalogue.js';
import { runCli } from '../helpers/cli.js';

const dir = mkdtempSync(join(tmpdir(), 'gradus-ckpt-faults-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const spec: ModuleSpec = { seed: 'superspace-vandermonde', n: 4, k: 2, ops: ['x', 'theta'] };

function refusedUnchanged(path: string, pattern: RegExp): void {
  const before = readFileSync(path);
  expect(() => computeModule(spec, { frobenius: true, checkpoint: path })).toThrow(InputError);
  expect(() => computeModule(spec, { frobenius: true, checkpoint: path })).toThrow(pattern);
  expect(readFileSync(path).equals(before)).toBe(true);
}

describe('--resume on files gradus did not write', () => {
  it('a catalogue is refused and stays readable', () => {
    const path = join(dir, 'catalogue.sqlite');
    Catalogue.open(path).close();
    refusedUnchanged(path, /not a module checkpoint of gradus; it is left alone/);
    Catalogue.open(path, { existing: true }).close();
  });
  it('a one-line JSON file without a final newline, an empty file and a text file are refused untouched', () => {
    const one = join(dir, 'notes.json');
    writeFileSync(one, '{"my": "results"}');
    refusedUnchanged(one, /not a module checkpoint/);
    const empty = join(dir, 'empty.ckpt');
    writeFileSync(empty, '');
    refusedUnchanged(empty, /not a module checkpoint/);
    const text = join(dir, 'paper.tex');
    writeFileSync(text, '\\section{Results}\nline two\n');
    refusedUnchanged(text, /not a module checkpoint/);
  });
  it('a folder is refused', () => {
    const folder = join(dir, 'a-folder');
    mkdirSync(folder);
    expect(() => computeModule(spec, { checkpoint: folder })).toThrow(/not a regular file/);
  });
});

describe('checkpoints changed after gradus wrote them', () => {
  it('an edited rank is refused (exit 2 on the command line), naming the line', () => {
    const file = join(dir, 'run.ckpt');
    const args = ['module', '--seed', 'superspace-vandermonde', '--n', '4', '--k', '2', '--ops', 'x,theta', '--frobenius', '--json', '--resume', file];
    const first = runCli(args);
    expect(first.code, first.stderr).toBe(0);
    const lines = readFileSync(file, 'utf8').split('\n');
    // change one rank of the first task line by one
    lines[1] = lines[1]!.replace(/"ranks":\[\[(\d+)/, (_m, d: string) => `"ranks":[[${Number(d) + 1}`);
    writeFileSync(file, lines.join('\n'));
    const again = runCli(args);
    expect(again.code).toBe(2);
    expect(again.stderr).toMatch(/line 2 of .* was changed after gradus wrote it/);
    expect(again.stdout).toBe('');
  });
  it('a line that is not of our schema is refused with its place', () => {
    const file = join(dir, 'run2.ckpt');
    computeModule(spec, { frobenius: true, checkpoint: file });
    const lines = readFileSync(file, 'utf8').split('\n');
    lines[1] = '{"task": -3, "ranks": "many", "check": "x"}';
    writeFileSync(file, lines.join('\n'));
    expect(() => computeModule(spec, { frobenius: true, checkpoint: file })).toThrow(/--resume: line 2 of .*/);
  });
});
