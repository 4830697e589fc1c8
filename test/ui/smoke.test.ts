/**
 * The real program in a pseudo-terminal (util-linux `script`): a whole session driven with
 * keys sent several at a time, as a fast typist, a paste or a slow link sends them; it quits
 * cleanly with exit code 0 and no stack trace. Without a terminal it prints the demo as text.
 */
import { spawn, spawnSync } from 'node:child_process';
import { readdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.js';
import { tinyCatalogue } from './tinyCatalogue.js';

const ROOT = new URL('../..', import.meta.url).pathname;
const hasScript = spawnSync('script', ['--version'], { encoding: 'utf8' }).status === 0;
let cat: { dir: string; path: string };
beforeAll(() => {
  cat = tinyCatalogue();
});
afterAll(() => rmSync(cat.dir, { recursive: true, force: true }));

function withoutCiVariables(env: NodeJS.ProcessEnv): NodeJS.ProcessEnv {
  const { CI: _ci, CONTINUOUS_INTEGRATION: _cont, ...rest } = env;
  return rest;
}

function runInPty(keys: readonly { after: string | RegExp; send: string }[], cwd: string, timeoutMs = 90_000): Promise<{ code: number | null; out: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn('script', ['-qfec', `stty cols 80 rows 24; node ${ROOT}bin/gradus.mjs`, '/dev/null'], {
      cwd,
      // A user's terminal: ink draws nothing until exit when it believes it runs under CI.
      env: { ...withoutCiVariables(process.env), NO_COLOR: '1', GRADUS_CATALOGUE: cat.path },
      stdio: ['pipe', 'pipe', 'pipe'],
    });
    let out = '';
    let step = 0;
    let seenUpTo = 0;
    let waiting = false;
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      reject(new Error(`timed out at step ${step}; output so far:\n${out.slice(-3000)}`));
    }, timeoutMs);
    // Each burst is sent, in one write, once its cue appears in output drawn after the previous one.
    const advance = () => {
      if (waiting || step >= keys.length) return;
      const k = keys[step]!;
      const rest = out.slice(seenUpTo);
      const hit = typeof k.after === 'string' ? rest.indexOf(k.after) : rest.search(k.after);
      if (hit < 0) return;
      waiting = true;
      step++;
      setTimeout(() => {
        seenUpTo = out.length;
        waiting = false;
        child.stdin.write(k.send);
        advance();
      }, 100);
    };
    child.stdout.on('data', (d: Buffer) => {
      out += d.toString('utf8');
      advance();
    });
    child.stderr.on('data', (d: Buffer) => {
      out += d.toString('utf8');
    });
    child.on('exit', (code) => {
      clearTimeout(timer);
      child.stdin.end();
      resolve({ code, out });
    });
  });
}

describe.skipIf(!hasScript)('gradus in a pseudo-terminal', () => {
  it('a whole session with keys sent in bursts: compute a module for two sizes, search it, export it, quit after confirming', async () => {
    const { code, out } = await runInPty(
      [
        // Modules screen, next example seed (Vandermonde, n = 4), n − 1, compute: one write.
        { after: 'Enter runs step 1', send: '4s-\r' },
        // Vandermonde n = 3 has dimension 3! = 6 (common practice: the Vandermonde's
        // derivatives span a copy of the regular representation); then n = 4 likewise 4! = 24.
        { after: 'dimension 6 ', send: '+\r' },
        // Its Hilbert series over n = 3, 4 to the search, and search: one write.
        { after: 'dimension 24 ', send: 'g\r' },
        // [n]_q! is the inversion generating function (common practice): the tiny catalogue
        // holds inversions and major index on permutations. Export screen, write Markdown.
        { after: 'candidates in', send: '7\r' },
        { after: '✓ wrote', send: '\u0003' }, // Ctrl+C: results are not saved, so it asks
        { after: 'Quit?', send: '\u0003' }, // a second Ctrl+C quits
      ],
      cat.dir,
    );
    expect(code, out.slice(-2000)).toBe(0);
    expect(out).toContain('formula: [n]_q!');
    expect(out).toContain('inversions on permutations');
    const written = readdirSync(cat.dir).filter((f) => f.endsWith('.md'));
    expect(written.length, out.slice(-3000)).toBe(1);
    expect(readFileSync(join(cat.dir, written[0]!), 'utf8')).toContain('inversions');
    expect(out).not.toMatch(/\n\s+at .+\(.*:\d+:\d+\)/); // no stack trace
    expect(out).not.toMatch(/Error:/);
  }, 120_000);
});

describe('gradus without a terminal', () => {
  it('prints the demo session as text, computed live, and exits 0', () => {
    const r = runCli([], { input: '', env: { GRADUS_CATALOGUE: cat.path }, cwd: cat.dir });
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('gradus demo session');
    expect(r.stdout).toContain('dimensions: n=2: 6, n=3: 24, n=4: 120');
    expect(r.stdout).toMatch(/tried: \d+ candidates/);
    expect(r.stdout).toMatch(/wrote \d+ bytes of Markdown/);
    expect(r.stderr).not.toMatch(/\n\s+at /);
  }, 60_000);

  it('names the nearest screens for an unknown --screen, in one line with exit code 2', () => {
    const r = runCli(['app', '--screen', 'modul'], { input: '' });
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toContain('unknown screen "modul" (nearest: modules');
  }, 30_000);
});
