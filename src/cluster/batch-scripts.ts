/**
 * The batch scripts of a plan: an array job whose task i runs shard i, and a merge job. The
 * scheduler options given to submit (partition, time, memory, CPUs, account, QoS, any other
 * sbatch option) become directives; `--setup` adds a shell line before gradus starts (for
 * example a `module load` of the cluster's Node.js).
 */
import { join } from 'node:path';
import { InputError } from '../core/errors.js';
import { GRADUS_ROOT } from './code-version.js';
import type { WorkFolder } from './work-folder.js';

export interface SchedulerOptions {
  readonly partition?: string;
  readonly time?: string;
  readonly mem?: string;
  readonly cpusPerTask?: number;
  readonly account?: string;
  readonly qos?: string;
  /** Further sbatch options, each as typed (`--constraint=avx2`). */
  readonly sbatchArgs?: readonly string[];
  readonly setup?: string;
  /** At most this many array tasks at once (`%K` of --array). */
  readonly maxParallel?: number;
}

export function shellQuote(s: string): string {
  return /^[\w./:=,@+-]+$/.test(s) ? s : `'${s.replaceAll("'", `'\\''`)}'`;
}

/** Directive values are read by sbatch, not a shell: keep them to one plain word. */
function directiveValue(name: string, value: string): string {
  if (!/^[^\s'"%\\#]+$/.test(value)) throw new InputError(`--${name}: "${value.slice(0, 60)}" cannot go into a batch directive (no spaces, quotes, % or #)`, name);
  return value;
}

function common(o: SchedulerOptions, withMem: boolean): string[] {
  const lines: string[] = [];
  if (o.partition) lines.push(`--partition=${directiveValue('partition', o.partition)}`);
  if (o.time) lines.push(`--time=${directiveValue('time', o.time)}`);
  if (withMem && o.mem) lines.push(`--mem=${directiveValue('mem', o.mem)}`);
  if (o.account) lines.push(`--account=${directiveValue('account', o.account)}`);
  if (o.qos) lines.push(`--qos=${directiveValue('qos', o.qos)}`);
  for (const typed of o.sbatchArgs ?? []) {
    // `constraint=avx2` or `--constraint=avx2` (a value starting with -- must follow an =)
    const a = typed.startsWith('--') ? typed : `--${typed}`;
    if (!/^--[a-z][\w-]*(=[^\s'"\\#]+)?$/.test(a)) throw new InputError(`--sbatch-arg takes one sbatch option written as name=value, e.g. constraint=avx2 (got "${typed.slice(0, 60)}")`, 'sbatch-arg');
    if (/^--(array|output|error|job-name|dependency|parsable|wrap)\b/.test(a)) throw new InputError(`--sbatch-arg ${a.split('=')[0]}: gradus sets that option itself`, 'sbatch-arg');
    lines.push(a);
  }
  return lines;
}

function gradusLine(args: readonly string[]): string {
  return ['exec', process.execPath, join(GRADUS_ROOT, 'bin', 'gradus.mjs'), ...args].map(shellQuote).join(' ');
}

function header(folder: WorkFolder, what: string, directives: readonly string[], o: SchedulerOptions): string {
  return [
    '#!/bin/bash',
    ...directives.map((d) => `#SBATCH ${d}`),
    `# ${what} of gradus plan ${folder.manifest.id}: ${folder.manifest.key.replace(/\n/g, ' ')}`,
    'set -eu',
    ...(o.setup ? [o.setup] : []),
  ].join('\n');
}

function checkFolderPath(folder: WorkFolder): void {
  if (!/^[^\s'"%\\#]+$/.test(folder.dir)) throw new InputError(`the work folder ${folder.dir} has spaces, quotes, % or # in its path, which batch directives cannot carry; plan in another folder`, 'folder');
}

/** The array job: task i runs shard i. */
export function shardScript(folder: WorkFolder, ids: string, name: string, o: SchedulerOptions): string {
  checkFolderPath(folder);
  const directives = [
    `--job-name=${name}`,
    `--array=${ids}${o.maxParallel ? `%${o.maxParallel}` : ''}`,
    `--output=${join(folder.logsDir, 'shard-%A_%a.out')}`,
    `--cpus-per-task=${o.cpusPerTask ?? 1}`,
    ...common(o, true),
  ];
  const threads = o.cpusPerTask && o.cpusPerTask > 1 ? ['--threads', String(o.cpusPerTask)] : [];
  return `${header(folder, 'shards', directives, o)}\n${gradusLine(['cluster', 'run-shard', folder.dir, ...threads])} --shard "$SLURM_ARRAY_TASK_ID"\n`;
}

/** The merge job (submitted to start after the array job succeeds). */
export function mergeScript(folder: WorkFolder, name: string, o: SchedulerOptions): string {
  checkFolderPath(folder);
  const directives = [`--job-name=${name}`, `--output=${join(folder.logsDir, 'merge-%j.out')}`, '--cpus-per-task=1', ...common(o, true)];
  return `${header(folder, 'merge', directives, o)}\n${gradusLine(['cluster', 'merge', folder.dir])}\n`;
}
