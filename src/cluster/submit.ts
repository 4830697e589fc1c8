/**
 * Submit a plan: the shards not done and not already queued go out as one array job, and a
 * merge job waits for it (and for shards still queued from before) with afterok; a merge job of
 * an earlier submit still waiting is cancelled, as the new one replaces it. A merge job whose
 * dependency can never be met (a task failed) is ended by Slurm itself, so a failure shows in
 * status rather than as a job waiting forever. With `print`, the scripts are written and shown
 * for submitting by hand, and nothing is submitted.
 */
import { join } from 'node:path';
import { InputError } from '../core/errors.js';
import { replaceFile } from './atomic-file.js';
import { mergeScript, shardScript, type SchedulerOptions } from './batch-scripts.js';
import { codeVersion } from './code-version.js';
import { idRanges } from './id-ranges.js';
import { jobNames, readJobs, recordSubmission } from './jobs-file.js';
import { sbatch, scancel } from './slurm.js';
import { planStatus, type PlanStatus } from './status.js';
import { checkCode, type WorkFolder } from './work-folder.js';

export interface SubmitOptions extends SchedulerOptions {
  readonly print?: boolean;
}

export type SubmitReport =
  | { readonly state: 'merged'; readonly output: string }
  | { readonly state: 'waiting'; readonly queued: readonly number[]; readonly merge?: string }
  | { readonly state: 'submitted'; readonly shards: readonly number[]; readonly array?: string; readonly merge: string; readonly queued: readonly number[]; readonly cancelled?: string }
  | { readonly state: 'printed'; readonly shards: readonly number[]; readonly scripts: { readonly shards?: string; readonly merge: string }; readonly text: string };

export function submitPlan(folder: WorkFolder, o: SubmitOptions): SubmitReport {
  checkCode(folder.manifest.code, codeVersion(), `${folder.dir} was planned by`);
  const st: PlanStatus = planStatus(folder);
  const unusable = st.shards.filter((s) => s.state === 'unusable');
  if (unusable.length) throw new InputError(`shard file${unusable.length > 1 ? 's' : ''} ${idRanges(unusable.map((s) => s.id))} cannot be used (${unusable[0]!.detail}); gradus leaves them alone: move them away, then submit again`, 'folder');
  if (st.merge.state === 'merged') return { state: 'merged', output: st.merge.output! };
  const todo = st.shards.filter((s) => s.state === 'missing' || s.state === 'failed').map((s) => s.id);
  const active = st.shards.filter((s) => s.state === 'running' || s.state === 'pending');
  const mergeWaits = st.merge.state === 'queued' || st.merge.state === 'running';
  if (!o.print && todo.length === 0 && active.length > 0 && mergeWaits) return { state: 'waiting', queued: active.map((s) => s.id), merge: st.merge.job! };
  folder.ensureDirs();
  const n = readJobs(folder).length + 1;
  const names = jobNames(folder);
  const ids = o.print ? st.shards.filter((s) => s.state !== 'done').map((s) => s.id) : todo;
  const scripts = { ...(ids.length ? { shards: join(folder.scriptsDir, `shards-${n}.sbatch`) } : {}), merge: join(folder.scriptsDir, `merge-${n}.sbatch`) };
  const shardText = ids.length ? shardScript(folder, idRanges(ids), names.shards, o) : undefined;
  const mergeText = mergeScript(folder, names.merge, o);
  if (scripts.shards && shardText) replaceFile(scripts.shards, shardText);
  replaceFile(scripts.merge, mergeText);
  if (o.print) {
    const text = [
      ...(shardText ? [`# ${scripts.shards}`, shardText] : []),
      `# ${scripts.merge}`,
      mergeText,
      '# submit by hand:',
      ...(scripts.shards ? [`#   sbatch ${scripts.shards}            (prints the array job id, say 1234)`, `#   sbatch --dependency=afterok:1234 --kill-on-invalid-dep=yes ${scripts.merge}`] : [`#   sbatch ${scripts.merge}`]),
      `# without Slurm: gradus cluster run-shard ${folder.dir} --shard I for each shard, then gradus cluster merge ${folder.dir}`,
    ].join('\n');
    return { state: 'printed', shards: ids, scripts, text };
  }
  // the merge waits for the new array and for the very tasks still queued from before (their
  // whole array may hold a failed task, and afterok on it would never be met)
  const waitFor = new Set(active.map((s) => s.job!));
  const array = scripts.shards ? sbatch([], scripts.shards) : undefined;
  if (array) waitFor.add(array);
  const cancelled = mergeWaits ? st.merge.job : undefined;
  if (cancelled) scancel([cancelled]);
  const dependency = waitFor.size ? [`--dependency=afterok:${[...waitFor].join(':')}`, '--kill-on-invalid-dep=yes'] : [];
  const merge = sbatch(dependency, scripts.merge);
  recordSubmission(folder, { time: new Date().toISOString(), shards: todo, ...(array ? { array } : {}), merge, scripts });
  return { state: 'submitted', shards: todo, ...(array ? { array } : {}), merge, queued: active.map((s) => s.id), ...(cancelled ? { cancelled } : {}) };
}
