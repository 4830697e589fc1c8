/**
 * The record of submissions of a plan (jobs.json, `gradus-cluster-jobs`): for each submit, the
 * array job and the shards it runs, the merge job and the batch scripts. Status reads it to ask
 * the scheduler about those jobs; a later submit to know what is still queued.
 */
import { readFileSync } from 'node:fs';
import { z } from 'zod';
import { InputError } from '../core/errors.js';
import { replaceFile } from './atomic-file.js';
import type { WorkFolder } from './work-folder.js';

const SUBMISSION = z.object({
  time: z.string().max(40),
  shards: z.array(z.number().int().min(0)),
  array: z.string().regex(/^\d+$/).optional(),
  merge: z.string().regex(/^\d+$/).optional(),
  scripts: z.object({ shards: z.string().optional(), merge: z.string() }),
});
export type Submission = z.infer<typeof SUBMISSION>;

const JOBS = z.object({ format: z.literal('gradus-cluster-jobs'), version: z.literal(1), plan: z.string(), submissions: z.array(SUBMISSION) });

export function readJobs(folder: WorkFolder): Submission[] {
  let text: string;
  try {
    text = readFileSync(folder.jobsPath, 'utf8');
  } catch {
    return [];
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    value = undefined;
  }
  const r = JOBS.safeParse(value);
  if (!r.success || r.data.plan !== folder.manifest.id) throw new InputError(`${folder.jobsPath} is not a record of submissions of this plan; gradus leaves it alone (move it away)`, 'folder');
  return r.data.submissions;
}

export function recordSubmission(folder: WorkFolder, s: Submission): void {
  const submissions = [...readJobs(folder), s];
  replaceFile(folder.jobsPath, `${JSON.stringify({ format: 'gradus-cluster-jobs', version: 1, plan: folder.manifest.id, submissions }, null, 1)}\n`);
}

/** Slurm job names of a plan (squeue finds its jobs by them). */
export function jobNames(folder: WorkFolder): { shards: string; merge: string } {
  const short = folder.manifest.id.slice(0, 8);
  return { shards: `gradus-${short}`, merge: `gradus-${short}-merge` };
}
