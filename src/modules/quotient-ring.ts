/**
 * The dense reference route for quotients (kept to cross-check the quotient route of
 * quotient-task.ts on small cases: every product, dense elimination, no criterion).
 * Quotients Q[vars]/I degree by degree (multigraded by x-, y-, θ-degree): I_d is spanned by
 * generator × monomial, dim (Ω/I)_d = #monomials − rank, all mod p. When the generator set is
 * permuted by S_n (up to sign), Frobenius multiplicities come from Young subgroups:
 * ⟨F, h_μ⟩ = dim Ω_d^{S_μ} − rank of the folded generators' multiples (rows g·m for g in the
 * generator set and m over S_μ-orbit representatives), likewise for e_μ'.
 */
import { fLambda, partitionList } from '../core/partitions.js';
import { EchelonModP } from './echelon-mod-p.js';
import type { ClosureHooks } from './derivative-closure.js';
import type { ModuleCell } from './module-cell.js';
import type { SuperAlgebra, SuperPoly } from './super-algebra.js';
import { popcount } from './superspace.js';
import { YoungFolder } from './young-fold.js';
import { solveMultiplicities, youngPlan, type YoungTask } from './young-plan.js';

export interface QuotientInput {
  readonly alg: SuperAlgebra<number>;
  readonly p: number;
  readonly generators: readonly SuperPoly<number>[];
  /** S_n permutes the generators up to sign: Frobenius multiplicities are available. */
  readonly stable: boolean;
  readonly frobenius: boolean;
  /** Stop with an error past this total degree (the quotient should vanish before). */
  readonly maxDegree: number;
}

/** All monomial keys of a multidegree. */
export function monomialsOfDegree(alg: SuperAlgebra<number>, dx: number, dy: number, dt: number): number[] {
  const sp = alg.space;
  const n = sp.n;
  const xs = compositionsInto(dx, n);
  const ys = sp.hasY ? compositionsInto(dy, n) : dy === 0 ? [new Array<number>(n).fill(0)] : [];
  const masks: number[] = [];
  if (sp.hasTheta || dt === 0) for (let m = 0; m < 1 << n; m++) if (popcount(m) === dt) masks.push(m);
  const out: number[] = [];
  for (const x of xs) for (const y of ys) for (const m of masks) out.push(sp.encode(x, y, m));
  return out;
}

function compositionsInto(d: number, n: number): number[][] {
  const out: number[][] = [];
  const a = new Array<number>(n).fill(0);
  const rec = (i: number, rest: number): void => {
    if (i === n - 1) {
      a[i] = rest;
      out.push(a.slice());
      return;
    }
    for (let e = rest; e >= 0; e--) {
      a[i] = e;
      rec(i + 1, rest - e);
    }
  };
  if (n > 0) rec(0, d);
  return out;
}

function degreeOf(alg: SuperAlgebra<number>, g: SuperPoly<number>): [number, number, number] {
  const k = g.keys().next().value as number;
  return alg.space.degrees(k);
}

export function quotientCells(input: QuotientInput, hooks: ClosureHooks = {}): ModuleCell[] {
  const { alg, p } = input;
  const sp = alg.space;
  const n = sp.n;
  const gens = input.generators.map((g) => ({ g, d: degreeOf(alg, g) }));
  const useFrob = input.frobenius && input.stable;
  const plan: readonly YoungTask[] = input.stable ? youngPlan(n) : [];
  const fl = partitionList(n).map((l) => Number(fLambda(l)));
  const out: ModuleCell[] = [];
  for (let total = 0; ; total++) {
    if (total > input.maxDegree) throw new RangeError(`quotient not finished by degree ${input.maxDegree}`);
    let any = false;
    for (let dt = Math.min(total, sp.hasTheta ? n : 0); dt >= 0; dt--) {
      for (let dy = sp.hasY ? total - dt : 0; dy >= 0; dy--) {
        const dx = total - dt - dy;
        hooks.signal?.throwIfAborted();
        const cell = input.stable ? frobeniusCell(alg, p, gens, plan, [dx, dy, dt], fl) : plainCell(alg, p, gens, [dx, dy, dt]);
        hooks.onProgress?.(total, 0, `degree ${dx}/${dy}/${dt}`);
        if (cell.dim > 0) any = true;
        out.push(useFrob ? cell : { degree: cell.degree, dim: cell.dim });
      }
    }
    if (!any) return out.filter((c) => c.dim > 0);
  }
}

type Gen = { readonly g: SuperPoly<number>; readonly d: readonly [number, number, number] };

function multiples(alg: SuperAlgebra<number>, gens: readonly Gen[], deg: readonly [number, number, number], monomialFilter?: (k: number) => boolean): SuperPoly<number>[] {
  const rows: SuperPoly<number>[] = [];
  for (const { g, d } of gens) {
    const e = [deg[0] - d[0], deg[1] - d[1], deg[2] - d[2]] as const;
    if (e[0] < 0 || e[1] < 0 || e[2] < 0) continue;
    for (const m of monomialsOfDegree(alg, e[0], e[1], e[2])) {
      if (monomialFilter && !monomialFilter(m)) continue;
      rows.push(alg.mul(g, new Map([[m, 1]])));
    }
  }
  return rows;
}

function plainCell(alg: SuperAlgebra<number>, p: number, gens: readonly Gen[], deg: [number, number, number]): ModuleCell {
  const monos = monomialsOfDegree(alg, ...deg);
  const index = new Map(monos.map((m, i) => [m, i]));
  const ech = new EchelonModP(p, Math.max(1, monos.length));
  for (const row of multiples(alg, gens, deg)) {
    const cols: number[] = [];
    const vals: number[] = [];
    for (const [k, v] of row) {
      cols.push(index.get(k)!);
      vals.push(v);
    }
    ech.insert(cols, vals, cols.length);
    if (ech.rank === monos.length) break;
  }
  return { degree: deg, dim: monos.length - ech.rank };
}

function frobeniusCell(alg: SuperAlgebra<number>, p: number, gens: readonly Gen[], plan: readonly YoungTask[], deg: [number, number, number], fl: readonly number[]): ModuleCell {
  const monos = monomialsOfDegree(alg, ...deg);
  const values = plan.map((task) => {
    const folder = new YoungFolder(alg.space, task.blocks, task.modes);
    for (const m of monos) folder.fold(m);
    const ambient = folder.columns;
    if (ambient === 0) return 0;
    // m only needs to run over orbit representatives (rows of one orbit fold alike)
    const isRep = (k: number): boolean => {
      const sp = alg.space;
      const x = new Array<number>(sp.n);
      const y = new Array<number>(sp.n).fill(0);
      const mask = sp.decode(k, x, y);
      let i = 0;
      for (const b of task.blocks) {
        for (let j = i + 1; j < i + b; j++) {
          const l0 = (x[j - 1]! * sp.radix + y[j - 1]!) * 2 + ((mask >> (j - 1)) & 1);
          const l1 = (x[j]! * sp.radix + y[j]!) * 2 + ((mask >> j) & 1);
          if (l1 < l0) return false;
        }
        i += b;
      }
      return true;
    };
    const ech = new EchelonModP(p, ambient);
    for (const row of multiples(alg, gens, deg, isRep)) {
      const cols: number[] = [];
      const vals: number[] = [];
      for (const [k, v] of row) {
        const code = folder.fold(k);
        if (code < 0) continue;
        cols.push(code >> 1);
        vals.push(code & 1 ? (p - v) % p : v);
      }
      ech.insert(cols, vals, cols.length);
      if (ech.rank === ambient) break;
    }
    return ambient - ech.rank;
  });
  const mult = solveMultiplicities(alg.space.n, plan, values);
  const dim = mult.reduce((s, m, i) => s + m * fl[i]!, 0);
  return { degree: deg, dim, multiplicities: mult };
}
