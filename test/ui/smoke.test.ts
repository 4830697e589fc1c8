/**
 * The real program in a pseudo-terminal (util-linux `script`): it starts, draws, takes
 * keys, and quits cleanly with exit code 0 and no stack trace.
 */
import { spawn, spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

const ROOT = new URL('../..', import.meta.url).pathname;
const hasScript = spawnSync('script', ['--version'], { encoding: 'utf8' }).status === 0;

function runInPty(keys: readonly { after: string | RegExp; send: string }[], timeoutMs = 30_000): Promise<{ code: number | null; out: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn('script', ['-qfec', 'stty cols 80 rows 24; node bin/gradus.mjs', '/dev/null'], {
      cwd: ROOT,
      env: { ...process.env, NO_COLOR: '' },
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
  it('starts on the tour, moves through screens, and quits with exit code 0', async () => {
    const { code, out } = await runInPty([
      { after: 'Tour', send: '2' },
      { after: 'family', send: '\t' },
      { after: 'statistic', send: '?' },
      { after: 'Everywhere', send: 'q' },
    ]);
    expect(code).toBe(0);
    expect(out).toContain('gradus');
    expect(out).toContain('Everywhere');
    expect(out).not.toMatch(/\n\s+at .+\(.*:\d+:\d+\)/); // no stack trace
    expect(out).not.toMatch(/Error:/);
  }, 40_000);

  it('Ctrl+C quits cleanly too', async () => {
    const { code, out } = await runInPty([{ after: 'Tour', send: '\u0003' }]);
    expect(code).toBe(0);
    expect(out).not.toMatch(/Error:/);
  }, 40_000);
});
