/**
 * Tables from cells: the Hilbert table indexed by the result's axes (1 axis: an array,
 * 2 axes: [i][j], 3 axes: [i][j][l]) and the Frobenius coefficient of each s_λ in the same
 * shape; with one or two axes also as Poly (q marks the first axis, t the second).
 */
import { partitionKey, partitionList } from '../core/partitions.js';
import { Poly } from '../core/poly.js';
import type { ModuleCell } from './module-cell.js';
import { AXIS_INDEX, type Axis } from './module-result.js';

export type Nested = number | Nested[];

/** Size of the table along each axis (max degree + 1 over the cells). */
export function tableExtent(cells: readonly ModuleCell[], axes: readonly Axis[]): number[] {
  return axes.map((a) => Math.max(0, ...cells.map((c) => c.degree[AXIS_INDEX[a]] + 1)));
}

function build(cells: readonly ModuleCell[], axes: readonly Axis[], value: (c: ModuleCell) => number): Nested {
  const ext = tableExtent(cells, axes);
  const make = (depth: number): Nested => (depth === ext.length ? 0 : Array.from({ length: ext[depth]! }, () => make(depth + 1)));
  const table = make(0);
  for (const c of cells) {
    let t = table as Nested[];
    const idx = axes.map((a) => c.degree[AXIS_INDEX[a]]);
    for (let d = 0; d < idx.length - 1; d++) t = t[idx[d]!] as Nested[];
    const last = idx[idx.length - 1]!;
    t[last] = (t[last] as number) + value(c);
  }
  return table;
}

export function hilbertTable(cells: readonly ModuleCell[], axes: readonly Axis[]): Nested {
  return build(cells, axes, (c) => c.dim);
}

/** λ key -> table of its multiplicities (only λ with a nonzero entry). */
export function frobeniusTables(n: number, cells: readonly ModuleCell[], axes: readonly Axis[]): Map<string, Nested> {
  const out = new Map<string, Nested>();
  partitionList(n).forEach((l, i) => {
    if (!cells.some((c) => (c.multiplicities?.[i] ?? 0) !== 0)) return;
    out.set(partitionKey(l), build(cells, axes, (c) => c.multiplicities?.[i] ?? 0));
  });
  return out;
}

/** A 1- or 2-axis table as a polynomial in q (first axis) and t (second). */
export function tableToPoly(table: Nested, axes: number): Poly {
  if (axes === 1) return Poly.fromQCoeffs(table as number[]);
  if (axes === 2) return Poly.fromQTTable(table as number[][]);
  throw new RangeError('only 1- and 2-axis tables are polynomials');
}
