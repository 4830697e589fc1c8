/**
 * The work folder without a scheduler: plans go only into new or empty folders (or one holding
 * the same plan), shards run by hand, a merge refuses an incomplete or mixed set and names what
 * is wrong, and submit --print writes batch scripts carrying the scheduler options.
 */
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, renameSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { WorkFolder } from '../../src/cluster/work-folder.js';
import { readShard, writeShard } from '../../src/cluster/shard-file.js';
import { runShard } from '../../src/cluster/run-shard.js';
import { planRun } from '../../src/cluster/plan.js';
import { submitPlan } from '../../src/cluster/submit.js';
import { mergePlan } from '../../src/cluster/merge.js';
import { silentProgress } from '../../src/core/progress.js';
import { buildCatalogue } from '../../src/store/buildCatalogue.js';
import { Catalogue } from '../../src/store/catalogue.js';
import { toJsonText } from '../../src/core/json-text.js';
import { compute, requestFromWords } from '../../src/requests/index.js';
import { stopPool } from '../../src/pool/pool.js';
import { runCli } from '../helpers/cli.js';

const MODULE = ['module', '--seed', 'superspace-vandermonde', '--n', '4', '--k', '2', '--ops', 'x,theta', '--frobenius'];
const QUOTIENT = ['quotient', '--ideal', 'coinvariant', '--n', '3', '--vars', 'x,theta'];
const quiet = { log: () => {}, cwd: '/' };
const env = { cwd: '/', env: {} };

let root: string;
beforeAll(() => {
  root = mkdtempSync(join(tmpdir(), 'gradus-cluster-'));
});
afterAll(async () => {
  await stopPool();
});

describe('cluster work folders', () => {
  it('plans only into a new or empty folder, or one holding the same plan; anything else is left untouched', { timeout: 300_000 }, () => {
    const other = join(root, 'notes');
    mkdirSync(other);
    writeFileSync(join(other, 'mine.txt'), 'my notes');
    const refused = runCli(['cluster', 'plan', other, '--', ...MODULE]);
    expect(refused.code).toBe(2);
    expect(refused.stderr).toMatch(/holds files gradus did not write \(mine\.txt\)/);
    expect(readdirSync(other)).toEqual(['mine.txt']);
    expect(readFileSync(join(other, 'mine.txt'), 'utf8')).toBe('my notes');

    const dir = join(root, 'm');
    const first = runCli(['cluster', 'plan', dir, '--shards', '2', '--', ...MODULE]);
    expect(first.code, first.stderr).toBe(0);
    expect(first.stdout).toMatch(/planned 2 shards/);
    const manifest = readFileSync(join(dir, 'gradus-cluster.json'), 'utf8');
    // the same request (options in another order) again: nothing changes
    const again = runCli(['cluster', 'plan', dir, '--', 'module', '--frobenius', '--ops', 'theta,x', '--n', '4', '--k', '2', '--seed', 'superspace-vandermonde']);
    expect(again.code, again.stderr).toBe(0);
    expect(again.stdout).toMatch(/already holds this plan/);
    expect(readFileSync(join(dir, 'gradus-cluster.json'), 'utf8')).toBe(manifest);
    expect(() => planRun(dir, QUOTIENT, env)).toThrow(/holds the plan of another request/);
    expect(readFileSync(join(dir, 'gradus-cluster.json'), 'utf8')).toBe(manifest);
    // commands that are not long work are refused with the reason
    expect(() => planRun(join(root, 's'), ['sym', 'e(3)'], env)).toThrow(/module, quotient and catalogue build/);
  });

  it('runs shards once, and merges only a complete set of this plan and this code', { timeout: 300_000 }, async () => {
    const dir = join(root, 'm');
    const folder = WorkFolder.open(dir, root);
    const qFolder = planRun(join(root, 'q'), QUOTIENT, env).folder;

    expect(await runShard(folder, 0, quiet)).toMatchObject({ state: 'done' });
    const written = statSync(folder.shardPath(0));
    expect(await runShard(folder, 0, quiet)).toEqual({ state: 'already' });
    expect(statSync(folder.shardPath(0)).mtimeMs).toBe(written.mtimeMs);

    const incomplete = runCli(['cluster', 'merge', dir]);
    expect(incomplete.code).toBe(2);
    expect(incomplete.stderr).toMatch(/shard 1 of 2 missing/);
    expect(readdirSync(dir)).not.toContain('result.json');

    await runShard(folder, 1, quiet);
    await runShard(qFolder, 0, quiet);
    // a shard of another request put in place of shard 1
    renameSync(folder.shardPath(1), join(root, 'kept-shard-1.json'));
    copyFileSync(qFolder.shardPath(0), folder.shardPath(1));
    const mixed = runCli(['cluster', 'merge', dir]);
    expect(mixed.code).toBe(2);
    expect(mixed.stderr).toMatch(/shard-0001\.json belongs to another plan/);
    // run-shard does not overwrite it either
    await expect(runShard(folder, 1, quiet)).rejects.toThrow(/leaves that file alone/);

    // a shard computed by other code (a checkout changed between tasks)
    const good = readShard({ ...folder, shardPath: () => join(root, 'kept-shard-1.json') } as unknown as WorkFolder, 1);
    expect(good.state).toBe('done');
    if (good.state !== 'done') return;
    writeShard(folder, 1, { gradus: good.file.code.gradus, source: '0123456789abcdef' }, good.file.seconds, good.file.result);
    const otherCode = runCli(['cluster', 'merge', dir]);
    expect(otherCode.code).toBe(2);
    expect(otherCode.stderr).toMatch(/shard-0001\.json was computed by gradus .* \(source 0123456789abcdef\)/);
    expect(readdirSync(dir)).not.toContain('result.json');

    renameSync(join(root, 'kept-shard-1.json'), folder.shardPath(1));
    const merged = runCli(['cluster', 'merge', dir]);
    expect(merged.code, merged.stderr).toBe(0);
    expect(merged.stdout).toMatch(/primes \d+ and \d+ agree on every cell/);
    // the one-machine document, with the merge's provenance time, seconds and notes: the same bytes
    const one = (await compute(requestFromWords(MODULE, root))).document as { provenance: Record<string, unknown> };
    const text = readFileSync(folder.resultPath, 'utf8');
    const got = JSON.parse(text) as { provenance: Record<string, unknown> };
    for (const k of ['time', 'seconds', 'notes']) one.provenance[k] = got.provenance[k];
    expect(text).toBe(`${toJsonText(one)}\n`);
  });

  it('routes without the subgroup split (one shard per prime) and catalogue pieces merge into the one-machine results', { timeout: 300_000 }, async () => {
    const polar = ['module', '--seed', 'superspace-vandermonde', '--n', '3', '--k', '2', '--ops', 'x,polar1', '--frobenius'];
    const { folder } = planRun(join(root, 'polar'), polar, env);
    expect(folder.manifest.shards.map((x) => x.work.type)).toEqual(['prime', 'prime']);
    for (const x of folder.manifest.shards) await runShard(folder, x.id, quiet);
    mergePlan(folder, { cwd: root });
    const one = (await compute(requestFromWords(polar, root))).document as { provenance: Record<string, unknown> };
    const got = JSON.parse(readFileSync(folder.resultPath, 'utf8')) as { provenance: Record<string, unknown> };
    for (const k of ['time', 'seconds', 'notes']) one.provenance[k] = got.provenance[k];
    expect(got).toEqual(one);

    const families = ['permutations', 'dyck-paths'];
    const cat = planRun(join(root, 'cat'), ['catalogue', 'build', '--n-max', '4', '--families', families.join(','), '--catalogue', join(root, 'sharded.sqlite')], { ...env, shards: 2, objectsPerShard: 5n }).folder;
    expect(cat.manifest.units!.some((u) => u.pieces > 1)).toBe(true);
    for (const x of cat.manifest.shards) await runShard(cat, x.id, quiet);
    expect(mergePlan(cat, { cwd: root }).units).toBe(cat.manifest.units!.length);
    const whole = Catalogue.open(join(root, 'whole.sqlite'));
    buildCatalogue(whole, { nMax: 4, maxObjects: 1_000_000n, families, progress: silentProgress });
    whole.close();
    const hashes = (path: string): string[] => {
      const c = Catalogue.open(path, { existing: true });
      const rows = c.db.prepare('SELECT family, params, statistics, combine, transform, hash FROM distributions ORDER BY 1, 2, 3, 4, 5').all();
      c.close();
      return rows.map((r) => JSON.stringify(r));
    };
    expect(hashes(join(root, 'sharded.sqlite'))).toEqual(hashes(join(root, 'whole.sqlite')));
  });

  it('submit --print writes batch scripts with the scheduler options passed through', () => {
    const dir = join(root, 'q');
    const r = runCli(['cluster', 'submit', dir, '--print', '--partition', 'long', '--time', '2:00:00', '--mem', '8G', '--cpus-per-task', '2', '--account', 'lab', '--sbatch-arg', 'constraint=avx2', '--setup', 'module load nodejs', '--max-parallel', '4']);
    expect(r.code, r.stderr).toBe(0);
    const shards = readFileSync(join(dir, 'scripts', 'shards-1.sbatch'), 'utf8');
    // shard 0 ran by hand above: only shard 1 is left to submit
    for (const line of ['#SBATCH --array=1%4', '#SBATCH --partition=long', '#SBATCH --time=2:00:00', '#SBATCH --mem=8G', '#SBATCH --cpus-per-task=2', '#SBATCH --account=lab', '#SBATCH --constraint=avx2', 'module load nodejs']) {
      expect(shards).toContain(line);
    }
    expect(shards).toMatch(/cluster run-shard \S+ --threads 2 --shard "\$SLURM_ARRAY_TASK_ID"/);
    const merge = readFileSync(join(dir, 'scripts', 'merge-1.sbatch'), 'utf8');
    expect(merge).toMatch(/cluster merge /);
    expect(r.stdout).toContain('--dependency=afterok:');
    // both scripts are valid shell
    for (const f of ['shards-1.sbatch', 'merge-1.sbatch']) expect(spawnSync('bash', ['-n', join(dir, 'scripts', f)]).status).toBe(0);
    expect(readdirSync(dir)).not.toContain('jobs.json'); // nothing was submitted
    expect(() => submitPlan(WorkFolder.open(dir, root), { print: true, partition: 'a b' })).toThrow(/--partition: "a b" cannot go into a batch directive/);
  });
});
