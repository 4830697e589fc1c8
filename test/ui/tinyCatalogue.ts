/**
 * A small catalogue for UI tests, written through the store's own functions: permutations
 * of n = 1..5 with two statistics (seconds instead of the minute a full build takes).
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { familyById } from '../../objects/index.js';
import { statisticById } from '../../statistics/index.js';
import { Catalogue } from '../../src/store/catalogue.js';
import { makeProvenance } from '../../src/core/provenance.js';
import { tallyStats, tallyUnit } from '../../src/store/tallyUnit.js';

export function tinyCatalogue(): { dir: string; path: string } {
  const dir = mkdtempSync(join(tmpdir(), 'gradus-ui-test-'));
  const path = join(dir, 'catalogue.sqlite');
  const cat = Catalogue.open(path);
  try {
    const family = familyById('permutations');
    const stats = tallyStats(family, [statisticById('inversions'), statisticById('major-index')], []);
    for (let n = 1; n <= 5; n++) {
      const r = tallyUnit(family, { n }, stats);
      cat.writeUnit(family.id, { n }, r.objects, 0, r.rows, makeProvenance({ request: `${family.id} n=${n}`, method: 'test fixture', seconds: 0 }));
    }
  } finally {
    cat.close();
  }
  return { dir, path };
}
