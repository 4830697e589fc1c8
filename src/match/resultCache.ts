/**
 * Results of the data requests a search runs are kept in the catalogue under their canonical
 * request key, so a repeated search (from the command line or the app, with options in any
 * order) does not recompute them. Cheap requests (dist, show, qanalog) are not kept.
 */
import type { Provenance } from '../core/provenance.js';
import type { DataCommand } from '../requests/index.js';
import type { Catalogue } from '../store/catalogue.js';

export interface ResultCache {
  get(key: string): unknown | undefined;
  put(key: string, kind: DataCommand, document: Record<string, unknown>, n: number, k: number | undefined): void;
}

const KEPT: readonly DataCommand[] = ['module', 'quotient', 'sym'];

export function catalogueResultCache(cat: Catalogue): ResultCache {
  return {
    get(key) {
      return KEPT.includes(key.split(' ')[0] as DataCommand) ? cat.getResult(key) : undefined;
    },
    put(key, kind, document, n, k) {
      if (!KEPT.includes(kind) || !cat.writable) return;
      cat.saveResult(key, kind, n, k, document, document['provenance'] as Provenance);
    },
  };
}
