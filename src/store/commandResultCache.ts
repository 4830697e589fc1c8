/**
 * Module and symmetric-function results run by `search --from` are kept in the catalogue
 * (with provenance) and found again by their exact command line, so a repeated search does
 * not recompute them. Other commands (dist, qseries) are cheap and not kept.
 */
import type { ResultCache } from '../match/runFrom.js';
import type { Catalogue } from './catalogue.js';
import { provenance } from './provenance.js';

export function commandResultCache(cat: Catalogue): ResultCache {
  const key = (argv: readonly string[]) => argv.join(' ');
  return {
    get(argv) {
      if (argv[0] === 'module') return cat.getModuleResult(key(argv));
      if (argv[0] === 'sym') return cat.getSymResult(key(argv));
      return undefined;
    },
    put(argv, doc, n, k) {
      const own = (doc as { provenance?: unknown }).provenance;
      const prov = provenance({ command: `gradus ${key(argv)}`, result: own ?? null }, `gradus ${argv[0]} (run by search --from)`,
        ((own as { primes?: number[] } | undefined)?.primes ?? []).filter((p) => typeof p === 'number'));
      if (argv[0] === 'module') cat.saveModuleResult(key(argv), n, k, doc, prov);
      else if (argv[0] === 'sym') cat.saveSymResult(key(argv), n, doc, prov);
    },
  };
}
