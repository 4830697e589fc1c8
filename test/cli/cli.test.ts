/** The command line as users meet it: a child process. */
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.js';

describe('gradus command line (child process)', () => {
  it('--help lists the commands', () => {
    const r = runCli(['--help']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('qanalog');
    expect(r.stdout).toContain('usage: gradus <command>');
  });
  it('<cmd> --help shows the options of a command', () => {
    const r = runCli(['qanalog', '--help']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('--n N');
    expect(r.stdout).toContain('ordered-stirling');
  });
  it('version prints the package version', () => {
    const r = runCli(['version']);
    expect(r.code).toBe(0);
    expect(r.stdout.trim()).toMatch(/^\d+\.\d+\.\d+$/);
  });
  it('qanalog --json prints exactly one JSON document (q-Stirling, checked by the recurrence by hand)', () => {
    const r = runCli(['qanalog', 'stirling', '--n', '4', '--k', '2', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout);
    // Stir_q(4,2) = 3 + 3q + q^2 (Carlitz's q-Stirling recurrence, worked by hand)
    expect(doc.series).toEqual([3, 3, 1]);
    expect(doc.atOne).toBe(7);
  });
  it('qanalog factorial prints text', () => {
    const r = runCli(['qanalog', 'factorial', '--n', '3']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('[3]_q! = q^3 + 2*q^2 + 2*q + 1');
  });
  it('bad input exits 2 with one line on stderr and no stack trace', () => {
    for (const args of [
      ['qanalog', 'factorial', '--n', '-3'],
      ['qanalog', 'nosuch', '--n', '3'],
      ['qanalog', 'stirling', '--n', '3'],
      ['frobnicate'],
      ['qanalog', 'factorial', '--nn', '3'],
    ]) {
      const r = runCli(args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
      expect(r.stderr).not.toMatch(/\s+at\s/);
      expect(r.stdout).toBe('');
    }
    expect(runCli(['qanalog', 'factorial', '--n', '-3']).stderr).toContain('--n must be an integer from 0 to 200');
  });
  it('integers beyond 2^53 are strings in JSON', () => {
    const r = runCli(['qanalog', 'factorial', '--n', '30', '--json']);
    const doc = JSON.parse(r.stdout);
    expect(typeof doc.atOne).toBe('string');
    expect(doc.atOne).toBe('265252859812191058636308480000000');
  });
});

describe('gradus in a pipeline', () => {
  it('a reader that closes early ends the run quietly (no EPIPE stack trace)', async () => {
    const { spawnSync } = await import('node:child_process');
    const bin = new URL('../../bin/gradus.mjs', import.meta.url).pathname;
    const r = spawnSync('bash', ['-c', `node ${bin} qanalog factorial --n 120 | head -c 10 >/dev/null; echo "rc=\${PIPESTATUS[0]}"`], {
      encoding: 'utf8',
      timeout: 120_000,
    });
    expect(r.stderr).not.toMatch(/EPIPE|\s+at\s/);
    expect(r.stdout).toContain('rc=0');
  });
});
