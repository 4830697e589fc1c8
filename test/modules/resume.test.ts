/**
 * Resumable module runs (--resume): a run reading a checkpoint that holds part of the work
 * computes only the rest and gives the same result as a fresh run (the fresh run is the
 * reference: common practice for checkpointing).
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { computeModule, computeModuleAsync, type ModuleOptions, type ModuleSpec } from '../../src/modules/compute-module.js';
import { resultToJson } from '../../src/modules/format-result.js';
import type { ModuleResult } from '../../src/modules/module-result.js';
import { runCli } from '../helpers/cli.js';

const dir = mkdtempSync(join(tmpdir(), 'gradus-resume-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
let fileNo = 0;
const newFile = (): string => join(dir, `run${fileNo++}.ckpt`);

/** The JSON result without the parts that depend on the run (time, notes). */
function comparable(r: ModuleResult): string {
  const { provenance, ...rest } = resultToJson(r) as { provenance: Record<string, unknown> };
  return JSON.stringify({ ...rest, primes: provenance['primes'], confirmation: provenance['confirmation'] });
}

/** Run with a counter of finished units (progress callbacks). */
function counted(spec: ModuleSpec, options: ModuleOptions): { result: ModuleResult; computed: number } {
  let computed = 0;
  const result = computeModule(spec, { ...options, onProgress: () => computed++ });
  return { result, computed };
}

const young: ModuleSpec = { seed: 'superspace-vandermonde', n: 5, k: 3, ops: ['x', 'theta'] }; // four computed tasks
const fresh = counted(young, { frobenius: true });

describe('checkpoint on the Young-subgroup route', () => {
  it('a full checkpoint gives the fresh result and computes nothing on the rerun', () => {
    const file = newFile();
    const first = counted(young, { frobenius: true, checkpoint: file });
    expect(first.computed).toBe(fresh.computed);
    expect(comparable(first.result)).toBe(comparable(fresh.result));
    expect(readFileSync(file, 'utf8').trim().split('\n')).toHaveLength(1 + fresh.computed);
    const again = counted(young, { frobenius: true, checkpoint: file });
    expect(again.computed).toBe(0);
    expect(comparable(again.result)).toBe(comparable(fresh.result));
    expect(again.result.provenance.notes.join(' ')).toMatch(new RegExp(`${fresh.computed} finished units .* read from the checkpoint`));
  });

  it('a run stopped by its AbortSignal resumes with only the remaining tasks', () => {
    const file = newFile();
    const stop = new AbortController();
    expect(() =>
      computeModule(young, { frobenius: true, checkpoint: file, signal: stop.signal, onProgress: (done) => done === 3 && stop.abort(new Error('stopped')) }),
    ).toThrow('stopped');
    const rest = counted(young, { frobenius: true, checkpoint: file });
    expect(rest.computed).toBe(fresh.computed - 3);
    expect(comparable(rest.result)).toBe(comparable(fresh.result));
    expect(rest.result.provenance.notes.join(' ')).toMatch(/3 finished units/);
  });

  it('a file cut after any line, even mid-line, resumes to the fresh result', () => {
    const full = newFile();
    counted(young, { frobenius: true, checkpoint: full });
    const text = readFileSync(full, 'utf8');
    fc.assert(
      fc.property(fc.integer({ min: text.indexOf('\n') + 1, max: text.length }), (cut) => {
        const file = newFile();
        writeFileSync(file, text.slice(0, cut));
        const whole = text.slice(0, cut).split('\n').length - 2; // complete task lines
        const rest = counted(young, { frobenius: true, checkpoint: file });
        expect(rest.computed).toBe(fresh.computed - whole);
        expect(comparable(rest.result)).toBe(comparable(fresh.result));
        // the torn line was dropped and the missing tasks appended in plan order: the full file again
        expect(readFileSync(file, 'utf8')).toBe(text);
      }),
      { numRuns: 6 },
    );
  });

  it('worker threads resume from a checkpoint written by one thread', { timeout: 60_000 }, async () => {
    const full = newFile();
    counted(young, { frobenius: true, checkpoint: full });
    const file = newFile();
    writeFileSync(file, readFileSync(full, 'utf8').split('\n').slice(0, 3).join('\n') + '\n');
    let computed = 0;
    const r = await computeModuleAsync(young, { frobenius: true, checkpoint: file, parallelAboveSeconds: 0, onProgress: () => computed++ });
    expect(r.provenance.notes.join(' ')).toMatch(/worker threads/);
    expect(computed).toBe(fresh.computed - 2);
    expect(comparable(r)).toBe(comparable(fresh.result));
  });
});

describe('checkpoint on the iterated route (one line per prime run)', () => {
  const spec: ModuleSpec = { seed: 'superspace-vandermonde', n: 3, k: 2, ops: ['x', 'y', 'polar1'] };
  it('records both primes and a rerun computes nothing', () => {
    const ref = counted(spec, { frobenius: true, method: 'iterated' });
    const file = newFile();
    const first = counted(spec, { frobenius: true, method: 'iterated', checkpoint: file });
    expect(comparable(first.result)).toBe(comparable(ref.result));
    expect(readFileSync(file, 'utf8').trim().split('\n')).toHaveLength(3);
    const again = counted(spec, { frobenius: true, method: 'iterated', checkpoint: file });
    expect(again.computed).toBe(0);
    expect(comparable(again.result)).toBe(comparable(ref.result));
  });
});

describe('a checkpoint of another request', () => {
  it('is an InputError naming --resume and the differing fields', () => {
    const file = newFile();
    computeModule(young, { frobenius: true, checkpoint: file });
    const other = (): unknown => computeModule({ ...young, k: 2 }, { frobenius: false, checkpoint: file });
    expect(other).toThrow(InputError);
    expect(other).toThrow(/--resume: .* another request \(differs in .*spec.*frobenius/);
    expect(() => computeModule(young, { checkpoint: join(dir, 'no-such-dir', 'x.ckpt') })).toThrow(/--resume: cannot write/);
    writeFileSync(file, 'not json\n');
    expect(() => computeModule(young, { checkpoint: file })).toThrow(/--resume: .* not a module checkpoint/);
  });

  it('the command line refuses it with exit code 2 and resumes a matching one', () => {
    const file = newFile();
    const args = ['module', '--seed', 'superspace-vandermonde', '--n', '3', '--k', '2', '--ops', 'x,theta', '--frobenius', '--json', '--resume', file];
    const first = runCli(args);
    expect(first.code).toBe(0);
    const again = runCli(args);
    expect(again.code).toBe(0);
    expect(JSON.parse(again.stdout).provenance.notes.join(' ')).toMatch(/read from the checkpoint/);
    expect(JSON.parse(again.stdout).schur).toEqual(JSON.parse(first.stdout).schur);
    const bad = runCli(args.map((a) => (a === '3' ? '4' : a)));
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/--resume/);
  });
});
