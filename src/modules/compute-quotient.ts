/**
 * Engine entry for quotient rings: `computeQuotient(spec, options)` builds the ideal's
 * generators, computes every multigraded piece of Q[vars]/I mod two primes (a third on
 * disagreement), and returns the cells with checks and provenance.
 */
import { CONFIRM_PRIME, DEFAULT_PRIME, PRIMES } from '../core/modp.js';
import { makeProvenance } from '../core/provenance.js';
import { moduleChecks } from './checks.js';
import { primeCoeffs } from './coefficients.js';
import { idealGenerators, type IdealSpec } from './ideals.js';
import { mergeRuns } from './merge-runs.js';
import type { ModuleCell } from './module-cell.js';
import type { Axis, ModuleResult } from './module-result.js';
import { quotientCells } from './quotient-ring.js';

export interface QuotientOptions {
  readonly frobenius?: boolean;
  readonly prime?: number;
  readonly onProgress?: (done: number, total: number, label: string) => void;
  readonly signal?: AbortSignal;
  /** Cells already computed for some primes (cluster shards, one prime each). */
  readonly precomputed?: ReadonlyMap<number, readonly ModuleCell[]>;
  /** Compute the first prime only, without confirmation (a shard; the merge confirms). */
  readonly onePrime?: boolean;
}

export function computeQuotient(spec: IdealSpec, options: QuotientOptions = {}): ModuleResult {
  const t0 = performance.now();
  const p1 = options.prime ?? DEFAULT_PRIME;
  const p2 = p1 === CONFIRM_PRIME ? DEFAULT_PRIME : CONFIRM_PRIME;
  const frob = options.frobenius ?? false;
  let description = '';
  let stable = true;
  let axes: Axis[] = ['x'];
  const run = (p: number): readonly ModuleCell[] => {
    const ideal = idealGenerators(spec, primeCoeffs(p));
    description = ideal.description;
    stable = ideal.stable;
    const sp = ideal.alg.space;
    axes = ['x', ...(sp.hasY ? (['y'] as const) : []), ...(sp.hasTheta ? (['theta'] as const) : [])];
    return (
      options.precomputed?.get(p) ??
      quotientCells(
        { alg: ideal.alg, p, generators: ideal.generators, stable: ideal.stable, frobenius: frob, maxDegree: ideal.maxDegree },
        { onProgress: options.onProgress, signal: options.signal },
      )
    );
  };
  const merged = options.onePrime ? { cells: run(p1), primes: [p1], confirmation: 'one prime only (a shard; the merge confirms with a second prime)' } : mergeRuns([p1, p2], run, PRIMES);
  const frobOk = frob && stable;
  const cells = frobOk ? merged.cells : merged.cells.map((c) => ({ degree: c.degree, dim: c.dim }));
  const notes = ['ranks mod p are lower bounds of ranks over Q (quotient dimensions upper bounds); multiplicities are integer combinations of ranks'];
  if (frob && !stable) notes.push('some generator is neither symmetric nor antisymmetric: no Frobenius series');
  return {
    kind: 'quotient',
    name: spec.ideal,
    description: `quotient by the ${description}`,
    n: spec.n,
    ...(spec.k !== undefined ? { k: spec.k } : {}),
    ops: [],
    axes,
    cells,
    frobenius: frobOk,
    checks: moduleChecks(spec.n, cells, axes),
    provenance: makeProvenance({
      request: `${spec.ideal} n=${spec.n}`,
      primes: merged.primes,
      method: `${
        stable
          ? 'I_d spanned by generator × monomial; Schur multiplicities from ranks of Young-subgroup folds (invariants h, anti-invariants e) solved with Kostka numbers'
          : 'I_d spanned by generator × monomial; dimension = #monomials − rank'
      } (F_p for p in {${merged.primes.join(', ')}})`,
      confirmation: merged.confirmation,
      notes,
      seconds: (performance.now() - t0) / 1000,
    }),
  };
}
