/**
 * The engine tasks the app runs in a worker thread, by name. Each takes JSON-ready input,
 * reports progress, and returns JSON-ready output. Engines are imported inside each task,
 * so a worker loads only the engine its task needs (a faster start).
 */
import type { SearchDocument } from '../../match/searchDocument.js';
import type { DistRequest } from '../../enumerate/request.js';
import type { ModuleRequest } from './moduleRequest.js';

export type ProgressFn = (label: string, done: number, total?: number) => void;
export type JobTask = (input: unknown, progress: ProgressFn) => unknown | Promise<unknown>;

async function searchMany(targets: readonly unknown[], catalogue: string, progress: ProgressFn): Promise<{ doc: SearchDocument; id: number; ms: number }[]> {
  const [{ recognise }, { searchCatalogue }, { searchDocument }, { rangeText }, { targetFromJson }, { Catalogue }, { provenance }] = await Promise.all([
    import('../../match/recognise.js'),
    import('../../match/search.js'),
    import('../../match/searchDocument.js'),
    import('../../series/target.js'),
    import('../../series/targetFile.js'),
    import('../../store/catalogue.js'),
    import('../../store/provenance.js'),
  ]);
  const cat = Catalogue.open(catalogue, { readonly: true });
  try {
    return targets.map((tj, i) => {
      progress('searching the catalogue', i, targets.length);
      const target = targetFromJson(tj);
      const t0 = Date.now();
      const outcome = searchCatalogue(cat, target);
      const rec = recognise(target);
      const ms = Date.now() - t0;
      const prov = provenance({ target: target.label, catalogue }, 'exact look-up of series hashes in the catalogue, then exact comparison on every entry', [], ms / 1000);
      const doc = searchDocument(target, rangeText(target.entries), rec, outcome, prov);
      const id = cat.saveSearch(target.label, doc, prov);
      return { doc, id, ms };
    });
  } finally {
    cat.close();
  }
}

export const JOB_TASKS: Readonly<Record<string, JobTask>> = {
  // The same engine entry `gradus module` calls; the result is plain data.
  module: async (input, progress) => {
    const [{ computeModule }, { resultToJson }] = await Promise.all([import('../../modules/compute-module.js'), import('../../modules/format-result.js')]);
    const req = input as ModuleRequest;
    const result = computeModule(req.spec, {
      frobenius: true,
      method: req.method,
      ...(req.prime !== undefined ? { prime: req.prime } : {}),
      ...(req.maxWork !== undefined ? { maxWork: req.maxWork } : {}),
      onEstimate: (units, seconds) => progress(`estimated ${units.toExponential(1)} units, ~${Math.ceil(seconds)}s of processor time`, 0),
      onProgress: (done, total, label) => progress(label || 'closure', done, total || undefined),
    });
    return { result, json: resultToJson(result) };
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
  // The same engine call as `gradus catalogue build`.
  'catalogue-build': async (input, progress) => {
    const [{ buildCatalogue }, { Catalogue }] = await Promise.all([import('../../store/buildCatalogue.js'), import('../../store/catalogue.js')]);
    const { catalogue, nMax } = input as { catalogue: string; nMax: number };
    const cat = Catalogue.open(catalogue);
    try {
      let label = 'catalogue build';
      let total: number | undefined;
      const r = buildCatalogue(cat, {
        nMax,
        maxObjects: 50_000_000n,
        progress: {
          start: (l, t) => {
            label = l;
            total = t;
            progress(label, 0, total);
          },
          update: (done) => progress(label, done, total),
          finish: () => {},
        },
      });
      return { text: `catalogue ${catalogue}: ${r.units} units built (${r.skippedDone} already there), ${r.rows} distributions in ${r.seconds.toFixed(1)}s` };
    } finally {
      cat.close();
    }
  },
  // The same engine entry as `gradus sym`; text in the Schur basis, JSON as --json prints it.
  sym: async (input, progress) => {
    const [{ qtTableJson }, { schurSeries }, { seriesToJson }, { evaluateExpression }, { formatText, integralCoefficients }] = await Promise.all([
      import('../../core/json-text.js'),
      import('../../series/series.js'),
      import('../../series/seriesJson.js'),
      import('../../symfun/expression.js'),
      import('../../symfun/sym-format.js'),
    ]);
    const { expression } = input as { expression: string };
    const r = evaluateExpression(expression, { onProgress: (label, done, total) => progress(label, done, total) });
    const { denominator, terms } = integralCoefficients(r.value, 's');
    const json = {
      expression,
      degree: r.degree,
      basis: 's',
      ...(denominator === 1n ? {} : { denominator: denominator.toString() }),
      terms: Object.fromEntries(terms.map(([k, c]) => [k, qtTableJson(c.num)])),
      provenance: r.provenance,
    };
    // A series for the search only when homogeneous with integer coefficients.
    const seriesJson = typeof r.degree === 'number' && denominator === 1n ? seriesToJson(schurSeries(terms.map(([k, c]) => [k, c.num] as const))) : undefined;
    return {
      expression,
      lines: formatText(r.value, 's').split('\n'),
      json,
      seriesJson,
      degree: typeof r.degree === 'number' ? r.degree : undefined,
      elapsedMs: r.provenance.milliseconds,
    };
  },
  // The same engine entry as `gradus dist`.
  dist: async (input, progress) => {
    const { computeDistribution } = await import('../../enumerate/distribution.js');
    const d = await computeDistribution(input as DistRequest, { onProgress: (done, total) => progress('objects', done, total) });
    return { series: d.series.toJson(), ms: d.provenance.ms, method: d.provenance.method };
  },
  // A target over n from a data command with {n}, as `gradus search --from` builds it.
  'from-command': async (input, progress) => {
    const [{ targetFromCommand }, { targetToJson }] = await Promise.all([import('../../match/runFrom.js'), import('../../series/targetFile.js')]);
    const { template, nFrom, nTo, cwd } = input as { template: string; nFrom: number; nTo: number; cwd: string };
    let step = 0;
    const target = await targetFromCommand(template, nFrom, nTo, 'auto', process.env, cwd, undefined, (text) => progress(text, step++, nTo - nFrom + 1));
    return targetToJson(target);
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
