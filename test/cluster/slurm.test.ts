/**
 * Sharded runs on a real single-node Slurm cluster (scripts/ci/slurm-up.sh starts one; CI runs
 * it before the tests): a module, a catalogue build and a quotient go through plan → submit →
 * job array → merge job, and each result equals the one-machine run; an array task cancelled
 * before it ran is resubmitted alone and the finished shards are kept as they were.
 * Skipped, with a message, where there is no `sinfo`.
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { toJsonText } from '../../src/core/json-text.js';
import { silentProgress } from '../../src/core/progress.js';
import { compute, requestFromWords } from '../../src/requests/index.js';
import { buildCatalogue } from '../../src/store/buildCatalogue.js';
import { Catalogue } from '../../src/store/catalogue.js';
import type { CliResult } from '../helpers/cli.js';

const slurm = spawnSync('sinfo', ['-h', '-o', '%t'], { encoding: 'utf8' });
const HAS_SLURM = !slurm.error && slurm.status === 0;
if (!HAS_SLURM) console.warn('test/cluster/slurm.test.ts skipped: no Slurm here (sinfo not found); start one with `bash scripts/ci/slurm-up.sh` as root');

const BIN = new URL('../../bin/gradus.mjs', import.meta.url).pathname;
const MODULE = ['module', '--seed', 'superspace-vandermonde', '--n', '5', '--k', '3', '--ops', 'x,theta', '--frobenius'];
const QUOTIENT = ['quotient', '--ideal', 'coinvariant', '--n', '4', '--vars', 'x,theta', '--frobenius'];
const FAMILIES = ['permutations', 'parking-functions', 'dyck-paths'];

/** The command line as a child process, without blocking the others. */
function cli(args: readonly string[]): Promise<CliResult> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [BIN, ...args], { stdio: ['ignore', 'pipe', 'pipe'] });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d: Buffer) => (stdout += d.toString()));
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    child.on('close', (code) => resolve({ code: code ?? -1, stdout, stderr }));
  });
}

async function ok(args: readonly string[]): Promise<string> {
  const r = await cli(args);
  if (r.code !== 0) throw new Error(`gradus ${args.join(' ')}: exit ${r.code}: ${r.stderr}`);
  return r.stdout;
}

/** Jobs of the scheduler whose name starts with `prefix` (a plan's jobs). */
function queuedJobs(prefix: string): string[] {
  const r = spawnSync('squeue', ['-h', '-r', '-o', '%i %j'], { encoding: 'utf8' });
  return r.stdout.split('\n').filter((l) => l.split(' ')[1]?.startsWith(prefix)).map((l) => l.split(' ')[0]!);
}

async function planJobPrefix(dir: string): Promise<string> {
  const m = JSON.parse(readFileSync(join(dir, 'gradus-cluster.json'), 'utf8')) as { id: string };
  return `gradus-${m.id.slice(0, 8)}`;
}

/** Wait until the plan's jobs have left the queue; its logs when something went wrong. */
async function settled(dir: string, limitSeconds = 360): Promise<void> {
  const prefix = await planJobPrefix(dir);
  const until = Date.now() + limitSeconds * 1000;
  while (queuedJobs(prefix).length > 0) {
    if (Date.now() > until) throw new Error(`jobs of ${dir} still queued after ${limitSeconds} s: ${queuedJobs(prefix).join(', ')}`);
    await new Promise((r) => setTimeout(r, 1000));
  }
}

function logsOf(dir: string): string {
  const logs = join(dir, 'logs');
  return existsSync(logs) ? readdirSync(logs).map((f) => `--- ${f}\n${readFileSync(join(logs, f), 'utf8')}`).join('\n') : '(no logs)';
}

/** The one-machine document with the merge's provenance time, seconds and notes: then the bytes must agree. */
async function expectOneMachineDocument(dir: string, words: readonly string[]): Promise<void> {
  const path = join(dir, 'result.json');
  expect(existsSync(path), logsOf(dir)).toBe(true);
  const text = readFileSync(path, 'utf8');
  const got = JSON.parse(text) as { provenance: Record<string, unknown> };
  const one = (await compute(requestFromWords(words, dir))).document as { provenance: Record<string, unknown> };
  for (const k of ['time', 'seconds', 'notes']) one.provenance[k] = got.provenance[k];
  expect(text).toBe(`${toJsonText(one)}\n`);
  expect(String(got.provenance['confirmation'])).toMatch(/agree on every cell/);
}

function hashes(path: string): Map<string, string> {
  const c = Catalogue.open(path, { existing: true });
  try {
    const rows = c.db.prepare('SELECT family, params, statistics, combine, transform, hash FROM distributions').all() as Record<string, string>[];
    return new Map(rows.map((r) => [`${r['family']}|${r['params']}|${r['statistics']}|${r['combine']}|${r['transform']}`, r['hash']!]));
  } finally {
    c.close();
  }
}

describe.skipIf(!HAS_SLURM)('cluster runs on Slurm', () => {
  let root: string;
  const dirs = { module: '', catalogue: '', quotient: '', faults: '' };
  beforeAll(async () => {
    root = mkdtempSync(join(tmpdir(), 'gradus-slurm-'));
    for (const k of Object.keys(dirs) as (keyof typeof dirs)[]) dirs[k] = join(root, k);
    // three plans submitted at once: their tasks share the node's CPUs
    await Promise.all([
      ok(['cluster', 'plan', dirs.module, '--shards', '2', '--', ...MODULE]).then(() => ok(['cluster', 'submit', dirs.module])),
      ok(['cluster', 'plan', dirs.catalogue, '--shards', '2', '--objects-per-shard', '200', '--', 'catalogue', 'build', '--n-max', '5', '--families', FAMILIES.join(','), '--catalogue', join(root, 'cluster.sqlite')]).then(() =>
        ok(['cluster', 'submit', dirs.catalogue, '--time', '10:00', '--mem', '1G']),
      ),
      ok(['cluster', 'plan', dirs.quotient, '--', ...QUOTIENT]).then(() => ok(['cluster', 'submit', dirs.quotient])),
    ]);
  }, 300_000);

  it('a bigraded module with Frobenius: array and merge job give the one-machine document', { timeout: 400_000 }, async () => {
    await settled(dirs.module);
    await expectOneMachineDocument(dirs.module, MODULE);
    const status = JSON.parse(await ok(['cluster', 'status', dirs.module, '--json'])) as { counts: Record<string, number>; merge: { state: string } };
    expect(status.counts['done']).toBe(2);
    expect(status.merge.state).toBe('merged');
  });

  it('a catalogue build (n ≤ 5, large units in pieces): the same rows as the one-machine build', { timeout: 400_000 }, async () => {
    await settled(dirs.catalogue);
    expect(existsSync(join(dirs.catalogue, 'merged.json')), logsOf(dirs.catalogue)).toBe(true);
    const one = Catalogue.open(join(root, 'one.sqlite'));
    buildCatalogue(one, { nMax: 5, maxObjects: 10_000_000n, families: FAMILIES, progress: silentProgress });
    one.close();
    const a = hashes(join(root, 'one.sqlite'));
    const b = hashes(join(root, 'cluster.sqlite'));
    expect(b.size).toBe(a.size);
    for (const [k, h] of a) expect(b.get(k), k).toBe(h);
    const plan = JSON.parse(readFileSync(join(dirs.catalogue, 'gradus-cluster.json'), 'utf8')) as { units: { pieces: number }[] };
    expect(plan.units.some((u) => u.pieces > 1)).toBe(true); // some unit was cut into pieces
    const c = Catalogue.open(join(root, 'cluster.sqlite'), { existing: true });
    expect(c.unfinishedNote()).toBeUndefined(); // the merge finished the build
    c.close();
  });

  it('a quotient: the one-machine document', { timeout: 400_000 }, async () => {
    await settled(dirs.quotient);
    await expectOneMachineDocument(dirs.quotient, QUOTIENT);
  });

  it('a cancelled array task is submitted again alone; finished shards are kept', { timeout: 400_000 }, async () => {
    const dir = dirs.faults;
    await ok(['cluster', 'plan', dir, '--shards', '2', '--', ...MODULE]);
    // one task at a time, so the second is still waiting when it is cancelled
    const submitted = await ok(['cluster', 'submit', dir, '--max-parallel', '1']);
    const array = /array job (\d+)/.exec(submitted)?.[1];
    expect(array).toBeDefined();
    spawnSync('scancel', [`${array}_1`]);
    await settled(dir);
    const before = JSON.parse(await ok(['cluster', 'status', dir, '--json'])) as { shards: { id: number; state: string }[]; merge: { state: string } };
    expect(before.shards.map((s) => s.state)).toEqual(['done', expect.stringMatching(/^(missing|failed)$/)]);
    expect(before.merge.state).toBe('not running'); // Slurm ended the merge job: its dependency could not be met
    const refused = await cli(['cluster', 'merge', dir]);
    expect(refused.code).toBe(2);
    expect(refused.stderr).toMatch(/shard 1 of 2 missing/);
    const kept = statSync(join(dir, 'shards', 'shard-0000.json'));

    const again = await ok(['cluster', 'submit', dir]);
    expect(again).toMatch(/submitted shard 1 as array job \d+/);
    await settled(dir);
    const after = statSync(join(dir, 'shards', 'shard-0000.json'));
    expect([after.ino, after.mtimeMs]).toEqual([kept.ino, kept.mtimeMs]);
    await expectOneMachineDocument(dir, MODULE);
  });
});
