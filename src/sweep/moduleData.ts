/**
 * What the findings read from a module's JSON document (computed now or kept): the graded
 * dimensions by x-degree and by total degree, the bigraded table when there are two axes,
 * the Frobenius series (Schur expansion with q,t coefficients) and the module's own checks.
 */
import { Poly } from '../core/poly.js';
import { seriesFromDocument } from '../series/fromDocument.js';
import type { Series } from '../series/series.js';

export interface ModuleCheck {
  readonly check: string;
  readonly holds: boolean | null;
  readonly detail: string;
}

export interface ModuleData {
  readonly key: string;
  readonly n: number;
  readonly k?: number;
  readonly axes: readonly string[];
  readonly dimension: bigint;
  /** Σ dim q^{x-degree} (the other gradings summed). */
  readonly byX: Poly;
  /** Σ dim q^{total degree}. */
  readonly byTotal: Poly;
  /** The Hilbert table as q (first axis) and t (second axis), with one or two axes. */
  readonly table?: Poly;
  /** The Frobenius series with q (and t) as in the table, when S_n acts. */
  readonly frobenius?: Series;
  /** Cells: degree vector -> (dimension, Schur multiplicities by partition key). */
  readonly cells: readonly { readonly degree: readonly number[]; readonly dim: number; readonly schur?: ReadonlyMap<string, number> }[];
  readonly checks: readonly ModuleCheck[];
}

type Nested = number | Nested[];

function walk(t: unknown, prefix: number[], visit: (degree: number[], v: number) => void): void {
  if (Array.isArray(t)) t.forEach((x, i) => walk(x, [...prefix, i], visit));
  else if (typeof t === 'number' || typeof t === 'string') visit(prefix, Number(t));
}

export function moduleData(key: string, doc: Record<string, unknown>): ModuleData {
  const axes = (doc['axes'] as string[] | undefined) ?? ['x'];
  const cellMap = new Map<string, { degree: number[]; dim: number; schur?: Map<string, number> }>();
  walk(doc['hilbert'] as Nested, [], (degree, dim) => {
    if (dim !== 0) cellMap.set(degree.join(','), { degree, dim });
  });
  const schur = doc['schur'] as Record<string, Nested> | undefined;
  if (schur) {
    for (const [lambda, table] of Object.entries(schur)) {
      walk(table, [], (degree, m) => {
        if (m === 0) return;
        const cell = cellMap.get(degree.join(','));
        if (!cell) return;
        (cell.schur ??= new Map()).set(lambda, m);
      });
    }
  }
  const cells = [...cellMap.values()];
  let byX = Poly.zero;
  let byTotal = Poly.zero;
  for (const c of cells) {
    byX = byX.add(Poly.monomial(BigInt(c.dim), c.degree[0]!));
    byTotal = byTotal.add(Poly.monomial(BigInt(c.dim), c.degree.reduce((a, b) => a + b, 0)));
  }
  const table = axes.length <= 2 ? cells.reduce((p, c) => p.add(Poly.monomial(BigInt(c.dim), c.degree[0]!, c.degree[1] ?? 0)), Poly.zero) : undefined;
  let frobenius: Series | undefined;
  if (schur && axes.length <= 2) frobenius = seriesFromDocument({ schur, axes }, 'frobenius', key);
  const k = doc['k'];
  return {
    key,
    n: Number(doc['n']),
    ...(typeof k === 'number' ? { k } : {}),
    axes,
    dimension: BigInt(String(doc['dimension'] ?? 0)),
    byX,
    byTotal,
    ...(table ? { table } : {}),
    ...(frobenius ? { frobenius } : {}),
    cells,
    checks: (doc['checks'] as ModuleCheck[] | undefined) ?? [],
  };
}
