/**
 * The small exact route: the closure over any coefficient ring (Q with fraction.js, or F_p),
 * kept in reduced echelon form with monomial pivots, and the graded character by traces:
 * for a basis b_i with pivot monomial π_i, trace(σ) = Σ_i (coefficient of π_i in σ·b_i).
 * Characters are converted to Schur multiplicities with the symmetric-function engine.
 * Independent of the Young-subgroup routes, so the two check each other.
 */
import { partitionList } from '../core/partitions.js';
import { permutationOfType } from '../core/permutations.js';
import { toBigIntExact, type Fraction } from '../core/rational.js';
import { classFunctionToSchur } from '../symfun/characters.js';
import type { ModuleCell } from './module-cell.js';
import type { OperatorFamily } from './operators.js';
import type { SuperAlgebra, SuperPoly } from './super-algebra.js';

interface Rref<T> {
  rows: SuperPoly<T>[];
  pivots: number[];
}

function reduce<T>(alg: SuperAlgebra<T>, e: Rref<T>, v: SuperPoly<T>): SuperPoly<T> {
  let w = v;
  e.rows.forEach((row, i) => {
    const a = w.get(e.pivots[i]!);
    if (a !== undefined) w = alg.add(w, alg.scale(row, alg.coeffs.neg(a)));
  });
  return w;
}

function insert<T>(alg: SuperAlgebra<T>, e: Rref<T>, v: SuperPoly<T>): void {
  const w = reduce(alg, e, v);
  if (w.size === 0) return;
  const pivot = Math.max(...w.keys());
  const row = alg.scale(w, alg.coeffs.inv(w.get(pivot)!));
  // keep the form reduced: clear the new pivot from the older rows
  e.rows = e.rows.map((r) => {
    const a = r.get(pivot);
    return a === undefined ? r : alg.add(r, alg.scale(row, alg.coeffs.neg(a)));
  });
  e.rows.push(row);
  e.pivots.push(pivot);
}

/**
 * Cells of the closure with dimensions and (when `frobenius`) multiplicities from traces.
 * `toInteger` lifts a trace to an exact integer (Q: the value itself; F_p: symmetric lift).
 */
export function exactClosure<T>(
  alg: SuperAlgebra<T>,
  f: SuperPoly<T>,
  degree: readonly [number, number, number],
  ops: readonly OperatorFamily[],
  frobenius: boolean,
  toInteger: (t: T) => bigint,
): ModuleCell[] {
  const n = alg.space.n;
  const pending = new Map<string, { degree: [number, number, number]; e: Rref<T> }>();
  const at = (d: [number, number, number]): Rref<T> => {
    const k = d.join(',');
    let c = pending.get(k);
    if (!c) {
      c = { degree: d, e: { rows: [], pivots: [] } };
      pending.set(k, c);
    }
    return c.e;
  };
  insert(alg, at([degree[0], degree[1], degree[2]]), f);
  const shapes = partitionList(n);
  const out: ModuleCell[] = [];
  while (pending.size > 0) {
    const [key, cell] = [...pending].reduce((a, b) => (lexGreater(b[1].degree, a[1].degree) ? b : a));
    pending.delete(key);
    const basis = cell.e.rows;
    if (basis.length === 0) continue;
    const [dx, dy, dt] = cell.degree;
    for (const b of basis) {
      for (const op of ops) {
        if (op.kind === 'x' && dx > 0) for (let i = 0; i < n; i++) insert(alg, at([dx - 1, dy, dt]), alg.derivative(b, 'x', i));
        if (op.kind === 'y' && dy > 0) for (let i = 0; i < n; i++) insert(alg, at([dx, dy - 1, dt]), alg.derivative(b, 'y', i));
        if (op.kind === 'theta' && dt > 0) for (let i = 0; i < n; i++) insert(alg, at([dx, dy, dt - 1]), alg.thetaDerivative(b, i));
        if (op.kind === 'polar' && dx >= op.order) insert(alg, at([dx - op.order, dy + 1, dt]), alg.polarization(b, op.order));
      }
    }
    if (!frobenius) {
      out.push({ degree: cell.degree, dim: basis.length });
      continue;
    }
    const traces = new Map<string, bigint>();
    for (const rho of shapes) {
      const sigma = permutationOfType(rho).map((v) => v - 1);
      let tr = alg.coeffs.zero;
      basis.forEach((b, i) => {
        const piv = cell.e.pivots[i]!;
        for (const [k, c] of b) {
          const [k2, s] = alg.actMonomial(sigma, k);
          if (k2 === piv) tr = alg.coeffs.add(tr, s < 0 ? alg.coeffs.neg(c) : c);
        }
      });
      traces.set(rho.join(','), toInteger(tr));
    }
    const schur = classFunctionToSchur(n, (rho) => traces.get(rho.join(','))!);
    const mult = shapes.map((l) => {
      const c = schur.get(l.join(','));
      return c === undefined ? 0 : Number(toBigIntExact(c as Fraction));
    });
    out.push({ degree: cell.degree, dim: basis.length, multiplicities: mult });
  }
  return out;
}

function lexGreater(a: readonly number[], b: readonly number[]): boolean {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i]! > b[i]!;
  return false;
}
