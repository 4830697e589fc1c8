/** Worker threads give the same cells as the single-thread engine (forced on small cases). */
import { describe, expect, it } from 'vitest';
import { computeModule, computeModuleAsync, type ModuleSpec } from '../../src/modules/compute-module.js';

const norm = (cells: readonly { degree: readonly number[]; dim: number; multiplicities?: readonly number[] }[]) =>
  JSON.stringify([...cells].map((c) => [c.degree.join('/'), c.dim, c.multiplicities ?? null]).sort());

describe('computeModuleAsync', () => {
  const cases: ModuleSpec[] = [
    { seed: 'superspace-vandermonde', n: 4, k: 2, ops: ['x', 'theta'] }, // task queue (exact integers)
    { seed: 'superspace-vandermonde', n: 3, k: 3, ops: ['x', 'y', 'polar1', 'polar2'] }, // one prime per thread
  ];
  for (const spec of cases) {
    it(`${spec.ops.join(',')}: same cells with and without workers`, { timeout: 60_000 }, async () => {
      const threaded = await computeModuleAsync(spec, { frobenius: true, parallelAboveSeconds: 0 });
      expect(threaded.provenance.notes.join(' ')).toMatch(/worker threads/);
      expect(threaded.provenance.confirmation).toMatch(/confirmed/);
      expect(norm(threaded.cells)).toBe(norm(computeModule(spec, { frobenius: true }).cells));
    });
  }
});
