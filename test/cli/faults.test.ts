/**
 * The fault pass, tried as a hostile user would: files that are not ours, read-only places,
 * concurrent runs, edited rows, huge or malformed inputs, full devices. Each case checks the
 * one-line answer and exit code 2, and that nothing the user had was lost (common practice:
 * a tool never damages what it did not write).
 */
import { spawn, spawnSync } from 'node:child_process';
import { chmodSync, closeSync, existsSync, mkdirSync, mkdtempSync, openSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.js';

const BIN = new URL('../../bin/gradus.mjs', import.meta.url).pathname;
const root = mkdtempSync(join(tmpdir(), 'gradus-faults-'));
chmodSync(root, 0o755);
const cat = join(root, 'catalogue.sqlite');
const NOBODY = 65534;
const asRoot = process.getuid?.() === 0;

function fails(r: { code: number; stderr: string; stdout: string }, pattern: RegExp): void {
  expect(r.code, r.stderr).toBe(2);
  expect(r.stderr).toMatch(pattern);
  expect(r.stderr.trim().split('\n')).toHaveLength(1);
  expect(r.stderr).not.toMatch(/internal error|\n\s+at /);
}

function snapshot(dir: string): string {
  return readdirSync(dir).sort().map((f) => `${f}:${statSync(join(dir, f)).isFile() ? readFileSync(join(dir, f)).toString('base64') : 'dir'}`).join('\n');
}

beforeAll(() => {
  const r = runCli(['catalogue', 'build', '--n-max', '4', '--families', 'permutations,subsets', '--catalogue', cat]);
  expect(r.code, r.stderr).toBe(0);
});

describe('catalogue rebuild and build check everything before touching the file', () => {
  it('a misspelt family, a limit too small: refused, the catalogue unchanged and nothing set aside', () => {
    const before = snapshot(root);
    fails(runCli(['catalogue', 'rebuild', '--families', 'permutatoins', '--catalogue', cat]), /--families: unknown family "permutatoins" \(nearest: permutations/);
    fails(runCli(['catalogue', 'rebuild', '--max-objects', '10', '--catalogue', cat]), /above the limit 10; raise it with --max-objects/);
    fails(runCli(['catalogue', 'build', '--n-max', '3', '--families', 'bogus', '--catalogue', cat]), /unknown family "bogus"/);
    fails(runCli(['catalogue', 'build', '--n-max', '3', '--families', 'monotone-triangles', '--catalogue', cat]), /monotone-triangles is not catalogued \(no statistics yet\)/);
    expect(snapshot(root)).toBe(before);
  });
});

describe('things that are not a catalogue', () => {
  it('a folder: named as a folder; rebuild leaves it where it is', () => {
    const folder = join(root, 'a-folder');
    mkdirSync(folder);
    writeFileSync(join(folder, 'thesis.tex'), 'mine');
    fails(runCli(['catalogue', 'info', '--catalogue', folder]), /is a folder; give the path of a catalogue file/);
    fails(runCli(['catalogue', 'rebuild', '--n-max', '2', '--catalogue', folder]), /is a folder/);
    expect(readFileSync(join(folder, 'thesis.tex'), 'utf8')).toBe('mine');
  });
  it('a text file: not a gradus catalogue, left alone; rebuild sets it aside only with --force', () => {
    const dir = mkdtempSync(join(root, 'text-'));
    const path = join(dir, 'notes.txt');
    writeFileSync(path, 'my notes\n');
    fails(runCli(['search', '--coeffs', 'n=2:1,1', '--catalogue', path]), /not an SQLite database, not a gradus catalogue; gradus leaves it alone/);
    fails(runCli(['catalogue', 'build', '--n-max', '2', '--catalogue', path]), /not a gradus catalogue/);
    fails(runCli(['catalogue', 'rebuild', '--n-max', '2', '--catalogue', path]), /add --force/);
    expect(readFileSync(path, 'utf8')).toBe('my notes\n');
    const forced = runCli(['catalogue', 'rebuild', '--n-max', '2', '--families', 'subsets', '--force', '--catalogue', path]);
    expect(forced.code, forced.stderr).toBe(0);
    const aside = readdirSync(dir).find((f) => f.includes('.aside-'))!;
    expect(readFileSync(join(dir, aside), 'utf8')).toBe('my notes\n');
  });
  it("another program's SQLite database is refused untouched", () => {
    const path = join(root, 'other.sqlite');
    const db = new Database(path);
    db.exec("CREATE TABLE experiments (id INTEGER, result TEXT); INSERT INTO experiments VALUES (1, 'keep me')");
    db.close();
    const before = readFileSync(path);
    fails(runCli(['catalogue', 'build', '--n-max', '2', '--catalogue', path]), /SQLite database gradus did not write/);
    expect(readFileSync(path).equals(before)).toBe(true);
  });
  it('a catalogue folder under a file, or one that cannot be created: exit 2', () => {
    fails(runCli(['catalogue', 'build', '--n-max', '2', '--catalogue', join(root, 'catalogue.sqlite', 'x', 'c.sqlite')]), /is a file, not a folder|cannot create the folder/);
  });
});

describe('many processes and read-only places', () => {
  it('three processes creating the same new catalogue at once all succeed', async () => {
    for (let attempt = 0; attempt < 2; attempt++) {
      const path = join(mkdtempSync(join(root, 'race-')), 'c.sqlite');
      const runs = Array.from({ length: 3 }, () =>
        new Promise<{ code: number | null; err: string }>((res) => {
          const child = spawn(process.execPath, [BIN, 'catalogue', 'build', '--n-max', '2', '--families', 'subsets', '--workers', '1', '--catalogue', path]);
          let err = '';
          child.stderr.on('data', (d: Buffer) => (err += d.toString()));
          child.on('exit', (code) => res({ code, err }));
        }),
      );
      for (const r of await Promise.all(runs)) expect(r.code, r.err).toBe(0);
    }
  });
  it.runIf(asRoot)('a read-only catalogue in a read-only folder answers searches (not kept) and refuses builds, as another user', () => {
    const dir = mkdtempSync(join(root, 'ro-'));
    const path = join(dir, 'c.sqlite');
    writeFileSync(path, readFileSync(cat));
    chmodSync(path, 0o444);
    chmodSync(dir, 0o555);
    const search = runCli(['search', '--coeffs', 'n=3:1,2,2,1', '--catalogue', path], { uid: NOBODY, env: { HOME: root } });
    expect(search.code, search.stderr).toBe(0);
    expect(search.stdout).toMatch(/not kept in the catalogue \(it is read-only\)/);
    expect(runCli(['catalogue', 'info', '--catalogue', path], { uid: NOBODY, env: { HOME: root } }).stdout).toMatch(/read-only/);
    fails(runCli(['catalogue', 'build', '--n-max', '3', '--catalogue', path], { uid: NOBODY, env: { HOME: root } }), /cannot write the catalogue .* read-only/);
    chmodSync(dir, 0o777); // a writable folder, the file still read-only
    const again = runCli(['search', '--coeffs', 'n=3:1,2,2,1', '--catalogue', path], { uid: NOBODY, env: { HOME: root } });
    expect(again.code, again.stderr).toBe(0);
    // a folder nobody may create (under root's own folder)
    fails(runCli(['catalogue', 'build', '--n-max', '2', '--catalogue', join(root, 'theirs', 'c.sqlite')], { uid: NOBODY, env: { HOME: root } }), /cannot create the folder .* \(permission denied\)/);
    chmodSync(dir, 0o555);
    fails(runCli(['catalogue', 'build', '--n-max', '2', '--catalogue', join(dir, 'new.sqlite')], { uid: NOBODY, env: { HOME: root } }), /read-only/);
  });
});

describe('rows and files changed behind gradus', () => {
  it('one changed digit of a stored series is caught by its hash when the row is read', () => {
    const path = join(root, 'edited.sqlite');
    writeFileSync(path, readFileSync(cat));
    const db = new Database(path);
    const row = db.prepare("SELECT id, series FROM distributions WHERE family = 'permutations' AND n = 3 AND statistics = 'inversions' AND combine = 'single'").get() as { id: number; series: string };
    db.prepare('UPDATE distributions SET series = ? WHERE id = ?').run(row.series.replace('2', '3'), row.id);
    db.close();
    fails(runCli(['search', '--coeffs', 'n=3:1,2,2,1', '--catalogue', path]), /damaged \(row \d+ does not match its hash\).*gradus catalogue rebuild/);
  });
});

describe('input that is too big, malformed or out of range', () => {
  it('a 50 MB target file, n = 1e300, malformed saved searches: one line, exit 2', () => {
    const big = join(root, 'big.json');
    writeFileSync(big, `{"format":"gradus-target","version":1,"kind":"q","entries":[${'{"n":3,"series":[1,2,2,1]},'.repeat(2_000_000)}{"n":3,"series":[1]}]}`);
    fails(runCli(['search', '--target-file', big, '--catalogue', cat]), /big.json has \d+ bytes; a target file is at most/);
    const huge = join(root, 'huge-n.json');
    writeFileSync(huge, '{"format":"gradus-target","version":1,"kind":"q","entries":[{"n":1e300,"series":[1]}]}');
    fails(runCli(['search', '--target-file', huge, '--catalogue', cat]), /huge-n.json at entries\[0\]\.n: /);
    const saved = join(root, 'saved.json');
    writeFileSync(saved, '{"format":"gradus-search","version":1,"matches":"lots"}');
    fails(runCli(['export', saved, '--format', 'markdown', '--out', join(root, 'x.md')]), /saved.json at /);
    writeFileSync(saved, '[1, 2');
    fails(runCli(['export', saved, '--format', 'markdown', '--out', join(root, 'x.md')]), /is not valid JSON/);
    expect(existsSync(join(root, 'x.md'))).toBe(false);
  });
  it('2000 nested parentheses in sym: refused at its column', () => {
    fails(runCli(['sym', `${'('.repeat(2000)}1${')'.repeat(2000)}`]), /column 201: the expression nests deeper than 200 levels/);
  });
  it('control characters of arguments are shown escaped, never sent to the terminal', () => {
    const r = runCli(['show', 'perm\u001b[31mutations', '--n', '3']);
    fails(r, /unknown family "perm\\x1b\[31mutations"/);
    expect(r.stderr).not.toContain('\u001b');
  });
  it('an option given twice is refused instead of the last one silently winning', () => {
    fails(runCli(['qanalog', 'integer', '--n', '3', '--n', '4']), /--n is given twice/);
  });
});

describe('outputs: refused before the work, never over a folder or a user file', () => {
  it('search --save onto an existing file fails before searching, and keeps nothing', () => {
    const save = join(root, 'mine.json');
    writeFileSync(save, 'my file');
    const searches = JSON.parse(runCli(['catalogue', 'info', '--catalogue', cat, '--json']).stdout).searches as number;
    fails(runCli(['search', '--coeffs', 'n=3:1,2,2,1', '--save', save, '--catalogue', cat]), /mine.json exists; not overwritten \(add --force/);
    expect(readFileSync(save, 'utf8')).toBe('my file');
    expect(JSON.parse(runCli(['catalogue', 'info', '--catalogue', cat, '--json']).stdout).searches).toBe(searches);
  });
  it('export --out DIR/ and onto a folder: refused, no file named after the folder', () => {
    const r = runCli(['search', '--coeffs', 'n=3:1,2,2,1', '--catalogue', cat, '--json']);
    const id = JSON.parse(r.stdout).id as string;
    const outDir = join(root, 'out');
    fails(runCli(['export', id, '--format', 'latex', '--out', `${outDir}/`, '--catalogue', cat]), /names a folder/);
    expect(existsSync(outDir)).toBe(false);
    mkdirSync(outDir);
    fails(runCli(['export', id, '--format', 'latex', '--out', outDir, '--force', '--catalogue', cat]), /is a folder; give a file name/);
    expect(statSync(outDir).isDirectory()).toBe(true);
  });
  it('stdout on a full device: one line on stderr, exit 2, no stack trace', () => {
    const fd = openSync('/dev/full', 'w');
    try {
      const r = runCli(['qanalog', 'factorial', '--n', '40'], { stdout: fd });
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(/cannot write the output \(the disk is full\)/);
      expect(r.stderr).not.toMatch(/\n\s+at /);
    } finally {
      closeSync(fd);
    }
  });
  it('--from takes data requests only: a catalogue command is refused and the catalogue untouched', () => {
    const before = readFileSync(cat);
    fails(runCli(['search', '--n-range', '1..2', '--from', 'catalogue rebuild --n-max {n}', '--catalogue', cat]), /--from takes a data command \(dist, show, module, quotient, sym, qanalog\), got "catalogue"/);
    expect(readFileSync(cat).equals(before)).toBe(true);
  });
});

/** A tiny file system of our own for the disk-full case (needs root; skipped elsewhere). */
function tinyDisk(): string | undefined {
  if (!asRoot) return undefined;
  const dir = mkdtempSync(join(root, 'tiny-'));
  const r = spawnSync('mount', ['-t', 'tmpfs', '-o', 'size=160k', 'tmpfs', dir]);
  return r.status === 0 ? dir : undefined;
}

describe('a full disk', () => {
  const disk = tinyDisk();
  afterAll(() => {
    if (disk) spawnSync('umount', [disk]);
  });
  it.runIf(disk !== undefined)('a build that fills the disk stops with one line and exit 2; the units written stay whole', () => {
    const path = join(disk!, 'c.sqlite');
    const r = runCli(['catalogue', 'build', '--n-max', '6', '--families', 'permutations', '--catalogue', path]);
    fails(r, /the disk is full/);
    const info = runCli(['catalogue', 'info', '--catalogue', path, '--json']);
    expect(info.code, info.stderr).toBe(0);
    expect(JSON.parse(info.stdout).unfinished).toMatch(/unfinished/);
  });
});
