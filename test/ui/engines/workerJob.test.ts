import { describe, expect, it } from 'vitest';
import { JobCancelled, JobError, runJobsInProcess, startJob, type JobProgress } from '../../../src/ui/engines/workerJob.js';

describe('worker jobs', () => {
  it('report progress and deliver the result', async () => {
    const seen: JobProgress[] = [];
    const r = await startJob<{ counted: number }>('count', { n: 3, delayMs: 60 }, (p) => seen.push(p)).result;
    expect(r).toEqual({ counted: 3 });
    expect(seen.length).toBeGreaterThan(0);
    expect(seen[seen.length - 1]).toEqual({ label: 'counting', done: 3, total: 3 });
  }, 20_000);

  it('cancel at once, rejecting with JobCancelled', async () => {
    const job = startJob('count', { n: 1000, delayMs: 50 }, () => {});
    setTimeout(() => job.cancel(), 200);
    await expect(job.result).rejects.toBeInstanceOf(JobCancelled);
  }, 20_000);

  it('bring engine errors back as one line, user errors marked as such', async () => {
    const job = startJob('module', { request: { kind: 'module', spec: { seed: 'vandermonde', n: 3, ops: ['nope'] }, frobenius: true, method: 'auto' } }, () => {});
    const e = (await job.result.catch((x: unknown) => x)) as JobError;
    expect(e).toBeInstanceOf(JobError);
    expect(e.user).toBe(true);
    expect(e.message).not.toContain('\n');
  }, 20_000);

  it('run on the calling thread when asked (the text demo)', async () => {
    runJobsInProcess(true);
    try {
      const r = await startJob<{ counted: number }>('count', { n: 2, delayMs: 1 }, () => {}).result;
      expect(r).toEqual({ counted: 2 });
    } finally {
      runJobsInProcess(false);
    }
  });
});
