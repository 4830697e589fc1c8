import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { silentProgress } from '../../src/core/progress.js';
import { buildCatalogue } from '../../src/store/buildCatalogue.js';
import { buildCatalogueParallel } from '../../src/store/buildParallel.js';
import { Catalogue } from '../../src/store/catalogue.js';

function hashes(c: Catalogue): Map<string, string> {
  const rows = c.db.prepare('SELECT family, params, statistics, combine, transform, hash FROM distributions').all() as Record<string, string>[];
  return new Map(rows.map((r) => [`${r['family']}|${r['params']}|${r['statistics']}|${r['combine']}|${r['transform']}`, r['hash']!]));
}

describe('parallel catalogue build', () => {
  it('gives the same distributions as the single-thread build, with units split into shards', { timeout: 120_000 }, async () => {
    const dir = mkdtempSync(join(tmpdir(), 'gradus-par-'));
    const families = ['permutations', 'parking-functions', 'ordered-set-partitions', 'standard-tableaux'];
    const a = Catalogue.open(join(dir, 'a.sqlite'));
    buildCatalogue(a, { nMax: 4, maxObjects: 10_000_000n, families, progress: silentProgress });
    const b = Catalogue.open(join(dir, 'b.sqlite'));
    // shardMin 10: every unit with 10 objects or more is split between the two workers
    const r = await buildCatalogueParallel(b, { nMax: 4, maxObjects: 10_000_000n, families, progress: silentProgress, workers: 2, shardMin: 10n });
    expect(r.units).toBeGreaterThan(10);
    const ha = hashes(a);
    const hb = hashes(b);
    expect(hb.size).toBe(ha.size);
    for (const [k, h] of ha) expect(hb.get(k), k).toBe(h);
    a.close();
    b.close();
  });
});
