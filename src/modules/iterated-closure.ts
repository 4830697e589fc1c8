/**
 * Closure under any operator families (polarizations included), degree by degree: a cell's
 * space is the span of the images of the bases of the cells above it, kept in semi-echelon
 * form mod p. Every operator lowers (x-degree, y-degree, θ-degree) lexicographically, so
 * cells are finished in decreasing lexicographic order. Frobenius multiplicities come from
 * the ranks of the Young-subgroup folds of each basis.
 */
import { fLambda, partitionList } from '../core/partitions.js';
import { EchelonModP } from './echelon-mod-p.js';
import type { ClosureHooks } from './derivative-closure.js';
import type { ModuleCell } from './module-cell.js';
import type { OperatorFamily } from './operators.js';
import type { SuperAlgebra, SuperPoly } from './super-algebra.js';
import { YoungFolder } from './young-fold.js';
import { solveMultiplicities, youngPlan, type YoungTask } from './young-plan.js';

interface CellState {
  readonly degree: [number, number, number];
  readonly ech: EchelonModP;
  readonly keys: number[];
  readonly index: Map<number, number>;
}

export interface IteratedOptions extends ClosureHooks {
  /** Compute Schur multiplicities (the seed must be symmetric or antisymmetric). */
  readonly frobenius: boolean;
  readonly p: number;
}

export function iteratedClosure(alg: SuperAlgebra<number>, f: SuperPoly<number>, degree: readonly [number, number, number], ops: readonly OperatorFamily[], options: IteratedOptions): ModuleCell[] {
  const sp = alg.space;
  const n = sp.n;
  const p = options.p;
  const cells = new Map<string, CellState>();
  const keyOf = (d: readonly number[]): string => d.join(',');
  const cellAt = (d: [number, number, number]): CellState => {
    const k = keyOf(d);
    let c = cells.get(k);
    if (!c) {
      c = { degree: d, ech: new EchelonModP(p), keys: [], index: new Map() };
      cells.set(k, c);
    }
    return c;
  };
  const feed = (c: CellState, v: SuperPoly<number>): void => {
    if (v.size === 0) return;
    const cols = new Int32Array(v.size);
    const vals = new Float64Array(v.size);
    let i = 0;
    for (const [key, val] of v) {
      let col = c.index.get(key);
      if (col === undefined) {
        col = c.keys.length;
        c.keys.push(key);
        c.index.set(key, col);
      }
      cols[i] = col;
      vals[i] = val;
      i++;
    }
    c.ech.insert(cols, vals, i);
  };
  feed(cellAt([degree[0], degree[1], degree[2]]), f);
  const plan: readonly YoungTask[] = options.frobenius ? youngPlan(n) : [];
  const shapes = partitionList(n);
  const fl = shapes.map((l) => Number(fLambda(l)));
  const out: ModuleCell[] = [];
  let done = 0;
  for (;;) {
    options.signal?.throwIfAborted();
    // the lexicographically largest unfinished cell
    let next: CellState | undefined;
    for (const c of cells.values()) {
      if (!next || lexGreater(c.degree, next.degree)) next = c;
    }
    if (!next) break;
    cells.delete(keyOf(next.degree));
    const basis = rowsAsPolys(next);
    if (basis.length === 0) continue;
    const [dx, dy, dt] = next.degree;
    for (const b of basis) {
      for (const op of ops) {
        if (op.kind === 'x' && dx > 0) for (let i = 0; i < n; i++) feed(cellAt([dx - 1, dy, dt]), alg.derivative(b, 'x', i));
        if (op.kind === 'y' && dy > 0) for (let i = 0; i < n; i++) feed(cellAt([dx, dy - 1, dt]), alg.derivative(b, 'y', i));
        if (op.kind === 'theta' && dt > 0) for (let i = 0; i < n; i++) feed(cellAt([dx, dy, dt - 1]), alg.thetaDerivative(b, i));
        if (op.kind === 'polar' && dx >= op.order) feed(cellAt([dx - op.order, dy + 1, dt]), alg.polarization(b, op.order));
      }
    }
    const dim = basis.length;
    if (!options.frobenius) out.push({ degree: next.degree, dim });
    else {
      const values = plan.map((task) => foldRank(alg, basis, task, p));
      const mult = solveMultiplicities(n, plan, values);
      out.push({ degree: next.degree, dim, multiplicities: mult });
      const check = mult.reduce((s, m, i) => s + m * fl[i]!, 0);
      if (check !== dim) throw new Error(`internal: Σ f^λ m_λ = ${check} ≠ dim ${dim} at ${next.degree.join('/')}`);
    }
    done += dim;
    options.onProgress?.(done, 0, `degree ${next.degree.join('/')}`);
  }
  return out;
}

function lexGreater(a: readonly number[], b: readonly number[]): boolean {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i]! > b[i]!;
  return false;
}

function rowsAsPolys(c: CellState): SuperPoly<number>[] {
  const out: SuperPoly<number>[] = [];
  for (let r = 0; r < c.ech.rank; r++) {
    const row = c.ech.row(r);
    const m = new Map<number, number>();
    for (let j = 0; j < c.keys.length; j++) if (row[j] !== 0) m.set(c.keys[j]!, row[j]!);
    out.push(m);
  }
  return out;
}

/** dim of the S_μ-(anti-)invariants of span(basis): rank of the folded vectors. */
export function foldRank(alg: SuperAlgebra<number>, basis: readonly SuperPoly<number>[], task: YoungTask, p: number): number {
  const folder = new YoungFolder(alg.space, task.blocks, task.modes);
  const ech = new EchelonModP(p);
  for (const b of basis) {
    const cols: number[] = [];
    const vals: number[] = [];
    for (const [key, val] of b) {
      const code = folder.fold(key);
      if (code < 0) continue;
      cols.push(code >> 1);
      vals.push(code & 1 ? (p - val) % p : val);
    }
    ech.insert(cols, vals, cols.length);
  }
  return ech.rank;
}
