/**
 * The engine tasks the app runs in a worker thread, by name. Each takes JSON-ready input,
 * reports progress, and returns JSON-ready output. Engines are imported inside each task,
 * so a worker loads only the engine its task needs (a faster start).
 */
import type { SearchDocument } from '../../match/searchDocument.js';
import type { DistRequest } from '../../enumerate/request.js';
import type { ModuleRequest } from '../../requests/module-request.js';
import type { SymRequest } from '../../requests/sym-request.js';
import { availableParallelism } from 'node:os';
import { ESTIMATE_MARK } from './progressMark.js';

export type ProgressFn = (label: string, done: number, total?: number) => void;
export type JobTask = (input: unknown, progress: ProgressFn) => unknown | Promise<unknown>;

async function searchMany(targets: readonly unknown[], catalogue: string, progress: ProgressFn): Promise<{ doc: SearchDocument; id: number | undefined; ms: number }[]> {
  const [{ recognise }, { searchCatalogue }, { searchDocument }, { rangeText }, { targetFromJson }, { Catalogue }, { makeProvenance }] = await Promise.all([
    import('../../match/recognise.js'),
    import('../../match/search.js'),
    import('../../match/searchDocument.js'),
    import('../../series/target.js'),
    import('../../series/targetFile.js'),
    import('../../store/catalogue.js'),
    import('../../core/provenance.js'),
  ]);
  const cat = Catalogue.open(catalogue, { existing: true });
  try {
    return targets.map((tj, i) => {
      progress('searching the catalogue', i, targets.length);
      const target = targetFromJson(tj);
      const t0 = Date.now();
      const outcome = searchCatalogue(cat, target);
      const rec = recognise(target);
      const ms = Date.now() - t0;
      const unfinished = cat.unfinishedNote();
      const prov = makeProvenance({
        request: `search ${target.label}`,
        method: 'exact look-up of series hashes in the catalogue, then exact comparison on every entry',
        seconds: ms / 1000,
        notes: [`catalogue ${catalogue}`, ...(unfinished ? [unfinished] : [])],
      });
      const doc = searchDocument(target, rangeText(target.entries), rec, outcome, prov);
      const id = cat.writable ? cat.saveSearch(target.label, doc, prov) : undefined;
      return { doc, id, ms };
    });
  } finally {
    cat.close();
  }
}

export const JOB_TASKS: Readonly<Record<string, JobTask>> = {
  // The request model's module request, computed as `gradus module` computes it (the result is
  // plain data); with the user's catalogue, a document kept there under the same key is reused.
  module: async (input, progress) => {
    const [{ compute, requestKey }, { catalogueResultCache }, { Catalogue }, { PARALLEL_THRESHOLD_SECONDS }] = await Promise.all([
      import('../../requests/index.js'),
      import('../../match/resultCache.js'),
      import('../../store/catalogue.js'),
      import('../../modules/compute-module.js'),
    ]);
    const { request, catalogue } = input as { request: ModuleRequest; catalogue?: string };
    const cat = catalogue !== undefined ? Catalogue.open(catalogue, { existing: true }) : undefined;
    try {
      const cache = cat ? catalogueResultCache(cat) : undefined;
      const kept = cache?.get(requestKey(request)) as Record<string, unknown> | undefined;
      if (kept) return { json: kept };
      // The engine's estimate (processor seconds; parallel runs share them over the threads)
      // goes along with every later progress message, since the subgroup tasks differ widely
      // in cost and their count alone says little about the time left.
      let estimate = '';
      const threads = Math.max(1, Math.min(2, availableParallelism()));
      const c = await compute<import('../../modules/module-result.js').ModuleResult>(request, {
        progress: (label, done, total) => progress(`${label}${estimate}`, done, total),
        onEstimate: (_units, seconds) => {
          estimate = `${ESTIMATE_MARK}${seconds >= PARALLEL_THRESHOLD_SECONDS ? seconds / threads : seconds}`;
          progress(`preparing the seed and its matrices${estimate}`, 0);
        },
      });
      cache?.put(c.key, 'module', c.document, request.spec.n, request.spec.k);
      return { json: c.document };
    } finally {
      cat?.close();
    }
  },
  // The same calls `gradus search` makes, and the search is kept in the catalogue.
  search: async (input, progress) => {
    const { target, catalogue } = input as { target: unknown; catalogue: string };
    return (await searchMany([target], catalogue, progress))[0];
  },
  // Several targets in one go (the demo tries a module's series one after another).
  'search-many': (input, progress) => {
    const { targets, catalogue } = input as { targets: unknown[]; catalogue: string };
    return searchMany(targets, catalogue, progress);
  },
  // The same engine calls as `gradus catalogue build`: the distributions, then the expression library.
  'catalogue-build': async (input, progress) => {
    const [{ buildCatalogue }, { buildExpressionLibrary }, { Catalogue }] = await Promise.all([
      import('../../store/buildCatalogue.js'),
      import('../../match/buildExpressions.js'),
      import('../../store/catalogue.js'),
    ]);
    const { catalogue, nMax } = input as { catalogue: string; nMax: number };
    const cat = Catalogue.open(catalogue);
    try {
      let label = 'catalogue build';
      let total: number | undefined;
      const onProgress = {
        start: (l: string, t?: number) => {
          label = l;
          total = t;
          progress(label, 0, total);
        },
        update: (done: number) => progress(label, done, total),
        finish: () => {},
      };
      const r = buildCatalogue(cat, { nMax, maxObjects: 50_000_000n, progress: onProgress });
      // in this worker thread, one place at a time
      const e = await buildExpressionLibrary(cat, { nMax, workers: 1, progress: onProgress });
      return { text: `catalogue ${catalogue}: ${r.units} units built (${r.skippedDone} already there), ${r.rows} distributions, ${e.values} expression values in ${(r.seconds + e.seconds).toFixed(1)}s` };
    } finally {
      cat.close();
    }
  },
  // The request model's sym request; text in the Schur basis, JSON as --json prints it.
  sym: async (input, progress) => {
    const [{ compute }, { schurSeries }, { seriesToJson }, { formatText, integralCoefficients }] = await Promise.all([
      import('../../requests/index.js'),
      import('../../series/series.js'),
      import('../../series/seriesJson.js'),
      import('../../symfun/sym-format.js'),
    ]);
    const { expression } = input as { expression: string };
    const request: SymRequest = { kind: 'sym', expression, basis: 's', latex: false, maxDegree: 8 };
    const c = await compute<import('../../symfun/expression.js').SymResult>(request, { progress: (label, done, total) => progress(label, done, total) });
    const r = c.result;
    const { denominator, terms } = integralCoefficients(r.value, 's');
    // A series for the search only when homogeneous with integer coefficients.
    const seriesJson = typeof r.degree === 'number' && denominator === 1n ? seriesToJson(schurSeries(terms.map(([k, t]) => [k, t.num] as const))) : undefined;
    return {
      expression,
      lines: formatText(r.value, 's').split('\n'),
      json: JSON.parse((await import('../../core/json-text.js')).toJsonText(c.document)),
      seriesJson,
      degree: typeof r.degree === 'number' ? r.degree : undefined,
      elapsedMs: r.provenance.seconds * 1000,
    };
  },
  // The same engine entry as `gradus dist`.
  dist: async (input, progress) => {
    const { computeDistribution } = await import('../../enumerate/distribution.js');
    const d = await computeDistribution(input as DistRequest, { onProgress: (done, total) => progress('objects', done, total) });
    return { series: d.series.toJson(), ms: Math.round(d.provenance.seconds * 1000), method: d.provenance.method };
  },
  // A target over n from a request template with {n}, as `gradus search --from` builds it (results kept in the catalogue).
  'from-template': async (input, progress) => {
    const [{ targetFromTemplate }, { targetToJson }, { catalogueResultCache }, { Catalogue }] = await Promise.all([
      import('../../match/targetFromTemplate.js'),
      import('../../series/targetFile.js'),
      import('../../match/resultCache.js'),
      import('../../store/catalogue.js'),
    ]);
    const { template, nFrom, nTo, cwd, catalogue } = input as { template: string; nFrom: number; nTo: number; cwd: string; catalogue?: string };
    const cat = catalogue !== undefined ? Catalogue.open(catalogue, { existing: true }) : undefined;
    try {
      const target = await targetFromTemplate(template, nFrom, nTo, 'auto', {
        cwd,
        ...(cat ? { cache: catalogueResultCache(cat) } : {}),
        onStep: (key, i, total) => progress(key, i, total),
      });
      return targetToJson(target);
    } finally {
      cat?.close();
    }
  },
  // The same engine call as `gradus expressions add`: every place evaluated, then stored in one transaction.
  'expression-add': async (input, progress) => {
    const [{ addExpressionFamily }, { userFamily }, { Catalogue }] = await Promise.all([
      import('../../match/buildExpressions.js'),
      import('../../match/expressionFamilies.js'),
      import('../../store/catalogue.js'),
    ]);
    const { catalogue, name, template, nMax } = input as { catalogue: string; name: string; template: string; nMax: number };
    const family = userFamily(name, template, 'added in the app', undefined);
    const cat = Catalogue.open(catalogue);
    try {
      let label = 'expression family';
      let total: number | undefined;
      const r = await addExpressionFamily(cat, family, nMax, 1, {
        start: (l, t) => {
          label = l;
          total = t;
          progress(label, 0, total);
        },
        update: (done) => progress(label, done, total),
        finish: () => {},
      });
      return { text: `kept ${name} in ${catalogue}: ${r.values} values for n = 1..${nMax}; the search now tries it` };
    } finally {
      cat.close();
    }
  },
  // Exercises the worker plumbing in tests: counts to input.n, reporting progress.
  count: async (input, progress) => {
    const { n, delayMs } = input as { n: number; delayMs: number };
    for (let i = 1; i <= n; i++) {
      await new Promise((r) => setTimeout(r, delayMs));
      progress('counting', i, n);
    }
    return { counted: n };
  },
};

/** The pool task the app runs: one named task of JOB_TASKS with its input. */
export async function runJobTask(job: { readonly task: string; readonly input: unknown }, progress: ProgressFn): Promise<unknown> {
  const run = JOB_TASKS[job.task];
  if (!run) throw new Error(`no such task ${job.task}`);
  return run(job.input, progress);
}
