/**
 * The few Slurm commands gradus calls: sbatch (submit, parsable job id back), squeue (what is
 * queued or running, by job name), sacct (how finished tasks ended, where accounting is on) and
 * scancel. Each is optional: without it the caller falls back to the work folder alone.
 */
import { spawnSync } from 'node:child_process';
import { InputError } from '../core/errors.js';

export interface QueueEntry {
  /** "123_4" for an array task, "125" for a job. */
  readonly job: string;
  readonly state: string;
  readonly reason: string;
}

function run(cmd: string, args: readonly string[]): { ok: boolean; missing: boolean; stdout: string; stderr: string } {
  const r = spawnSync(cmd, args, { encoding: 'utf8', timeout: 60_000 });
  const missing = (r.error as NodeJS.ErrnoException | undefined)?.code === 'ENOENT';
  return { ok: !r.error && r.status === 0, missing, stdout: r.stdout ?? '', stderr: r.stderr ?? '' };
}

export function hasSlurm(): boolean {
  return !run('squeue', ['--version']).missing;
}

/** Submit a batch script; returns the job id. */
export function sbatch(args: readonly string[], script: string): string {
  const r = run('sbatch', ['--parsable', ...args, script]);
  if (r.missing) throw new InputError('sbatch is not on this machine: submit from a login node of the cluster, or add --print to write the batch scripts and submit them by hand', 'print');
  const id = r.stdout.trim().split(';')[0] ?? '';
  if (!r.ok || !/^\d+$/.test(id)) throw new InputError(`sbatch refused ${script}: ${(r.stderr || r.stdout).trim().split('\n').slice(-2).join(' ').slice(0, 400)}`);
  return id;
}

/** Jobs and array tasks of these job names now in the queue; undefined without squeue. */
export function queued(names: readonly string[]): Map<string, QueueEntry> | undefined {
  const r = run('squeue', ['-h', '-r', '-n', names.join(','), '-o', '%i|%T|%r']);
  if (r.missing || !r.ok) return undefined;
  const out = new Map<string, QueueEntry>();
  for (const line of r.stdout.split('\n')) {
    const [job, state, reason] = line.trim().split('|');
    if (job && state) out.set(job, { job, state, reason: reason ?? '' });
  }
  return out;
}

/** Final states of these jobs' tasks from accounting; undefined where accounting is off or absent. */
export function accounted(jobIds: readonly string[]): Map<string, { state: string; exit: string }> | undefined {
  if (jobIds.length === 0) return new Map();
  const r = run('sacct', ['-n', '-P', '-X', '-j', jobIds.join(','), '-o', 'JobID,State,ExitCode']);
  if (r.missing || !r.ok) return undefined;
  const out = new Map<string, { state: string; exit: string }>();
  for (const line of r.stdout.split('\n')) {
    const [job, state, exit] = line.trim().split('|');
    if (job && state) out.set(job, { state: state.split(' ')[0]!, exit: exit ?? '' });
  }
  return out;
}

export function scancel(jobIds: readonly string[]): void {
  if (jobIds.length) run('scancel', [...jobIds]);
}

/** Running, or waiting to run. */
export function isActive(state: string): boolean {
  return !['COMPLETED', 'FAILED', 'CANCELLED', 'TIMEOUT', 'OUT_OF_MEMORY', 'NODE_FAIL', 'PREEMPTED', 'BOOT_FAIL', 'DEADLINE'].includes(state);
}
