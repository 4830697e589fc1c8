/** Run the real command line as a child process, as users meet it. */
import { spawnSync } from 'node:child_process';

export const BIN = new URL('../../bin/gradus.mjs', import.meta.url).pathname;

export interface CliResult {
  code: number;
  stdout: string;
  stderr: string;
}

export function runCli(args: readonly string[], options: { input?: string; env?: Record<string, string>; cwd?: string; uid?: number; stdout?: number } = {}): CliResult {
  const r = spawnSync(process.execPath, [BIN, ...args], {
    encoding: 'utf8',
    input: options.input,
    env: { ...process.env, ...options.env },
    cwd: options.cwd,
    timeout: 300_000,
    // as another user (tests of read-only places: root passes every permission check)
    ...(options.uid !== undefined ? { uid: options.uid, gid: options.uid } : {}),
    ...(options.stdout !== undefined ? { stdio: ['pipe', options.stdout, 'pipe'] as ['pipe', number, 'pipe'] } : {}),
  });
  return { code: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}
