/**
 * `--from "<data request with {n} and {k}>"`: the request computed for every n of a range
 * (and every k = 1..n where {k} appears) through the request model, each kept result found
 * again by its canonical key; the documents read as the entries of a target.
 */
import { InputError } from '../core/errors.js';
import { compute, requestFromWords, requestKey, type ComputeContext } from '../requests/index.js';
import { instantiate, templateUses } from '../requests/template.js';
import { splitWords } from '../requests/words.js';
import { markedSlicesOfDocument, seriesFromDocument, type Take } from '../series/fromDocument.js';
import { schurSeries } from '../series/series.js';
import { makeTarget, type Target, type TargetEntry } from '../series/target.js';
import type { ResultCache } from './resultCache.js';

export interface TemplateRun {
  readonly cwd: string;
  readonly cache?: ResultCache;
  /** Called before each request with its canonical key, its index and the number of requests. */
  readonly onStep?: (key: string, index: number, total: number) => void;
  readonly context?: ComputeContext;
}

/** The (n, k) places of a template over n = nFrom..nTo. */
export function templatePlaces(template: string, nFrom: number, nTo: number): { n: number; k?: number }[] {
  const uses = templateUses(template);
  const places: { n: number; k?: number }[] = [];
  for (let n = nFrom; n <= nTo; n++) {
    if (uses.k) for (let k = 1; k <= n; k++) places.push({ n, k });
    else places.push({ n });
  }
  return places;
}

export async function targetFromTemplate(template: string, nFrom: number, nTo: number, take: Take, run: TemplateRun): Promise<Target> {
  if (!templateUses(template).n) throw new InputError('--from needs {n} in the command (and {k} where it has a second parameter)', 'from');
  const places = templatePlaces(template, nFrom, nTo);
  // every request is checked before the first is computed: a typo fails at once
  const requests = places.map((at) => requestFromWords(splitWords(instantiate(template, at)), run.cwd));
  const entries: TargetEntry[] = [];
  const docs: { at: { n: number; k?: number }; doc: unknown; where: string }[] = [];
  for (const [i, request] of requests.entries()) {
    const at = places[i]!;
    const key = requestKey(request);
    const where = `gradus ${key}`;
    let doc = run.cache?.get(key);
    if (doc === undefined) {
      run.onStep?.(key, i, requests.length);
      const computed = await compute(request, run.context ?? {});
      doc = computed.document;
      run.cache?.put(key, request.kind, computed.document, at.n, at.k);
    }
    docs.push({ at, doc, where });
  }
  const marked = take === 'auto' || take === 'frobenius' ? markedTarget(template, docs, nFrom, nTo, take) : undefined;
  if (marked) return marked;
  for (const { at, doc, where } of docs) entries.push({ n: at.n, ...(at.k === undefined ? {} : { k: at.k }), series: seriesFromDocument(doc, take, where) });
  return makeTarget(`gradus ${template}${take === 'auto' ? '' : ` (--take ${take})`}, n = ${nFrom}..${nTo}`, entries);
}

/**
 * Documents whose Frobenius series has three gradings (x, y, θ) over n alone: read as a marked
 * union, the entry (n, k) being the coefficient of θ^{n−k} (k = 0..n, zero entries included).
 */
function markedTarget(template: string, docs: readonly { at: { n: number; k?: number }; doc: unknown; where: string }[], nFrom: number, nTo: number, take: Take): Target | undefined {
  const sliced = docs.map((d) => ({ ...d, s: markedSlicesOfDocument(d.doc, d.where) }));
  if (!sliced.some((d) => d.s && d.s.bySlice.size > 1)) return undefined;
  if (templateUses(template).k) throw new InputError('--from: the documents have three gradings and the template has {k}; take one grading out (--take hilbert reads the Hilbert table)', 'from');
  const entries: TargetEntry[] = [];
  let axis = 'theta';
  for (const { at, s, where } of sliced) {
    if (!s) throw new InputError(`${where}: the Frobenius series has fewer than three gradings, unlike the other sizes`, 'from');
    axis = s.axis;
    for (let j = 0; j <= at.n; j++) entries.push({ n: at.n, k: at.n - j, series: s.bySlice.get(j) ?? schurSeries([]) });
    if ([...s.bySlice.keys()].some((j) => j > at.n)) throw new InputError(`${where}: the ${axis}-degree exceeds n; the document is not read as a marked union`, 'from');
  }
  const marker = `${axis === 'theta' ? 'θ' : axis}^{n−k}`;
  return makeTarget(`gradus ${template}${take === 'auto' ? '' : ` (--take ${take})`}, n = ${nFrom}..${nTo}, read as Σ_k ${marker}·F(n, k)`, entries, marker);
}
