/**
 * The quotient route on worker threads and its checkpoint: the same cells as the in-thread
 * route; a run killed part-way resumes from the tasks it finished and gives the same result;
 * files gradus did not write, checkpoints of other requests and edited lines are refused with
 * one line, untouched (common practice: never damage what the program did not write).
 */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { computeQuotient, computeQuotientAsync } from '../../src/modules/compute-quotient.js';
import type { IdealSpec } from '../../src/modules/ideals.js';
import { stopPool } from '../../src/pool/pool.js';
import { BIN, runCli } from '../helpers/cli.js';

const dir = mkdtempSync(join(tmpdir(), 'gradus-quotient-resume-'));
afterAll(async () => {
  rmSync(dir, { recursive: true, force: true });
  await stopPool();
});

const withoutTime = (doc: Record<string, unknown>) => ({ ...doc, provenance: undefined });

describe('quotients on worker threads', () => {
  it('give the cells of the in-thread route (x,y and x,y,θ coinvariants, n = 4; R_{4,2})', async () => {
    const specs: IdealSpec[] = [
      { ideal: 'coinvariant', n: 4, y: true, theta: false },
      { ideal: 'coinvariant', n: 4, y: true, theta: true },
      { ideal: 'generalized-coinvariant', n: 4, k: 2, y: false, theta: false },
    ];
    for (const spec of specs) {
      const a = computeQuotient(spec, { frobenius: true });
      const b = await computeQuotientAsync(spec, { frobenius: true });
      expect(b.cells, JSON.stringify(spec)).toEqual(a.cells);
      expect(b.provenance.confirmation).toBe(a.provenance.confirmation);
    }
  }, 120_000);
});

describe('quotient --resume', () => {
  const args = (file: string) => ['quotient', '--ideal', 'coinvariant', '--n', '5', '--vars', 'x,y,theta', '--frobenius', '--json', '--resume', file];

  it('a run killed part-way resumes from its finished tasks and gives the result of an uninterrupted run', async () => {
    const file = join(dir, 'xyt5.ckpt');
    const child = spawn(process.execPath, [BIN, ...args(file)], { stdio: 'ignore' });
    const exited = new Promise<NodeJS.Signals | null>((res) => child.on('exit', (_c, sig) => res(sig)));
    const t0 = Date.now();
    const lines = () => (existsSync(file) ? readFileSync(file, 'utf8').split('\n').filter(Boolean).length : 0);
    while (lines() < 3 && Date.now() - t0 < 60_000) await new Promise((r) => setTimeout(r, 10));
    child.kill('SIGKILL');
    const signal = await exited;
    const kept = lines() - 1;
    expect(kept).toBeGreaterThanOrEqual(2);
    const resumed = runCli(args(file));
    expect(resumed.code, resumed.stderr).toBe(0);
    const fresh = runCli(['quotient', '--ideal', 'coinvariant', '--n', '5', '--vars', 'x,y,theta', '--frobenius', '--json']);
    expect(withoutTime(JSON.parse(resumed.stdout))).toEqual(withoutTime(JSON.parse(fresh.stdout)));
    // when the kill came before the end, the rerun says how much it read back
    if (signal === 'SIGKILL') expect(JSON.parse(resumed.stdout).provenance.notes.join(' ')).toMatch(/finished units? .* read from the checkpoint/);
    // dimension 3936 (a general commutative-algebra system, mod 32003, as quoted in issue 13)
    expect(JSON.parse(resumed.stdout).dimension).toBe(3936);
  }, 180_000);

  it('a text file, and the checkpoint of another request, are refused untouched with exit 2', () => {
    const text = join(dir, 'paper.tex');
    writeFileSync(text, '\\section{Results}\n');
    const r = runCli(args(text));
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(readFileSync(text, 'utf8')).toBe('\\section{Results}\n');
    const other = join(dir, 'xy4.ckpt');
    expect(runCli(['quotient', '--ideal', 'coinvariant', '--n', '4', '--vars', 'x,y', '--json', '--resume', other]).code).toBe(0);
    const before = readFileSync(other, 'utf8');
    const mismatch = runCli(args(other));
    expect(mismatch.code).toBe(2);
    expect(mismatch.stderr).toMatch(/written for another request \(differs in .*spec/);
    expect(readFileSync(other, 'utf8')).toBe(before);
  }, 120_000);

  it('an edited dimension is refused, naming the line', () => {
    const file = join(dir, 'xy4-edit.ckpt');
    const a = ['quotient', '--ideal', 'coinvariant', '--n', '4', '--vars', 'x,y', '--frobenius', '--json', '--resume', file];
    expect(runCli(a).code).toBe(0);
    const lines = readFileSync(file, 'utf8').split('\n');
    lines[1] = lines[1]!.replace(/"dims":\[\[(\d+)/, (_m, d: string) => `"dims":[[${Number(d) + 1}`);
    writeFileSync(file, lines.join('\n'));
    const again = runCli(a);
    expect(again.code).toBe(2);
    expect(again.stderr).toMatch(/line 2 of .* was changed after gradus wrote it/);
  }, 120_000);
});
