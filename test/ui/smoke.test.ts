/**
 * The real program in a pseudo-terminal (util-linux `script`): it starts, draws, takes
 * keys, and quits cleanly with exit code 0 and no stack trace.
 */
import { spawn, spawnSync } from 'node:child_process';
import { rmSync } from 'node:fs';
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

function runInPty(keys: readonly { after: string | RegExp; send: string }[], timeoutMs = 30_000): Promise<{ code: number | null; out: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn('script', ['-qfec', 'stty cols 80 rows 24; node bin/gradus.mjs', '/dev/null'], {
      cwd: ROOT,
      // A user's terminal: ink draws nothing until exit when it believes it runs under CI.
      env: { ...withoutCiVariables(process.env), NO_COLOR: '', GRADUS_CATALOGUE: cat.path },
      stdio: ['pipe', 'pipe', 'pipe'],
    });
    let out = '';
    let step = 0;
    let seenUpTo = 0;
    let waiting = false;
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      reject(new Error(`timed out at step ${step}; output so far:\n${out.slice(-2000)}`));
    }, timeoutMs);
    // Each key is sent once its cue appears in output drawn after the previous key.
    const advance = () => {
      if (waiting || step >= keys.length) return;
      const k = keys[step]!;
      const rest = out.slice(seenUpTo);
      const hit = typeof k.after === 'string' ? rest.indexOf(k.after) : rest.search(k.after);
      if (hit < 0) return;
      waiting = true;
      step++;
      // A short pause lets the app finish the redraw before the key arrives.
      setTimeout(() => {
        seenUpTo = out.length;
        waiting = false;
        child.stdin.write(k.send);
      }, 150);
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
  it('starts on the tour, computes its first step in a worker, moves through screens, and quits on Ctrl+C with exit code 0', async () => {
    const { code, out } = await runInPty([
      { after: 'Enter runs step 1', send: '\r' },
      { after: 'dimensions: n=2: 6, n=3: 24, n=4: 120', send: '2' },
      { after: 'family', send: '\t' },
      { after: 'statistic', send: '?' },
      { after: 'Everywhere', send: '\u0003' }, // Ctrl+C (q is tested in App.test.tsx)
    ]);
    expect(code).toBe(0);
    expect(out).toContain('gradus');
    expect(out).toContain('Everywhere');
    expect(out).toContain('dimensions: n=2: 6, n=3: 24, n=4: 120');
    expect(out).not.toMatch(/\n\s+at .+\(.*:\d+:\d+\)/); // no stack trace
    expect(out).not.toMatch(/Error:/);
  }, 40_000);
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
