/** The catalogue through the command line: build, info, interruption, damage. */
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.js';

const BIN = new URL('../../bin/gradus.mjs', import.meta.url).pathname;

function unitCount(path: string): number {
  if (!existsSync(path)) return 0;
  try {
    const db = new Database(path, { readonly: true, fileMustExist: true });
    try {
      return (db.prepare('SELECT COUNT(*) AS c FROM units').get() as { c: number }).c;
    } finally {
      db.close();
    }
  } catch {
    return 0;
  }
}

describe('gradus catalogue', () => {
  it('survives a process killed mid-build: only whole units, and a second run resumes', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'gradus-kill-'));
    const path = join(dir, 'c.sqlite');
    const child = spawn(process.execPath, [BIN, 'catalogue', 'build', '--n-max', '8', '--catalogue', path], { stdio: 'ignore' });
    const exited = new Promise<NodeJS.Signals | null>((res) => child.on('exit', (_c, sig) => res(sig)));
    const t0 = Date.now();
    while (unitCount(path) < 8 && Date.now() - t0 < 60_000) await new Promise((r) => setTimeout(r, 50));
    child.kill('SIGKILL');
    expect(await exited).toBe('SIGKILL'); // killed, not finished
    const info = runCli(['catalogue', 'info', '--catalogue', path, '--json']);
    expect(info.code, info.stderr).toBe(0);
    // the catalogue says its build is unfinished, and so does every answer from it
    expect(JSON.parse(info.stdout).unfinished).toMatch(/unfinished or still running .*gradus catalogue build --n-max 8/);
    const text = runCli(['catalogue', 'info', '--catalogue', path]);
    expect(text.stdout).toMatch(/^warning: the catalogue's last build .* is unfinished/m);
    const answer = runCli(['search', '--coeffs', 'n=3:1,2,2,1', '--catalogue', path]);
    expect(answer.code, answer.stderr).toBe(0);
    expect(answer.stdout).toMatch(/^warning: the catalogue's last build/m);
    const answerJson = runCli(['search', '--coeffs', 'n=3:1,2,2,1', '--catalogue', path, '--json']);
    expect(JSON.parse(answerJson.stdout).provenance.notes.join(' ')).toMatch(/unfinished/);
    const db = new Database(path, { readonly: true });
    // every stored distribution belongs to a unit marked finished (no half-written unit)
    const orphans = db.prepare('SELECT COUNT(*) AS c FROM distributions d WHERE NOT EXISTS (SELECT 1 FROM units u WHERE u.family = d.family AND u.params = d.params)').get() as { c: number };
    expect(orphans.c).toBe(0);
    const units = (db.prepare('SELECT COUNT(*) AS c FROM units').get() as { c: number }).c;
    db.close();
    expect(units).toBeGreaterThanOrEqual(8);
    const again = runCli(['catalogue', 'build', '--n-max', '2', '--catalogue', path, '--json']);
    expect(again.code, again.stderr).toBe(0);
    expect(JSON.parse(again.stdout).skippedDone).toBeGreaterThan(0);
    expect(JSON.parse(runCli(['catalogue', 'info', '--catalogue', path, '--json']).stdout).unfinished).toBeUndefined();
  }, 120_000);
  it('a damaged catalogue is reported with the command that rebuilds it, and rebuild sets it aside', { timeout: 60_000 }, () => {
    const dir = mkdtempSync(join(tmpdir(), 'gradus-bad-'));
    const path = join(dir, 'c.sqlite');
    expect(runCli(['catalogue', 'build', '--n-max', '2', '--families', 'permutations', '--catalogue', path]).code).toBe(0);
    // break the schema page (page 1 after the 100-byte header): SQLite then finds the file malformed
    const bytes = readFileSync(path);
    bytes.fill(0x5a, 100, 4096);
    writeFileSync(path, bytes);
    const r = runCli(['catalogue', 'info', '--catalogue', path]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('damaged');
    expect(r.stderr).toContain('gradus catalogue rebuild');
    const s = runCli(['search', '--coeffs', 'n=2:1,1', '--catalogue', path]);
    expect(s.code).toBe(2);
    expect(s.stderr).toContain('gradus catalogue rebuild');
    const b = runCli(['catalogue', 'rebuild', '--n-max', '3', '--catalogue', path]);
    expect(b.code, b.stderr).toBe(0);
    expect(readdirSync(dir).some((f) => f.includes('.aside-'))).toBe(true);
    expect(runCli(['catalogue', 'info', '--catalogue', path]).code).toBe(0);
  });
  it('build needs --n-max; info on a missing file says how to fill one', { timeout: 30_000 }, () => {
    const dir = mkdtempSync(join(tmpdir(), 'gradus-empty-'));
    expect(runCli(['catalogue', 'build', '--catalogue', join(dir, 'c.sqlite')]).stderr).toContain('--n-max');
    const r = runCli(['catalogue', 'info', '--catalogue', join(dir, 'none.sqlite')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('catalogue build --n-max');
  });
});
