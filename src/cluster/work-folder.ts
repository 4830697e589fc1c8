/**
 * A work folder on the shared file system: the plan (gradus-cluster.json), finished shards
 * (shards/shard-NNNN.json), failure notes of shards (shards/shard-NNNN.failed.json), Slurm logs
 * (logs/), batch scripts (scripts/), the record of submissions (jobs.json), the merged document
 * (result.json) and the merge record (merged.json). The folder is the user's: a plan goes only
 * into a new or empty folder, or one holding the same plan; gradus removes nothing it did not
 * write there.
 */
import { mkdirSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { environmentReason } from '../core/environment-errors.js';
import { InputError } from '../core/errors.js';
import { shown } from '../core/shown.js';
import { codeText, sameCode, type CodeVersion } from './code-version.js';
import { createFileOnce } from './atomic-file.js';
import { readManifest, type Manifest } from './manifest.js';

export const MANIFEST_NAME = 'gradus-cluster.json';
/** Larger than any plan of 1000 shards. */
const MANIFEST_MAX_BYTES = 64 * 1024 * 1024;

export class WorkFolder {
  private constructor(readonly dir: string, readonly manifest: Manifest) {}

  /** The work folder at `dir`, which must hold a plan of ours. */
  static open(dir: string, cwd: string): WorkFolder {
    const abs = resolve(cwd, dir);
    const st = statOf(abs);
    if (!st) throw new InputError(`no work folder at ${abs}; make one with \`gradus cluster plan ${dir} -- <command>\``, 'folder');
    if (!st.isDirectory()) throw new InputError(`${abs} is not a folder; give the work folder of a plan`, 'folder');
    const path = join(abs, MANIFEST_NAME);
    if (!statOf(path)) throw new InputError(`${abs} holds no plan of gradus (${MANIFEST_NAME}); make one with \`gradus cluster plan ${dir} -- <command>\``, 'folder');
    return new WorkFolder(abs, readPlanFile(path));
  }

  /**
   * Put `manifest` into `dir` (created when missing). A folder holding the same request planned by
   * the same code is reused as it is (`fresh` false); anything else in the folder is refused untouched.
   */
  static create(dir: string, cwd: string, manifest: Manifest): { folder: WorkFolder; fresh: boolean } {
    const abs = resolve(cwd, dir);
    const st = statOf(abs);
    if (st && !st.isDirectory()) throw new InputError(`${abs} is a file, not a folder; give a new or empty folder for the plan`, 'folder');
    if (st) {
      const names = listing(abs);
      if (names.includes(MANIFEST_NAME)) return { folder: WorkFolder.reuse(abs, manifest), fresh: false };
      if (names.length > 0) {
        throw new InputError(`${abs} holds files gradus did not write (${names.slice(0, 3).map((n) => shown(n, 40)).join(', ')}${names.length > 3 ? ', …' : ''}); give a new or empty folder for the plan`, 'folder');
      }
    } else {
      try {
        mkdirSync(abs, { recursive: true });
      } catch (e) {
        throw new InputError(`cannot create the folder ${abs} (${environmentReason(e) ?? (e as Error).message})`, 'folder');
      }
    }
    if (!createFileOnce(join(abs, MANIFEST_NAME), `${JSON.stringify(manifest, null, 1)}\n`)) {
      // another plan was written at the same moment: the same rules as for an existing one
      return { folder: WorkFolder.reuse(abs, manifest), fresh: false };
    }
    return { folder: new WorkFolder(abs, manifest), fresh: true };
  }

  private static reuse(abs: string, wanted: Manifest): WorkFolder {
    const have = readPlanFile(join(abs, MANIFEST_NAME));
    if (have.key !== wanted.key || have.kind !== wanted.kind || have.catalogue !== wanted.catalogue) {
      throw new InputError(`${abs} holds the plan of another request (${shown(have.key, 120)}); give a new folder`, 'folder');
    }
    checkCode(have.code, wanted.code, `${abs} was planned by`);
    return new WorkFolder(abs, have);
  }

  get shardsDir(): string {
    return join(this.dir, 'shards');
  }
  get logsDir(): string {
    return join(this.dir, 'logs');
  }
  get scriptsDir(): string {
    return join(this.dir, 'scripts');
  }
  get jobsPath(): string {
    return join(this.dir, 'jobs.json');
  }
  get resultPath(): string {
    return join(this.dir, 'result.json');
  }
  get mergedPath(): string {
    return join(this.dir, 'merged.json');
  }
  shardPath(id: number): string {
    return join(this.shardsDir, `shard-${String(id).padStart(4, '0')}.json`);
  }
  failedPath(id: number): string {
    return join(this.shardsDir, `shard-${String(id).padStart(4, '0')}.failed.json`);
  }

  /** Make the sub-folders gradus writes in. */
  ensureDirs(): void {
    for (const d of [this.shardsDir, this.logsDir, this.scriptsDir]) {
      try {
        mkdirSync(d, { recursive: true });
      } catch (e) {
        throw new InputError(`cannot create the folder ${d} (${environmentReason(e) ?? (e as Error).message})`, 'folder');
      }
    }
  }
}

/** Refuse work by another code than the plan's (a checkout changed between plan and run). */
export function checkCode(planned: CodeVersion, running: CodeVersion, what: string): void {
  if (!sameCode(planned, running)) {
    throw new InputError(`${what} ${codeText(planned)}; this is ${codeText(running)}: shards of one plan must come from one code (plan again in a new folder, or run the plan's checkout)`, 'folder');
  }
}

function readPlanFile(path: string): Manifest {
  const st = statOf(path);
  if (!st?.isFile()) throw new InputError(`${path} is not a file; the folder holds something gradus did not write`, 'folder');
  if (st.size > MANIFEST_MAX_BYTES) throw new InputError(`${path} has ${st.size} bytes, more than any plan of gradus; it is left alone`, 'folder');
  let value: unknown;
  try {
    value = JSON.parse(readFileSync(path, 'utf8'));
  } catch (e) {
    if (e instanceof SyntaxError) throw new InputError(`${path} is not a plan of gradus (not JSON); it is left alone`, 'folder');
    throw new InputError(`cannot read ${path} (${environmentReason(e) ?? (e as Error).message})`, 'folder');
  }
  if ((value as { format?: unknown } | null)?.format !== 'gradus-cluster-plan') throw new InputError(`${path} is not a plan of gradus; it is left alone (give a new folder)`, 'folder');
  return readManifest(value, path);
}

function statOf(path: string): ReturnType<typeof statSync> | undefined {
  try {
    return statSync(path);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') return undefined;
    if (code === 'ENOTDIR') throw new InputError(`a part of ${path} is a file, not a folder`, 'folder');
    throw new InputError(`cannot look at ${path} (${environmentReason(e) ?? code ?? 'error'})`, 'folder');
  }
}

function listing(dir: string): string[] {
  try {
    return readdirSync(dir).sort();
  } catch (e) {
    throw new InputError(`cannot read the folder ${dir} (${environmentReason(e) ?? (e as Error).message})`, 'folder');
  }
}
