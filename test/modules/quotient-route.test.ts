/**
 * The quotient route (orbit rows, sparse top-reduction, signature criterion) against the dense
 * route of quotient-ring.ts (every product g·m, dense elimination, no criterion: an
 * independent computation in this project), its pieces against their plain counterparts,
 * and its interface: structured-clonable tasks, progress against a known total, errors.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputError, LimitError } from '../../src/core/errors.js';
import { DEFAULT_PRIME } from '../../src/core/modp.js';
import { CellOrbits } from '../../src/modules/cell-orbits.js';
import { primeCoeffs } from '../../src/modules/coefficients.js';
import { computeQuotient } from '../../src/modules/compute-quotient.js';
import { EchelonModP } from '../../src/modules/echelon-mod-p.js';
import { idealGenerators, type IdealSpec } from '../../src/modules/ideals.js';
import { quotientRequest } from '../../src/modules/quotient-input.js';
import { quotientCells } from '../../src/modules/quotient-ring.js';
import { mergeQuotientTasks, quotientTasks } from '../../src/modules/quotient-route.js';
import { runQuotientTask } from '../../src/modules/quotient-task.js';
import { SparseEchelonModP } from '../../src/modules/sparse-echelon.js';
import { SuperSpace } from '../../src/modules/superspace.js';
import { YoungFolder } from '../../src/modules/young-fold.js';

const p = DEFAULT_PRIME;

function cellKey(cells: readonly { degree: readonly number[]; dim: number; multiplicities?: readonly number[] }[]): string {
  return cells
    .filter((c) => c.dim > 0)
    .map((c) => `${c.degree.join(',')}:${c.dim}:${c.multiplicities?.join(' ') ?? ''}`)
    .sort()
    .join('|');
}

function byRoute(spec: IdealSpec, frobenius: boolean): string {
  const req = quotientRequest(spec, frobenius);
  const results = quotientTasks(req, [p], req.fullBounds, true).map((t) => runQuotientTask(structuredClone(req.input), structuredClone(t)));
  return cellKey(mergeQuotientTasks(req, results));
}

function dense(spec: IdealSpec, frobenius: boolean): string {
  const ideal = idealGenerators(spec, primeCoeffs(p));
  return cellKey(quotientCells({ alg: ideal.alg, p, generators: ideal.generators, stable: ideal.stable, frobenius, maxDegree: ideal.maxDegree }));
}

describe('quotient route equals the dense route (same prime, every cell and multiplicity)', () => {
  const specs: IdealSpec[] = [
    { ideal: 'coinvariant', n: 3 },
    { ideal: 'coinvariant', n: 3, y: true },
    { ideal: 'coinvariant', n: 3, theta: true },
    { ideal: 'coinvariant', n: 3, y: true, theta: true },
    { ideal: 'coinvariant', n: 4, y: true },
    { ideal: 'coinvariant', n: 4, theta: true },
    { ideal: 'generalized-coinvariant', n: 4, k: 2 },
    { ideal: 'generalized-coinvariant', n: 4, k: 3 },
    // typed: a monomial ideal (no S_n action on single generators), a sign-character generator, θ
    { ideal: 'generators', n: 3, generators: ['x1^2', 'x2^2', 'x3^2', 'x1*x2*x3'] },
    { ideal: 'generators', n: 3, y: true, generators: ['x1+x2+x3', 'y1+y2+y3', '(x1-x2)*(x1-x3)*(x2-x3)', 'x1^2+x2^2+x3^2', 'y1^2+y2^2+y3^2', 'x1*y1+x2*y2+x3*y3', 'x1^3+x2^3+x3^3', 'y1^3+y2^3+y3^3'] },
    { ideal: 'generators', n: 3, theta: true, generators: ['x1+x2+x3', 'x1^2+x2^2+x3^2', 'x1^3+x2^3+x3^3', 'th1+th2+th3', 'x1*th1+x2*th2+x3*th3'] },
  ];
  for (const spec of specs)
    for (const frob of [true, false])
      it(`${JSON.stringify(spec)}${frob ? ' with Frobenius' : ''}`, () => {
        expect(byRoute(spec, frob)).toBe(dense(spec, frob));
      });
});

describe('route pieces', () => {
  it('CellOrbits.fold and foldRaised agree with YoungFolder (representative and sign)', () => {
    const n = 5;
    const space = new SuperSpace(n, true, true, 8);
    const yR = 8;
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.nat(2), fc.nat(2), fc.nat(1)), { minLength: n, maxLength: n }), fc.constantFrom([2, 2, 1], [3, 2], [1, 4]), fc.array(fc.boolean(), { minLength: 3, maxLength: 3 }), (letters, blocks, alts) => {
        const x = letters.map((l) => l[0]);
        const y = letters.map((l) => l[1]);
        const mask = letters.reduce((m, l, i) => m | (l[2] << i), 0);
        const modes = blocks.map((_, i): 'alt' | 'sym' => (alts[i] ? 'alt' : 'sym'));
        const folder = new YoungFolder(space, blocks, modes);
        const cell = { x: x.reduce((s, v) => s + v, 0), y: y.reduce((s, v) => s + v, 0), theta: letters.reduce((s, l) => s + l[2], 0) };
        const orbits = new CellOrbits(n, blocks, alts.slice(0, blocks.length), yR, cell);
        const u = letters.map((l) => (l[0] * yR + l[1]) * 2 + l[2]);
        const code = orbits.fold(u, new Int32Array(n));
        const ref = folder.repOf(space.encode(x, y, mask));
        expect(code < 0).toBe(ref < 0);
        if (ref < 0) return;
        expect(orbits.parity).toBe(ref % 2);
        // the representative: decode the code and encode it as YoungFolder does
        const rep = new Int32Array(n);
        orbits.decode(code, rep);
        const rx = [...rep].map((v) => Math.floor(v / 2 / yR));
        const ry = [...rep].map((v) => (v >> 1) % yR);
        const rm = [...rep].reduce((m, v, i) => m | ((v & 1) << i), 0);
        expect(space.encode(rx, ry, rm)).toBe((ref - (ref % 2)) / 2);
        // raising one letter of the representative: the incremental fold equals the full one
        for (let i = 0; i < n; i++) {
          const raised = Int32Array.from(rep);
          raised[i] = rep[i]! + 2 * yR; // x-exponent + 1
          const big = new CellOrbits(n, blocks, alts.slice(0, blocks.length), yR, { ...cell, x: cell.x + 1 });
          const full = big.fold(raised, new Int32Array(n));
          const fullParity = big.parity;
          const inc = big.foldRaised(rep, big.codeOf(rep), i, raised[i]!);
          expect(inc).toBe(full);
          if (full >= 0) expect(big.parity).toBe(fullParity);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('SparseEchelonModP has the rank of the dense echelon on random sparse rows', () => {
    fc.assert(
      fc.property(fc.array(fc.array(fc.tuple(fc.nat(29), fc.integer({ min: 1, max: 6 })), { maxLength: 5 }), { maxLength: 40 }), (rows) => {
        const sparse = new SparseEchelonModP(p, 30);
        const denseE = new EchelonModP(p, 30);
        for (const r of rows) {
          const m = new Map<number, number>();
          for (const [c, v] of r) m.set(c, v); // distinct columns
          sparse.insert([...m.keys()], [...m.values()], m.size, 0);
          denseE.insert([...m.keys()], [...m.values()], m.size);
        }
        expect(sparse.rank).toBe(denseE.rank);
      }),
      { numRuns: 200 },
    );
  });
});

describe('computeQuotient', () => {
  it('reports progress against a total known from the first call, ending at the total', () => {
    const seen: [number, number][] = [];
    computeQuotient({ ideal: 'coinvariant', n: 4, y: true }, { frobenius: true, onProgress: (d, t) => seen.push([d, t]) });
    expect(seen.length).toBeGreaterThan(10);
    expect(seen.every(([, t]) => t === seen[0]![1] && t > 0)).toBe(true);
    expect(seen.every(([d], i) => i === 0 || d >= seen[i - 1]![0])).toBe(true);
    expect(seen.at(-1)![0]).toBeCloseTo(seen[0]![1], 6);
  });

  it('confirms with a second prime and says the quotient vanishes above the computed cells', () => {
    const r = computeQuotient({ ideal: 'coinvariant', n: 4, y: true, theta: true }, { frobenius: true });
    expect(r.provenance.primes.length).toBe(2);
    expect(r.provenance.confirmation).toMatch(/^confirmed/);
    expect(r.provenance.notes.some((s) => s.includes('vanishes above'))).toBe(true);
  });

  it('refuses estimated work above --max-work with a LimitError naming the option', () => {
    expect(() => computeQuotient({ ideal: 'coinvariant', n: 5, y: true }, { maxWork: 10 })).toThrow(LimitError);
    expect(() => computeQuotient({ ideal: 'coinvariant', n: 5, y: true }, { maxWork: 10 })).toThrow(/--max-work/);
  });

  it('rejects bad ideals with one-line InputErrors', () => {
    const cases: [IdealSpec, RegExp][] = [
      [{ ideal: 'generators', n: 3, generators: ['x1^2 + x2'] }, /not homogeneous/],
      [{ ideal: 'generators', n: 3, y: true, generators: ['x1+x2+x3', 'x1^2+x2^2+x3^2', 'x1^3+x2^3+x3^3'] }, /no generator uses y/],
      [{ ideal: 'generators', n: 3, generators: ['y1'] }, /add y to --vars/],
      [{ ideal: 'generalized-coinvariant', n: 3, k: 2, y: true }, /x variables alone/],
      [{ ideal: 'generalized-coinvariant', n: 3, k: 5 }, /--k/],
    ];
    for (const [spec, message] of cases) {
      let error: unknown;
      try {
        computeQuotient(spec);
      } catch (e) {
        error = e;
      }
      expect(error).toBeInstanceOf(InputError);
      expect((error as Error).message).toMatch(message);
      expect((error as Error).message).not.toContain('\n');
    }
  });

  it('an ideal without finite codimension fails the certificate (a LimitError, one line)', () => {
    expect(() => computeQuotient({ ideal: 'generators', n: 2, generators: ['x1+x2'] })).toThrow(/does not vanish/);
  });
});
