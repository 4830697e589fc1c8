/**
 * The three routes agree: Young-subgroup ranks (derivative closures), the iterated closure
 * with folded bases, and the exact route over Q with characters by traces on a reduced
 * echelon basis; Q against F_p.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeModule, type ModuleSpec } from '../../src/modules/compute-module.js';
import type { ModuleCell } from '../../src/modules/module-cell.js';

const norm = (cells: readonly ModuleCell[]) =>
  JSON.stringify([...cells].map((c) => [c.degree.join('/'), c.dim, c.multiplicities ?? null]).sort((a, b) => String(a[0]).localeCompare(String(b[0]))));

const cases: ModuleSpec[] = [
  { seed: 'superspace-vandermonde', n: 3, k: 2, ops: ['x', 'theta'] },
  { seed: 'superspace-vandermonde', n: 4, k: 2, height: 2, ops: ['x', 'theta'] },
  { seed: 'theta-staircase', n: 4, k: 2, ops: ['x', 'theta'] },
  { seed: 'monomial', n: 3, xExponents: [2, 1, 0], yExponents: [0, 1, 1], theta: [1], ops: ['x', 'y', 'theta'] },
  { seed: 'monomial', n: 3, xExponents: [2, 0, 0], theta: [1, 2], symmetrizer: 'symmetrize', ops: ['x', 'theta'] },
  { seed: 'monomial', n: 4, xExponents: [2, 2, 1, 0], symmetrizer: 'symmetrize', ops: ['x'] },
  { seed: 'poly', n: 3, poly: 'x1*th2 - x2*th1 + x2*th3 - x3*th2 + x3*th1 - x1*th3', ops: ['x', 'theta'] },
];

describe('routes agree', () => {
  for (const spec of cases) {
    it(`${spec.seed} ${JSON.stringify({ ...spec, seed: undefined })}`, () => {
      const young = computeModule(spec, { frobenius: true, method: 'young' });
      const iter = computeModule(spec, { frobenius: true, method: 'iterated' });
      const exact = computeModule(spec, { frobenius: true, method: 'exact' });
      expect(norm(young.cells)).toBe(norm(exact.cells));
      expect(norm(iter.cells)).toBe(norm(exact.cells));
      expect(exact.provenance.confirmation).toMatch(/exact over Q/);
    });
  }
  it('polarized closures: iterated mod p equals exact over Q with traces (δ_{3,2}, Vandermonde n = 3)', () => {
    for (const spec of [
      { seed: 'superspace-vandermonde', n: 3, k: 2, ops: ['x', 'y', 'polar1', 'polar2'] },
      { seed: 'vandermonde', n: 3, ops: ['x', 'polar1'] },
    ] as ModuleSpec[]) {
      expect(norm(computeModule(spec, { frobenius: true }).cells)).toBe(norm(computeModule(spec, { frobenius: true, method: 'exact' }).cells));
    }
  });
  it('n = 4 and 5 (subgroup plans with mixed h_μ e_ν tasks): Young route equals exact route', () => {
    for (const spec of [
      { seed: 'monomial', n: 4, xExponents: [2, 1, 1, 0], yExponents: [0, 1, 0, 1], theta: [2, 3], ops: ['x', 'y', 'theta'] },
      { seed: 'monomial', n: 4, xExponents: [1, 1, 0, 0], yExponents: [1, 0, 1, 0], theta: [1], symmetrizer: 'symmetrize', ops: ['x', 'y', 'theta'] },
      { seed: 'superspace-vandermonde', n: 4, k: 2, ops: ['x', 'y', 'polar1', 'polar2'] },
      { seed: 'superspace-vandermonde', n: 5, k: 3, ops: ['x', 'theta'] },
    ] as ModuleSpec[]) {
      expect(norm(computeModule(spec, { frobenius: true, method: 'young' }).cells)).toBe(norm(computeModule(spec, { frobenius: true, method: 'exact' }).cells));
    }
  });
  it('random antisymmetrized monomials: Young route equals exact route (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.nat(3), { minLength: 3, maxLength: 3 }), fc.nat(7), fc.boolean(), (x, mask, sym) => {
        const theta = [1, 2, 3].filter((i) => (mask >> (i - 1)) & 1);
        const spec: ModuleSpec = { seed: 'monomial', n: 3, xExponents: x, theta, ops: ['x', 'theta'], symmetrizer: sym ? 'symmetrize' : 'antisymmetrize' };
        let exact: ModuleCell[] | undefined;
        try {
          exact = [...computeModule(spec, { frobenius: true, method: 'exact' }).cells];
        } catch (e) {
          // a monomial whose (anti)symmetrization vanishes is refused by every route
          expect(() => computeModule(spec, { frobenius: true })).toThrow(/vanishes/);
          return;
        }
        expect(norm(computeModule(spec, { frobenius: true }).cells)).toBe(norm(exact));
      }),
      { numRuns: 25 },
    );
  });
});
