/**
 * Pool task of the sweep: one small module computed whole in one pool thread (both primes,
 * synchronously), returned as the JSON document `gradus module --json` prints for the same
 * request. Small modules then run side by side, one per core, instead of one after another.
 */
import { toJsonText } from '../core/json-text.js';
import { computeModule } from '../modules/compute-module.js';
import { requestKey, REQUEST_KINDS, type ModuleRequest } from '../requests/index.js';

export function sweepModule(input: { readonly request: ModuleRequest }): Record<string, unknown> {
  const r = input.request;
  const result = computeModule(r.spec, {
    frobenius: r.frobenius,
    method: r.method,
    ...(r.prime !== undefined ? { prime: r.prime } : {}),
    ...(r.maxWork !== undefined ? { maxWork: r.maxWork } : {}),
  });
  return JSON.parse(toJsonText(REQUEST_KINDS.module.document(r, result, requestKey(r)))) as Record<string, unknown>;
}
