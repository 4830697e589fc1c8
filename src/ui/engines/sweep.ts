/**
 * The app's adapter of the sweep engine: a sweep typed in the options of `gradus sweep run`,
 * run with the same entry point (runSweep). The sweep itself steers from this thread — its
 * modules go to the worker pool, and the screen stays responsive — and cancelling aborts it;
 * modules and the sweep are kept in the user's catalogue when there is one, as on the
 * command line. Exports use the command line's renderers and atomic write.
 */
import { resolve } from 'node:path';
import { InputError, isUserError } from '../../core/errors.js';
import { atomicWrite } from '../../export/atomicWrite.js';
import { latexText } from '../../export/latexText.js';
import { TaskCancelled } from '../../pool/pool.js';
import { parseArgs } from '../../requests/options.js';
import { splitWords } from '../../requests/words.js';
import { Catalogue } from '../../store/catalogue.js';
import { renderSweep, runSweep, SWEEP_OPTIONS, sweepFromArgs, type SweepDocument, type SweepExportFormat } from '../../sweep/index.js';
import { JobCancelled, JobError, type Job, type JobProgress } from './workerJob.js';

export const DEFAULT_SWEEP = '--family monomials --max-degree 4 --thetas 1 --n 3..4 --ops x,theta';

/** Example sweeps the `s` key steps through. */
export const SWEEP_PRESETS: readonly string[] = [
  DEFAULT_SWEEP,
  '--family heights --height 0..2,k-1 --n 1..5 --ops x',
  '--family staircase --n 2..5 --ops x,theta',
  '--family poly --poly "x1^{a}*x2^{b}*th1" --param a=0..3 --param b=0..2 --antisymmetrize --n 3 --ops x,theta',
];

export interface SweepOutcome {
  readonly doc: SweepDocument;
  /** Module documents by canonical key (computed now or read back), for opening one. */
  readonly modules: Readonly<Record<string, Record<string, unknown>>>;
  /** Where modules and the sweep were kept, if anywhere. */
  readonly catalogue?: string;
}

/** Check a typed sweep now (an InputError names the option) so that a typo never starts work. */
export function checkSweepLine(line: string): void {
  sweepFromArgs(parseArgs({ name: 'sweep', usage: 'sweep run', options: SWEEP_OPTIONS }, splitWords(line, 'sweep')));
}

export function startSweep(line: string, onProgress: (p: JobProgress) => void, cataloguePath: string | undefined): Job<SweepOutcome> {
  const { spec, limits } = sweepFromArgs(parseArgs({ name: 'sweep', usage: 'sweep run', options: SWEEP_OPTIONS }, splitWords(line, 'sweep')));
  const stop = new AbortController();
  const modules: Record<string, Record<string, unknown>> = {};
  const result = (async () => {
    const cat = cataloguePath ? Catalogue.open(cataloguePath, { existing: true }) : undefined;
    try {
      const doc = await runSweep(spec, limits, {
        ...(cat ? { catalogue: cat } : {}),
        signal: stop.signal,
        progress: (label, done, total) => onProgress({ label, done, total }),
        onModule: (key, o) => {
          if (o.status === 'kept' || o.status === 'computed') modules[key] = o.document;
        },
      });
      return { doc, modules, ...(cat ? { catalogue: cat.path } : {}) };
    } finally {
      cat?.close();
    }
  })().catch((e: unknown) => {
    if (e instanceof TaskCancelled || stop.signal.aborted) throw new JobCancelled();
    const msg = e instanceof Error ? e.message : String(e);
    throw new JobError(msg.split('\n')[0] ?? msg, isUserError(e));
  });
  return { result, cancel: () => stop.abort() };
}

export const SWEEP_FORMAT_EXTENSION: Readonly<Record<SweepExportFormat, string>> = { markdown: 'md', latex: 'tex', json: 'json' };

/** Write the findings table beside the session (`sweep-<id>.<ext>`); an existing file only with force. */
export function exportSweep(doc: SweepDocument, format: SweepExportFormat, cwd: string, force: boolean): string {
  const path = resolve(cwd, `sweep-${doc.id}.${SWEEP_FORMAT_EXTENSION[format]}`);
  try {
    atomicWrite(path, renderSweep(doc, format, doc.rows.length, latexText), force, 'out');
  } catch (e) {
    if (e instanceof InputError && /exists/.test(e.message)) throw new InputError(`${path} exists; W overwrites it`, 'out');
    throw e;
  }
  return path;
}
